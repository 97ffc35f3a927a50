// Predicates several rules share. Each says what it reads from the layers and why.
import { isInsulation, lowerName, type ResolvedAssembly, type ResolvedLayer } from "../layers";
import { isBelowGrade } from "../thermal";
import type { ResolvedSite } from "../types";
import { coreRange, dryPermeances, retarderClass } from "../vapour";
import type { RuleContext } from "./types";

/** Design-day condensation below this rate is reported as a note: wood sheathing buffers a few
 * grams per square metre a day (Dryside screening threshold, common practice). */
export const SCREENING_RATE_G_M2_DAY = 1;

export const nameOf = (l: ResolvedLayer): string => lowerName(l.material);

/** Dry-cup class of a layer as installed (framed layers area-weighted). */
export function classOf(a: ResolvedAssembly, l: ResolvedLayer) {
  return retarderClass(dryPermeances(a)[l.index]);
}

export const isFoam = (l: ResolvedLayer): boolean => l.material.foam_plastic;
export const isSprayFoam = (l: ResolvedLayer): boolean => l.material.family === "spray-foam";

/** A sheet or membrane that is itself a Class I barrier (polyethylene, vapour-closed membrane). */
export const isSheetRetarder = (a: ResolvedAssembly, l: ResolvedLayer): boolean =>
  l.material.family === "sheet-retarder" || (l.material.family === "membrane" && classOf(a, l) === "I");

export function innermostInsulation(a: ResolvedAssembly): number {
  let idx = -1;
  for (const l of a.layers) if (isInsulation(l)) idx = l.index;
  return idx;
}

export const outermostInsulation = (a: ResolvedAssembly): number => a.layers.findIndex(isInsulation);

export const structureIndex = (a: ResolvedAssembly): number => a.layers.findIndex((l) => l.input.role === "structure");

/** Absorptive ("reservoir") cladding: stores rain and drives vapour inward in sun. */
export function isReservoirCladding(l: ResolvedLayer): boolean {
  return (
    (l.input.role === "cladding" || l.input.role === "roofing") &&
    (l.material.family === "masonry" || l.material.family === "concrete" || l.material.water_sensitive)
  );
}

export const isDrainageGap = (l: ResolvedLayer): boolean =>
  l.input.role === "drainage-gap" || l.material.family === "air-space" || l.material.family === "drainage";

/** Humid (A) or marine (C) moisture regime, or a hot zone (1–3): summers where outdoor air carries
 * more vapour than air-conditioned indoor air, so vapour drives inward (common practice). */
export const humidOrMarine = (s: ResolvedSite): boolean =>
  s.zoneNumber <= 3 || s.moisture === "A" || s.moisture === "C";

/** IRC 2021 Table R702.7(2) does not permit a Class I interior retarder in zones 1–3 and 4 except
 * marine 4 (C2); elsewhere the double barrier is a trade caution, not a code violation. */
export const classIInteriorBarred = (s: ResolvedSite): boolean =>
  s.zoneNumber <= 3 || (s.zoneNumber === 4 && s.moisture !== "C");

/** Summer inward drive: the outdoor (or wet-cladding) vapour pressure exceeds the indoor one. */
export const inwardDrive = (ctx: RuleContext): boolean => ctx.summer.exterior.p_v_pa > ctx.summer.interior.p_v_pa;

/** A Class I interior sheet inboard of the insulation and a Class I/II foam, membrane or sheet
 * outboard of the core: the double vapour barrier. Above grade only. */
export function doubleBarrier(a: ResolvedAssembly): { interior: ResolvedLayer; exterior: ResolvedLayer } | null {
  if (isBelowGrade(a.kind)) return null;
  const inner = innermostInsulation(a);
  const interior = a.layers.find((l) => l.index > inner && isSheetRetarder(a, l) && classOf(a, l) === "I");
  if (!interior) return null;
  const coreFirst = coreRange(a)?.first ?? outermostInsulation(a);
  const exterior = a.layers.find(
    (l) =>
      l.index < coreFirst &&
      (isFoam(l) || l.material.family === "membrane" || l.material.family === "sheet-retarder") &&
      (classOf(a, l) === "I" || classOf(a, l) === "II"),
  );
  return exterior ? { interior, exterior } : null;
}

/** The double barrier that the double-vapour-barrier rule reports (so both-sides-closed stays quiet). */
export const doubleBarrierReported = (ctx: RuleContext): boolean =>
  doubleBarrier(ctx.assembly) !== null && humidOrMarine(ctx.site) && inwardDrive(ctx);

/** Exterior foam that is a vapour-closed, continuous skin (taped or sealed joints). */
export const isTapedFoam = (l: ResolvedLayer): boolean =>
  isFoam(l) && (l.input.joints === "taped" || l.input.joints === "sealed");

/** Stucco over foam on one WRB and no drainage space (the stucco rule owns that case). */
export function stuccoOnFoamUndrained(a: ResolvedAssembly): { stucco: ResolvedLayer; foam: ResolvedLayer } | null {
  const stucco = a.layers.find((l) => l.input.role === "cladding" && l.material.slug === "cement-stucco");
  if (!stucco) return null;
  // Foam directly behind the stucco: only barriers and gaps between them, no wall.
  let foam: ResolvedLayer | undefined;
  for (const l of a.layers.slice(stucco.index + 1)) {
    if (isFoam(l) && l.material.family === "foam-board") {
      foam = l;
      break;
    }
    if (isDrainageGap(l)) return null;
    if (l.input.role !== "water-resistive-barrier" && l.input.role !== "air-barrier") return null;
  }
  if (!foam) return null;
  const wrbs = a.layers.filter((l) => l.index > stucco.index && l.input.role === "water-resistive-barrier");
  return wrbs.length <= 1 ? { stucco, foam } : null;
}
