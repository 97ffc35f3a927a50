// Rigid foam pressed flat against the WRB with no drainage gap outboard.
import type { ResolvedLayer } from "../layers";
import { isDrainageGap, isFoam, isReservoirCladding, nameOf, stuccoOnFoamUndrained } from "./helpers";
import { flagOf, type Rule } from "./types";

function foamOnWrb(layers: readonly ResolvedLayer[]): { foam: ResolvedLayer; wrb: ResolvedLayer } | null {
  for (let i = 0; i + 1 < layers.length; i++) {
    const pair = [layers[i], layers[i + 1]];
    const foam = pair.find((l) => isFoam(l) && l.material.family === "foam-board");
    const wrb = pair.find((l) => l.input.role === "water-resistive-barrier");
    if (!foam || !wrb) continue;
    if (layers.slice(0, Math.min(foam.index, wrb.index)).some(isDrainageGap)) continue;
    return { foam, wrb };
  }
  return null;
}

export const foamAgainstWrbNoGap: Rule = {
  id: "foam-against-wrb-no-gap",
  severity: "caution",
  source: "common practice",
  applies: (ctx) =>
    ctx.assembly.layers.some((l) => l.input.role === "water-resistive-barrier") && ctx.assembly.layers.some(isFoam),
  check(ctx) {
    const a = ctx.assembly;
    if (stuccoOnFoamUndrained(a)) return null; // reported, by its name, by the stucco rule
    const hit = foamOnWrb(a.layers);
    if (!hit) return null;
    const reservoir = a.layers.find(isReservoirCladding);
    return flagOf(
      this,
      reservoir ? "caution" : "note",
      "Rigid foam tight to the water-resistive barrier with no drainage gap",
      `Water that gets past the cladding is held between the ${nameOf(hit.foam)} and the ${nameOf(hit.wrb)} with nowhere to drain${reservoir ? `, and the ${nameOf(reservoir)} stores rain that sun drives inward` : ""}. Add a drainage gap (furring, a drainage mat or a textured wrap) outboard of the foam.`,
    );
  },
};
