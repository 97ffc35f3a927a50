// Vapour permeance of layers, retarder classes (IRC 2021 R702.7(1): dry cup, Class I ≤ 0.1 perm,
// II > 0.1 ≤ 1.0, III > 1.0 ≤ 10) and the drying directions of a stack.
import type { Material, MaterialLibrary } from "./material-schema";
import { isInsulation, lowerName, resolveAssembly, type ResolvedAssembly, type ResolvedLayer } from "./layers";
import type { AssemblyInput, InteriorClass, LayerVapourClass, VapourLayer, VapourResult } from "./types";
import { ngToPerm } from "./units";

/** Dry cup is 0/50 % RH (mean 25 %), wet cup 50/100 % (mean 75 %): where a material has both and no
 * curve, they are the two points of its curve (docs/references.md §5.2: model responsive materials as a
 * function of mean RH). */
const DRY_CUP_MEAN_RH = 25;
const WET_CUP_MEAN_RH = 75;

function thicknessScale(m: Material, thickness_mm: number): number {
  // Homogeneous materials: permeance ∝ 1/thickness. Sheets and membranes: fixed.
  return m.vapour.at_thickness_mm !== undefined ? m.vapour.at_thickness_mm / thickness_mm : 1;
}

/** Dry-cup permeance, ng/(s·m²·Pa), of a material at a thickness. */
export function dryCupPermeance(m: Material, thickness_mm: number): number {
  return m.vapour.permeance_ng * thicknessScale(m, thickness_mm);
}

export function isRhDependent(m: Material): boolean {
  return m.vapour.curve !== undefined || m.vapour.wet_cup_ng !== undefined;
}

interface RhCurve {
  rh: number[];
  p: number[];
  ln: number[];
}
const curveCache = new WeakMap<Material, RhCurve | null>();
/** The material's RH curve (or its dry/wet cup pair) with ln(permeance) at each point, built once. */
function rhCurve(m: Material): RhCurve | null {
  let c = curveCache.get(m);
  if (c === undefined) {
    const points: readonly (readonly [number, number])[] | undefined =
      m.vapour.curve ??
      (m.vapour.wet_cup_ng !== undefined
        ? [
            [DRY_CUP_MEAN_RH, m.vapour.permeance_ng],
            [WET_CUP_MEAN_RH, m.vapour.wet_cup_ng],
          ]
        : undefined);
    c = points
      ? { rh: points.map((q) => q[0]), p: points.map((q) => q[1]), ln: points.map((q) => Math.log(q[1])) }
      : null;
    curveCache.set(m, c);
  }
  return c;
}

/** Permeance at a mean RH (percent): the curve, or dry/wet cup, interpolated in ln(permeance). */
export function permeanceAtRh(m: Material, thickness_mm: number, rh: number): number {
  const c = rhCurve(m);
  const scale = thicknessScale(m, thickness_mm);
  if (!c) return m.vapour.permeance_ng * scale;
  const x = Math.min(100, Math.max(0, rh));
  const last = c.rh.length - 1;
  if (x <= c.rh[0]) return c.p[0] * scale;
  if (x >= c.rh[last]) return c.p[last] * scale;
  for (let i = 1; i <= last; i++) {
    if (x <= c.rh[i]) {
      const f = (x - c.rh[i - 1]) / (c.rh[i] - c.rh[i - 1]);
      return Math.exp(c.ln[i - 1] + f * (c.ln[i] - c.ln[i - 1])) * scale;
    }
  }
  return c.p[last] * scale;
}

/** Permeance of a resolved layer; framed layers combine cavity and framing in parallel
 * (area-weighted permeance). rh undefined means dry cup. */
export function layerPermeance(layer: ResolvedLayer, rh?: number): number {
  const cavity = materialPermeance(layer.material, layer.thickness_mm, rh);
  if (!layer.framing) return cavity;
  const f = layer.framing.fraction;
  return (1 - f) * cavity + f * materialPermeance(layer.framing.material, layer.thickness_mm, rh);
}

