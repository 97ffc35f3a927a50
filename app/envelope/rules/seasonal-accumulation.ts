// The monthly balance leaves water behind at the end of the year: it grows year on year. A caution,
// not a stop: the monthly Glaser method ignores moisture storage in the layers and liquid
// redistribution, so it overstates accumulation in walls the code's vapour tables accept; a transient
// simulation settles it. The explanation says so, and the builder sees the figures.
import { flagOf, type Rule } from "./types";

export const seasonalAccumulation: Rule = {
  id: "seasonal-accumulation",
  severity: "caution",
  source:
    "ISO 13788:2012 §6 (condensate must evaporate within the year), monthly method, C; criterion wording from memory",
  applies: (ctx) => ctx.seasonal !== null && ctx.seasonal.scopeNote === null,
  check(ctx) {
    const s = ctx.seasonal;
    if (s?.verdict !== "accumulates") return null;
    const where = s.criticalInterface?.label ?? "an interface";
    return flagOf(
      this,
      "caution",
      "Water builds up year on year in the monthly balance",
      `Over the site year the monthly balance condenses more at ${where} than the warm months evaporate: ${Math.round(s.endOfYear_g_m2)} g/m² is still there after twelve months (peak ${Math.round(s.peak_g_m2)} g/m²). The monthly method ignores the water the layers store and move as liquid, so it overstates this; but unless the assembly is proven by the code's vapour tables and field experience, warm that interface with more exterior insulation or slow the vapour reaching it, and have a transient hygrothermal analysis settle it.`,
    );
  },
};
