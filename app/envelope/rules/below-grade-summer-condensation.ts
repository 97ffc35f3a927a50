// Below grade in summer the cool soil side collects indoor vapour driven outward.
import { summerCondensation } from "./summer-condensation";
import { flagOf, type Rule } from "./types";

export const belowGradeSummerCondensation: Rule = {
  id: "below-grade-summer-condensation",
  severity: "note",
  source: "steady-state dew-point method, M; common practice",
  applies: (ctx) => ctx.summer.condensingPlanes.length > 0,
  check(ctx) {
    const s = summerCondensation(ctx);
    if (s?.kind !== "below-grade-outward") return null;
    return flagOf(
      this,
      "note",
      "Summer indoor humidity condenses toward the cool ground",
      `${ctx.summer.description}: ${s.where}, below the dew point of the indoor air, so indoor vapour diffusing outward collects there (${s.rate} on the design basis). Keep the basement dehumidified in summer, or close the interior face of the insulation.`,
    );
  },
};