/** Permeance through the clear cavity of a framed layer (the fill alone), else the layer's. */
export function cavityPermeance(layer: ResolvedLayer, rh?: number): number {
  return materialPermeance(layer.material, layer.thickness_mm, rh);
}

const dryCache = new WeakMap<ResolvedAssembly, number[]>();
/** Dry-cup permeance of every layer (area-weighted for framed layers), computed once per assembly. */
export function dryPermeances(a: ResolvedAssembly): readonly number[] {
  let dry = dryCache.get(a);
  if (!dry) {
    dry = a.layers.map((l) => layerPermeance(l));
    dryCache.set(a, dry);
  }
  return dry;
}

function materialPermeance(m: Material, thickness_mm: number, rh: number | undefined): number {
  return rh === undefined ? dryCupPermeance(m, thickness_mm) : permeanceAtRh(m, thickness_mm, rh);
}

/** Class by the IRC definitions (dry-cup permeance in US perms). */
export function retarderClass(ng: number): LayerVapourClass {
  const perm = ngToPerm(ng);
  if (perm <= 0.1) return "I";
  if (perm <= 1.0) return "II";
  if (perm <= 10) return "III";
  return "permeable";
}

/** Layers in series: vapour resistances (1/W) add. */
export function seriesPermeance(permeances: readonly number[]): number {
  let z = 0;
  for (const w of permeances) z += 1 / w;
  return 1 / z;
}

/** Side of a stack whose combined wet-cup permeance is at or below 1 perm is treated as closed to
 * drying (common practice: Class II or tighter at service humidity dries too slowly to count). */
const CLOSED_SIDE_PERM = 1.0;

const VENTED_GAP_FAMILIES = new Set(["air-space", "drainage"]);

const CORE_ROLES = new Set(["sheathing", "structure", "insulation", "subfloor"]);

function isWaterSensitiveCore(layer: ResolvedLayer): boolean {
  if (!CORE_ROLES.has(layer.input.role) && !layer.framing) return false;
  return layer.material.water_sensitive || (layer.framing?.material.water_sensitive ?? false);
}

/** Index range of the part of the stack that must dry: the water-sensitive layers (sheathing,
 * framing, fibrous fill), or else the structure and insulation. */
const coreCache = new WeakMap<ResolvedAssembly, { first: number; last: number } | null>();
export function coreRange(a: ResolvedAssembly): { first: number; last: number } | null {
  let core = coreCache.get(a);
  if (core === undefined) {
    core = findCoreRange(a);
    coreCache.set(a, core);
  }
  return core;
}

function findCoreRange(a: ResolvedAssembly): { first: number; last: number } | null {
  // Layers outboard of a ventilated cavity (a vented attic, a rainscreen) are outdoors for drying.
  let vent = -1;
  for (const l of a.layers)
    if (l.input.role === "drainage-gap" && VENTED_GAP_FAMILIES.has(l.material.family)) vent = l.index;
  const inboard = vent < a.layers.length - 1 ? a.layers.slice(vent + 1) : a.layers;
  let idx = inboard.filter(isWaterSensitiveCore).map((l) => l.index);
  if (idx.length === 0) {
    idx = inboard.filter((l) => l.input.role === "structure" || isInsulation(l)).map((l) => l.index);
  }
  if (idx.length === 0) return null;
  return { first: Math.min(...idx), last: Math.max(...idx) };
}

/** Layers inboard of the innermost insulation layer (else of the core): the interior retarder. */
function interiorSide(a: ResolvedAssembly): ResolvedLayer[] {
  // Slabs and crawl-space ground covers: the vapour control is the ground retarder in the stack.
  if (a.kind === "slab" || a.kind === "crawlspace-floor") return a.layers.slice();
  // Inboard of both the innermost insulation and the structure it insulates (exterior-insulated
  // basement walls keep their dampproofing and concrete out of the "interior" retarder).
  let innermost = -1;
  for (const l of a.layers) if (isInsulation(l)) innermost = l.index;
  innermost = Math.max(innermost, coreRange(a)?.last ?? -1);
  return innermost < 0 ? [] : a.layers.slice(innermost + 1);
}

