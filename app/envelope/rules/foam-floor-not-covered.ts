// Foam in a floor with no panel between it and the room above.
import { innermostFoam } from "./fire-barriers";
import { nameOf } from "./helpers";
import { flagOf, type Rule } from "./types";

export const foamFloorNotCovered: Rule = {
  id: "foam-floor-not-covered",
  severity: "stop",
  source: "IRC 2021 R316.5.13 (floors), M; R316.4, C2",
  applies: (ctx) => ctx.assembly.kind === "floor" && innermostFoam(ctx.assembly) !== undefined,
  check(ctx) {
    const a = ctx.assembly;
    const foam = innermostFoam(a);
    if (!foam) return null;
    // A 1/2 in wood structural panel (the subfloor) stands in for the thermal barrier.
    const covered = a.layers
      .slice(foam.index + 1)
      .some((l) => (l.material.family === "wood-panel" && l.thickness_mm >= 11.9) || l.material.family === "gypsum");
    if (covered) return null;
    return flagOf(
      this,
      "stop",
      "Foam in a floor without a covering panel",
      `The ${nameOf(foam)} needs at least a 1/2 in wood structural panel (or a thermal barrier) between it and the room above.`,
    );
  },
};
