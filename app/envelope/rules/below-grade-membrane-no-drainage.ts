// A below-grade membrane with nothing to drain the water the soil holds against it.
import { isDrainageGap, nameOf, structureIndex } from "./helpers";
import { flagOf, type Rule } from "./types";

export const belowGradeMembraneNoDrainage: Rule = {
  id: "below-grade-membrane-no-drainage",
  severity: "caution",
  source: "IRC 2021 R405.1 (foundation drainage) and R406 (dampproofing/waterproofing), M; common practice",
  applies: (ctx) => ctx.assembly.kind === "basement-wall" || ctx.assembly.kind === "crawlspace-wall",
  check(ctx) {
    const layers = ctx.assembly.layers;
    const structure = structureIndex(ctx.assembly);
    const membrane = layers.find(
      (l) =>
        l.index < structure &&
        (l.material.family === "membrane" ||
          l.material.family === "coating" ||
          l.input.role === "soil-side-protection") &&
        !isDrainageGap(l),
    );
    if (!membrane || layers.slice(0, membrane.index).some((l) => isDrainageGap(l) || l.material.family === "aggregate"))
      return null;
    return flagOf(
      this,
      "caution",
      "Below-grade membrane without a drainage layer",
      `Water held against the ${nameOf(membrane)} by the soil builds pressure at every flaw. Put a drainage mat, drainage board or free-draining backfill outboard of it, leading to a footing drain.`,
    );
  },
};
