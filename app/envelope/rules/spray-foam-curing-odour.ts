// Spray foam on the interior side, or left exposed, gives off odour and vapours while it cures.
import { isSprayFoam, nameOf, structureIndex } from "./helpers";
import { isExposed } from "./fire-barriers";
import { flagOf, type Rule } from "./types";

export const sprayFoamCuringOdour: Rule = {
  id: "spray-foam-curing-odour",
  severity: "note",
  source: "common practice (spray-foam makers' re-occupancy instructions)",
  applies: (ctx) => ctx.assembly.layers.some(isSprayFoam),
  check(ctx) {
    const a = ctx.assembly;
    const structure = structureIndex(a);
    // Interior side: sprayed from inside, against or inboard of the structure or sheathing
    // (cavities, rim joists, under roof decks), or exposed to a room or service space.
    const foam = a.layers.find(
      (l) => isSprayFoam(l) && (isExposed(a, l) || l.framing !== null || structure < 0 || l.index > structure),
    );
    if (!foam) return null;
    return flagOf(
      this,
      "note",
      "Spray foam sprayed indoors: curing odour and off-gassing",
      `The ${nameOf(foam)} is sprayed from the inside. Keep people out and ventilate during spraying and for the re-occupancy time the foam maker states (commonly a day or more); a mis-mixed batch can keep smelling for a long time, so use a trained installer and check for odour before closing up.`,
    );
  },
};
