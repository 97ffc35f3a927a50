// Basement and crawl-space walls need dampproofing or waterproofing outboard of the structure;
// foam with taped seams (an insulated concrete form) is not that.
import type { ResolvedLayer } from "../layers";
import { isFoam, structureIndex } from "./helpers";
import { flagOf, type Rule } from "./types";

const FOUNDATION_WALLS = new Set(["basement-wall", "crawlspace-wall"]);

const isDampproofing = (l: ResolvedLayer): boolean =>
  !isFoam(l) &&
  (l.material.family === "membrane" ||
    l.material.family === "coating" ||
    l.material.family === "sheet-retarder" ||
    (l.input.role === "soil-side-protection" && l.material.family !== "drainage"));

export const belowGradeNoDampproofing: Rule = {
  id: "below-grade-no-dampproofing",
  severity: "stop",
  source:
    "IRC 2021 R406.1 (dampproofing) and R406.2 (waterproofing), M; common practice (ICF makers require a foam-compatible membrane)",
  applies: (ctx) => FOUNDATION_WALLS.has(ctx.assembly.kind) && structureIndex(ctx.assembly) >= 0,
  check(ctx) {
    const a = ctx.assembly;
    const structure = structureIndex(a);
    const outboard = a.layers.slice(0, structure);
    if (outboard.some(isDampproofing)) return null;
    const foam = outboard.find(isFoam);
    const icf =
      foam !== undefined &&
      (foam.material.slug.startsWith("icf") || foam.input.joints === "taped" || foam.input.joints === "sealed");
    return flagOf(
      this,
      "stop",
      "Foundation wall with no dampproofing or waterproofing",
      icf
        ? "Taped foam seams do not keep soil water out: water runs through the joints to the concrete. Apply a fully adhered membrane the foam maker lists as compatible (no solvents on polystyrene), with a drainage layer (a drainage mat or board) outboard of it leading to a footing drain."
        : "Nothing outboard of the wall keeps soil moisture out. Apply dampproofing (or waterproofing where there is a high water table), with a drainage layer leading to a footing drain.",
    );
  },
};
