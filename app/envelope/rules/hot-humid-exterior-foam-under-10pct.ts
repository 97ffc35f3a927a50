// Zones 1–3: exterior foam under 10 % of the total R runs its inner face below the dew point of
// air-conditioned indoor air.
import { materialRsi } from "../layers";
import { summariseInsulation } from "../code-tables";
import { rsiToRip } from "../units";
import { innermostInsulation, isFoam } from "./helpers";
import { flagOf, type Rule } from "./types";

export const hotHumidExteriorFoamUnder10pct: Rule = {
  id: "hot-humid-exterior-foam-under-10pct",
  severity: "caution",
  source: "DOE/PNNL Building America Solution Center, CZ 1–3 drawing notes (≥ 10 % of total R), C",
  applies: (ctx) =>
    ctx.site.zoneNumber <= 3 && (ctx.assembly.kind === "above-grade-wall" || ctx.assembly.kind === "roof"),
  check(ctx) {
    const a = ctx.assembly;
    const s = summariseInsulation(a);
    const framed = a.layers.findIndex((x) => x.framing);
    const limit = framed === -1 ? innermostInsulation(a) : framed;
    const extR = a.layers
      .filter((l) => !l.framing && isFoam(l) && l.index < limit)
      .reduce((t, l) => t + rsiToRip(materialRsi(l.material, l.thickness_mm)), 0);
    const totalR = s.cavity + s.ci;
    if (!(extR > 0 && totalR > 0 && extR < 0.1 * totalR)) return null;
    return flagOf(
      this,
      "caution",
      "Exterior foam less than 10 % of the total R",
      `Exterior foam gives R-${extR.toFixed(1)} of R-${totalR.toFixed(1)} (${((100 * extR) / totalR).toFixed(0)} %). In zones 1–3 keep it at 10 % or more so its inner face stays above the dew point of air-conditioned indoor air, or leave it out.`,
    );
  },
};
