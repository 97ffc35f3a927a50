// Solvent-based adhesive on or next to polystyrene foam.
import type { ResolvedLayer } from "../layers";
import { nameOf } from "./helpers";
import { flagOf, type Rule } from "./types";

export const solventAdhesiveOnPolystyrene: Rule = {
  id: "solvent-adhesive-on-polystyrene",
  severity: "stop",
  source: "common practice (foam manufacturers' installation instructions)",
  applies: (ctx) => ctx.assembly.layers.some((l) => l.input.adhesive === "solvent-based"),
  check(ctx) {
    const layers = ctx.assembly.layers;
    for (const l of layers) {
      if (l.input.adhesive !== "solvent-based") continue;
      const touched = [layers[l.index - 1], l, layers[l.index + 1]].find(
        (x): x is ResolvedLayer => x?.material.solvent_sensitive,
      );
      if (!touched) continue;
      return flagOf(
        this,
        "stop",
        "Solvent-based adhesive on polystyrene foam",
        `Solvents dissolve ${nameOf(touched)}. Use an adhesive the foam maker lists as compatible (usually water-based) or fasten mechanically.`,
      );
    }
    return null;
  },
};
