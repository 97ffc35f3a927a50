// Exposed foam at a rim joist: allowed up to 3¼ in with a listed product.
import { innermostFoam, isExposed } from "./fire-barriers";
import { flagOf, type Rule } from "./types";

const MAX_EXPOSED_MM = 82.6; // 3¼ in

export const foamRimJoistExposed: Rule = {
  id: "foam-rim-joist-exposed",
  severity: "note",
  source: "IRC 2018 R316.5.11, C",
  applies: (ctx) => ctx.assembly.kind === "rim-joist" && innermostFoam(ctx.assembly) !== undefined,
  check(ctx) {
    const foam = innermostFoam(ctx.assembly);
    if (!foam || !isExposed(ctx.assembly, foam) || foam.thickness_mm > MAX_EXPOSED_MM) return null;
    return flagOf(
      this,
      "note",
      "Exposed foam at the rim joist",
      "Foam up to 3¼ in thick may stay exposed at rim joists when its density is 0.5–2.0 lb/ft³ and its flame spread is 25 or less; check the product's listing.",
    );
  },
};
