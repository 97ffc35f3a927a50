// Foam facing a crawl space (crawl-space walls and ground, the underside of a floor) without an
// ignition barrier.
import type { ResolvedLayer } from "../layers";
import { ignitionBarrierInboard, innermostFoam, isExposed, isIgnitionBarrier } from "./fire-barriers";
import { isFoam, nameOf } from "./helpers";
import { flagOf, type Rule, type RuleContext } from "./types";

const REMEDY =
  "Cover it with an ignition barrier (e.g. 3/8 in gypsum, 1/4 in wood structural panel, 1½ in mineral fibre, or a listed coating) unless the foam is tested for exposure.";

function unprotected(ctx: RuleContext): { foam: ResolvedLayer; underside: boolean } | null {
  const a = ctx.assembly;
  if (a.kind === "floor") {
    // The underside faces the crawl space: the outermost foam needs a barrier below it.
    const first = a.layers.find(isFoam);
    return first && !a.layers.slice(0, first.index).some(isIgnitionBarrier) ? { foam: first, underside: true } : null;
  }
  const foam = innermostFoam(a);
  return foam && (isExposed(a, foam) || !ignitionBarrierInboard(a, foam.index)) ? { foam, underside: false } : null;
}

export const foamCrawlspaceNoIgnitionBarrier: Rule = {
  id: "foam-crawlspace-no-ignition-barrier",
  severity: "caution",
  source: "IRC 2021 R316.5.4; alternatives per R316.5.3 (docs/references.md §8), C",
  applies: (ctx) =>
    ["crawlspace-wall", "crawlspace-floor", "floor"].includes(ctx.assembly.kind) && ctx.assembly.layers.some(isFoam),
  check(ctx) {
    const hit = unprotected(ctx);
    if (!hit) return null;
    return hit.underside
      ? flagOf(
          this,
          "caution",
          "Foam under the floor without an ignition barrier",
          `The underside of the ${nameOf(hit.foam)} faces the crawl space. ${REMEDY}`,
        )
      : flagOf(
          this,
          "caution",
          "Foam plastic in a crawl space without an ignition barrier",
          `The ${nameOf(hit.foam)} faces the crawl space. ${REMEDY}`,
        );
  },
};
