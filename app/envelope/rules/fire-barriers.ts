// What counts as a thermal or ignition barrier over foam plastic (shared by the foam rules).
import type { ResolvedAssembly, ResolvedLayer } from "../layers";
import { isFoam } from "./helpers";

/** IRC R316.4: 1/2 in gypsum board, or masonry/concrete 1 in or more (C2). */
export function thermalBarrierInboard(a: ResolvedAssembly, from: number): boolean {
  return a.layers
    .slice(from + 1)
    .some(
      (l) =>
        (l.material.family === "gypsum" && l.thickness_mm >= 12.7 - 0.3) ||
        ((l.material.family === "concrete" || l.material.family === "masonry") && l.thickness_mm >= 25.4),
    );
}

/** IRC R316.5.3/R316.5.4 ignition-barrier alternatives (docs/references.md §8): 3/8 in gypsum, 1/4 in wood
 * structural panel, fibre-cement or hardboard, 1½ in mineral fibre, a listed coating. */
export function isIgnitionBarrier(l: ResolvedLayer): boolean {
  const m = l.material;
  if (m.slug === "ignition-barrier-coating" || l.input.role === "thermal-barrier") return true;
  if (m.family === "gypsum") return l.thickness_mm >= 9.5 - 0.2;
  if (m.family === "wood-panel" || m.family === "cladding") return l.thickness_mm >= 6.35 - 0.2;
  if (m.family === "fibrous-insulation") return l.thickness_mm >= 38 - 0.5;
  return m.family === "concrete" || m.family === "masonry" || m.family === "metal";
}

export function ignitionBarrierInboard(a: ResolvedAssembly, from: number): boolean {
  return a.layers.slice(from + 1).some(isIgnitionBarrier);
}

/** The innermost foam plastic layer, the one that faces the room or the service space. */
export function innermostFoam(a: ResolvedAssembly): ResolvedLayer | undefined {
  for (let i = a.layers.length - 1; i >= 0; i--) if (isFoam(a.layers[i])) return a.layers[i];
  return undefined;
}

/** Exposed: the layer says so, or nothing lies inboard of it. */
export const isExposed = (a: ResolvedAssembly, l: ResolvedLayer): boolean =>
  l.input.exposed === true ||
  l.input.exposure === "interior" ||
  l.input.exposure === "service-space" ||
  l.index === a.layers.length - 1;
