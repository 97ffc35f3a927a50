// Summer inward drive condensing inside the assembly (not on an interior sheet).
import { summerCondensation } from "./summer-condensation";
import { flagOf, type Rule } from "./types";

export const summerInwardCondensation: Rule = {
  id: "summer-inward-condensation",
  severity: "caution",
  source: "steady-state dew-point method, M; common practice (inward drive behind reservoir cladding)",
  applies: (ctx) => ctx.summer.condensingPlanes.length > 0,
  check(ctx) {
    const s = summerCondensation(ctx);
    if (s?.kind !== "inward") return null;
    return flagOf(
      this,
      "caution",
      "Summer inward vapour drive condenses inside",
      `${ctx.summer.description}: ${s.where}, below the dew point of the incoming vapour, collecting ${s.rate}. Add a drainage/ventilation gap behind absorptive cladding or a vapour-resistant layer outboard.`,
    );
  },
};
