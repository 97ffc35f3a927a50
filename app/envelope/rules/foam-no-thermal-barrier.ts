// Foam plastic facing the living space without a thermal barrier.
import { innermostFoam, isExposed, thermalBarrierInboard } from "./fire-barriers";
import { nameOf } from "./helpers";
import { flagOf, type Rule } from "./types";

// Crawl spaces and floors have their own rules; slabs hold foam under concrete.
const ELSEWHERE = new Set(["crawlspace-wall", "crawlspace-floor", "floor", "slab"]);
/** Rim joists may leave up to 3¼ in of listed foam exposed (foam-rim-joist-exposed). */
const RIM_EXPOSED_MAX_MM = 82.6;

export const foamNoThermalBarrier: Rule = {
  id: "foam-no-thermal-barrier",
  severity: "stop",
  source: "IRC 2021 R316.4 (1/2 in gypsum, 15-minute thermal barrier), C2",
  applies: (ctx) => !ELSEWHERE.has(ctx.assembly.kind) && innermostFoam(ctx.assembly) !== undefined,
  check(ctx) {
    const a = ctx.assembly;
    const foam = innermostFoam(a);
    if (!foam) return null;
    const exposed = isExposed(a, foam);
    if (!exposed && thermalBarrierInboard(a, foam.index)) return null;
    if (a.kind === "rim-joist" && exposed && foam.thickness_mm <= RIM_EXPOSED_MAX_MM) return null;
    return flagOf(
      this,
      "stop",
      "Foam plastic exposed to the interior",
      `The ${nameOf(foam)} needs a thermal barrier between it and the living space: 1/2 in gypsum board or an approved equivalent.`,
    );
  },
};