function classOfStack(
  layers: readonly ResolvedLayer[],
  dry: readonly number[],
): { cls: InteriorClass; perm_us: number | null } {
  if (layers.length === 0) return { cls: "none", perm_us: null };
  const w = seriesPermeance(layers.map((l) => dry[l.index]));
  const c = retarderClass(w);
  return { cls: c === "permeable" ? "none" : c, perm_us: ngToPerm(w) };
}

export function interiorRetarderClassOf(a: ResolvedAssembly): InteriorClass {
  return classOfStack(interiorSide(a), dryPermeances(a)).cls;
}

/** Interior vapour-retarder class of an assembly (catalogue facet). */
export function interiorRetarderClass(assembly: AssemblyInput, materials: MaterialLibrary): InteriorClass {
  return interiorRetarderClassOf(resolveAssembly(assembly, materials));
}

function wetCupPermOf(layers: readonly ResolvedLayer[]): number | null {
  return layers.length === 0 ? null : ngToPerm(seriesPermeance(layers.map((l) => layerPermeance(l, WET_CUP_MEAN_RH))));
}

function isOpen(perm: number | null): boolean {
  return perm === null || perm > CLOSED_SIDE_PERM;
}

function formatSidePerm(p: number | null): string {
  return p === null ? "nothing" : `${p < 1 ? p.toFixed(2) : p.toFixed(1)} perm`;
}

export function analyseVapour(a: ResolvedAssembly): VapourResult {
  const dry = dryPermeances(a);
  const layers: VapourLayer[] = a.layers.map((l) => {
    const w = dry[l.index];
    return {
      index: l.index,
      material: l.material.slug,
      perm_ng: w,
      perm_us: ngToPerm(w),
      class: retarderClass(w),
      case_perm_ng: w,
    };
  });
  const interior = classOfStack(interiorSide(a), dry);
  const core = coreRange(a);
  let inwardPerm: number | null = null;
  let outwardPerm: number | null = null;
  if (core) {
    const inside = a.layers.slice(core.last + 1);
    let outside = a.layers.slice(0, core.first);
    // A vented cavity connects to outdoor air: layers outboard of it do not hold drying back.
    const gap = outside
      .map((l) => l.input.role === "drainage-gap" && VENTED_GAP_FAMILIES.has(l.material.family))
      .lastIndexOf(true);
    if (gap >= 0) outside = outside.slice(gap + 1);
    inwardPerm = wetCupPermOf(inside);
    outwardPerm = wetCupPermOf(outside);
  }
  const dryingDirections: ("inward" | "outward")[] = [];
  if (core && isOpen(inwardPerm)) dryingDirections.push("inward");
  if (core && isOpen(outwardPerm)) dryingDirections.push("outward");
  const bothSidesClosed = core !== null && !isOpen(inwardPerm) && !isOpen(outwardPerm);
  const explanation = core
    ? `Layers inboard of the ${lowerName(a.layers[core.last].material)} pass ${formatSidePerm(inwardPerm)} and layers outboard of the ${lowerName(a.layers[core.first].material)} pass ${formatSidePerm(outwardPerm)} (wet cup, in series; a vented cavity and what lies outside it are not counted). A side at or below ${CLOSED_SIDE_PERM} perm is treated as closed to drying (common practice).`
    : "No structure or insulation layer: drying directions not assessed.";
  return {
    layers,
    interiorClass: interior.cls,
    interiorPerm_us: interior.perm_us,
    exteriorPerm_us: outwardPerm,
    dryingDirections,
    bothSidesClosed,
    explanation,
  };
}
