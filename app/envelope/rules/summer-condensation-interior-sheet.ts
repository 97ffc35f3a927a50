// Summer inward drive condensing on an interior vapour barrier.
import { summerCondensation } from "./summer-condensation";
import { flagOf, type Rule } from "./types";

export const summerCondensationInteriorSheet: Rule = {
  id: "summer-condensation-interior-sheet",
  severity: "stop",
  source: "steady-state dew-point method, M; common practice (inward drive behind reservoir cladding)",
  applies: (ctx) => ctx.summer.condensingPlanes.length > 0,
  check(ctx) {
    const s = summerCondensation(ctx);
    if (s?.kind !== "interior-sheet") return null;
    return flagOf(
      this,
      "stop",
      "Summer condensation on the interior vapour barrier",
      `${ctx.summer.description}: ${s.where}, below the dew point of the incoming vapour, collecting ${s.rate}. Remove the interior sheet or replace it with a variable-permeance retarder.`,
    );
  },
};
