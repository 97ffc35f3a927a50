// Stucco over foam on a single WRB and no drainage space: a face-sealed wall.
import { nameOf, stuccoOnFoamUndrained } from "./helpers";
import { flagOf, type Rule } from "./types";

export const stuccoOverFoamUndrained: Rule = {
  id: "stucco-over-foam-undrained",
  severity: "stop",
  source:
    "IRC 2021 R703.7.3 (two layers of WRB, or one with a drainage space, behind stucco over wood-based sheathing), M; common practice",
  applies: (ctx) => ctx.assembly.layers.some((l) => l.material.slug === "cement-stucco"),
  check(ctx) {
    const hit = stuccoOnFoamUndrained(ctx.assembly);
    if (!hit) return null;
    return flagOf(
      this,
      "stop",
      "Stucco over foam with one WRB and no drainage space: a face-sealed wall",
      `The ${nameOf(hit.stucco)} sits on the ${nameOf(hit.foam)} with a single water-resistive barrier and no gap to drain: in practice a face-sealed (barrier) wall that relies on stucco that never cracks. Water through cracks and at windows is trapped against the foam and the sheathing. Add a drainage space (a drainage mat or furring with a lath-backed cavity) and a second WRB layer, with a weep screed at the base.`,
    );
  },
};
