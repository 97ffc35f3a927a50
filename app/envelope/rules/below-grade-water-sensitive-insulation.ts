// Insulation below grade that takes on water, unless a taped foam layer separates it from the
// concrete and soil (an interior stud wall inside taped foam stays dry on that side).
import type { ResolvedLayer } from "../layers";
import { isInsulation } from "../layers";
import { isBelowGrade } from "../thermal";
import { isTapedFoam, nameOf, structureIndex } from "./helpers";
import { flagOf, type Rule } from "./types";

const isMasonry = (l: ResolvedLayer | undefined): boolean =>
  l !== undefined && (l.material.family === "concrete" || l.material.family === "masonry");

export const belowGradeWaterSensitiveInsulation: Rule = {
  id: "below-grade-water-sensitive-insulation",
  severity: "stop",
  source: "common practice (docs/references.md §8 below-grade guidance, M)",
  applies: (ctx) => isBelowGrade(ctx.assembly.kind),
  check(ctx) {
    const layers = ctx.assembly.layers;
    const structure = structureIndex(ctx.assembly);
    for (const wet of layers) {
      if (!isInsulation(wet) || !wet.material.water_sensitive) continue;
      // Separated from the structure and the soil by a taped foam layer: the foam keeps the
      // concrete's moisture off it (the interior stud wall of a foam-lined basement).
      const lo = Math.min(wet.index, Math.max(structure, 0));
      const hi = Math.max(wet.index, structure);
      const shielded =
        layers.slice(lo + 1, hi).some(isTapedFoam) &&
        !isMasonry(layers[wet.index - 1]) &&
        !isMasonry(layers[wet.index + 1]);
      if (shielded) continue;
      const touchesConcrete = isMasonry(layers[wet.index - 1]) || isMasonry(layers[wet.index + 1]);
      return flagOf(
        this,
        touchesConcrete || wet.index < structure ? "stop" : "caution",
        "Insulation below grade that absorbs water",
        `The ${nameOf(wet)} loses its R-value and can grow mould when it takes on water from the soil or from concrete${touchesConcrete ? " it touches" : ""}. Use a foam or other non-absorbent insulation against concrete and soil, or keep a taped foam layer between them.`,
      );
    }
    return null;
  },
};
