// Steady-state dew-point (Glaser) profiles. Temperature falls linearly in cumulative thermal
// resistance; vapour pressure, without condensation, falls linearly in cumulative vapour
// resistance. Where that line rises above saturation, the real profile is the tightest string
// from the outdoor to the indoor vapour pressure that stays at or below saturation: the lower
// convex hull of the saturation points. Each bend of the string is a condensation plane; the
// condensation rate there is the vapour flow arriving minus the flow leaving.
// The profile runs along the clear-cavity path (framed layers conduct and pass vapour through
// their fill only): in winter that is the coldest sheathing, the worst case. The stud path's
// temperatures are reported beside it.
import {
  hasTemperatureDependentConductivity,
  isInsulation,
  lowerName,
  materialRsi,
  materialRsiAt,
  type ResolvedAssembly,
} from "./layers";
import { dewPointFromVapourPressure, saturationPressure } from "./psychrometrics";
import { filmsFor, isBelowGrade, type HeatPath, type Season } from "./thermal";
import type { CondensationPlane, LayerVapourClass, ProfileCase, ProfileInterface, VapourLayer } from "./types";
import { cToF, kgPerSToGPerDay, ngToPerm, rsiToRip } from "./units";
import { cavityPermeance, dryPermeances, isRhDependent, retarderClass } from "./vapour";

/** Boundary conditions of one case. */
export interface CaseConditions {
  name: Season;
  description: string;
  exterior: { t_c: number; p_v_pa: number; rh: number; label: string };
  interior: { t_c: number; p_v_pa: number; rh: number };
  /** True: exterior surface held at exterior.t_c (soil face, sun-warmed cladding), no film. */
  fixedSurface: boolean;
  /** Layers before this index hold the vapour source (wet cladding): they add no resistance. */
  vapourStart: number;
  /** Layers before this index lie outside a ventilated cavity: they add no thermal resistance in the
   * profile, and the cavity's still-air film replaces the outdoor film (ASHRAE practice for
   * well-ventilated spaces). 0 when there is no ventilated cavity. */
  thermalStart?: number;
  /** True: the vapour source is saturated at the temperature of interface `vapourStart` (the inner
   * face of rain-wet cladding); exterior.p_v_pa is then replaced by that saturation pressure. */
  saturatedSource?: boolean;
  /** Air whose dew point the margin is measured against (indoor in winter, outdoor in summer). */
  source: "interior" | "exterior";
  /** Exterior film RSI where the kind's own does not apply (the above-grade band of a
   * below-grade wall faces outdoor air). */
  exteriorFilmRsi?: number;
  /** Sentences the result repeats about how this case was modelled. */
  notes?: string[];
}

const NG_TO_KG = 1e-12;
/** RH-dependent permeance: passes over the condensation-corrected profile until every such layer
 * moves less than 0.5 %; after a few passes the update is damped (geometric mean) so a layer that
 * flips a nearby plane on and off settles instead of oscillating. */
const MAX_RH_ITERATIONS = 40;
const RH_SETTLED = 0.005;
const RH_DAMP_AFTER = 4;
const MAX_T_ITERATIONS = 20;
const T_SETTLED = 1e-4;

// The Glaser string is built in module-level scratch arrays (grown on demand): the hull is rebuilt
// on every permeance pass, and allocating points each time was most of a profile's garbage.
let capacity = 0;
let candZ = new Float64Array(0);
let candP = new Float64Array(0);
let candK = new Int32Array(0);
let hullZ = new Float64Array(0);
let hullP = new Float64Array(0);
let hullK = new Int32Array(0);
function ensureCapacity(points: number): void {
  if (points <= capacity) return;
  capacity = Math.max(points, 2 * capacity, 32);
  candZ = new Float64Array(capacity);
  candP = new Float64Array(capacity);
  candK = new Int32Array(capacity);
  hullZ = new Float64Array(capacity);
  hullP = new Float64Array(capacity);
  hullK = new Int32Array(capacity);
}

/** Adds a point to the candidates sorted by z, keeping one point per z: the lowest pressure, the
 * boundary air state (k = −1) on a tie, so a surface exactly at saturation is not a plane. */
function pushByZ(count: number, z: number, p: number, k: number): number {
  if (count > 0 && candZ[count - 1] === z) {
    if (p < candP[count - 1] || (p === candP[count - 1] && k < candK[count - 1])) {
      candP[count - 1] = p;
      candK[count - 1] = k;
    }
    return count;
  }
  candZ[count] = z;
  candP[count] = p;
  candK[count] = k;
  return count + 1;
}

/** The Glaser string over (z, p_sat) between the two boundary vapour pressures: the lower convex
 * hull (Andrew's monotone chain) of the candidates, into hullZ/hullP/hullK. zCum rises
 * monotonically, so the candidates arrive sorted. Returns the hull's length; k is the interface
 * index, or −1 for a boundary air state. */
function glaserString(zCum: readonly number[], pSat: readonly number[], pExt: number, pInt: number): number {
  const n = zCum.length - 1;
  ensureCapacity(n + 3);
  let count = pushByZ(0, 0, pExt, -1);
  for (let k = 0; k <= n; k++) count = pushByZ(count, zCum[k], pSat[k], k);
  count = pushByZ(count, zCum[n], pInt, -1);
  let h = 0;
  for (let i = 0; i < count; i++) {
    const z = candZ[i];
    const p = candP[i];
    while (h >= 2) {
      // Keep the last point only if it lies strictly below the chord from the one before to this one.
      const cross =
        (hullZ[h - 1] - hullZ[h - 2]) * (p - hullP[h - 2]) - (hullP[h - 1] - hullP[h - 2]) * (z - hullZ[h - 2]);
      if (cross <= 0) h--;
      else break;
    }
    hullZ[h] = z;
    hullP[h] = p;
    hullK[h] = candK[i];
    h++;
  }
  return h;
}

/** What a profile needs of an assembly that does not depend on the case: computed once. */
interface Prepared {
  labels: string[];
  positions: number[];
  dry: readonly number[];
  dryPermUs: number[];
  dryClass: LayerVapourClass[];
  dependent: boolean[];
  anyDependent: boolean;
  /** Dry-cup permeance along the clear-cavity path (the fill alone in framed layers). */
  cavityDry: number[];
  innermostInsulation: number;
  outermostInsulation: number;
}

const preparedCache = new WeakMap<ResolvedAssembly, Prepared>();
function prepare(a: ResolvedAssembly): Prepared {
  let p = preparedCache.get(a);
  if (p) return p;
  const n = a.layers.length;
  const positions = new Array<number>(n + 1);
  let x = 0;
  for (let k = 0; k <= n; k++) {
    positions[k] = Math.round(x * 1e6) / 1e6; // thickness sums: keep 0.1 + 0.2 from showing as 0.30000000000000004
    if (k < n) x += a.layers[k].thickness_mm;
  }
  const dependent = new Array<boolean>(n);
  const cavityDry = new Array<number>(n);
  let anyDependent = false;
  let innermost = -1;
  let outermost = -1;
  for (let i = 0; i < n; i++) {
    const l = a.layers[i];
    dependent[i] = isRhDependent(l.material);
    anyDependent ||= dependent[i];
    cavityDry[i] = cavityPermeance(l);
    if (isInsulation(l)) {
      innermost = i;
      if (outermost < 0) outermost = i;
    }
  }
  const dry = dryPermeances(a);
  p = {
    labels: interfaceLabels(a),
    positions,
    dry,
    dryPermUs: dry.map(ngToPerm),
    dryClass: dry.map(retarderClass),
    dependent,
    anyDependent,
    cavityDry,
    innermostInsulation: innermost,
    outermostInsulation: outermost,
  };
  preparedCache.set(a, p);
  return p;
}

function interfaceLabels(a: ResolvedAssembly): string[] {
  const n = a.layers.length;
  const names = a.layers.map((l) => lowerName(l.material));
  const labels = [`${isBelowGrade(a.kind) ? "soil-side face" : "exterior face"} of ${names[0]}`];
  for (let i = 1; i < n; i++) labels.push(`${names[i - 1]} / ${names[i]}`);
  labels.push(`interior face of ${names[n - 1]}`);
  return labels;
}

/** Candidate first condensing surface when the Glaser line does not condense: in winter the
 * inner face of the first vapour-resisting layer (≤ 10 perm) outboard of the innermost
 * insulation; in summer the outer face of the first such layer inboard of the outermost
 * insulation (e.g. interior polyethylene). */
function candidateSurface(a: ResolvedAssembly, season: Season, vapourStart: number, prep: Prepared): number {
  const n = a.layers.length;
  let innermost = prep.innermostInsulation;
  let outermost = prep.outermostInsulation;
  if (season === "winter") {
    if (innermost < 0) innermost = n - 1;
    for (let i = innermost - 1; i >= vapourStart; i--) if (prep.dryClass[i] !== "permeable") return i + 1; // inner face of layer i
    return Math.max(vapourStart, Math.min(innermost, n - 1));
  }
  if (outermost < 0) outermost = 0;
  for (let i = outermost + 1; i < n; i++) if (prep.dryClass[i] !== "permeable") return i; // outer face of layer i
  return n - 1;
}

interface PathTemperatures {
  t: number[];
  layerR: number[];
  coldAdjusted: number[];
}

/** Interface temperatures along one heat path. Insulations with a conductivity curve are taken at
 * their own mean temperature, which depends on the profile: iterate until their RSI settles. */
function pathTemperatures(
  a: ResolvedAssembly,
  c: CaseConditions,
  path: HeatPath,
  extFilm: number,
  intFilm: number,
  thermalStart: number,
): PathTemperatures {
  const n = a.layers.length;
  const layerR = new Array<number>(n);
  const curved: number[] = [];
  for (let i = 0; i < n; i++) {
    const l = a.layers[i];
    const m = l.framing && path === "stud" ? l.framing.material : l.material;
    layerR[i] = i < thermalStart ? 0 : materialRsi(m, l.thickness_mm);
    if (i >= thermalStart && hasTemperatureDependentConductivity(m)) curved.push(i);
  }
  const t = new Array<number>(n + 1);
  const dT = c.interior.t_c - c.exterior.t_c;
  for (let pass = 0; ; pass++) {
    let total = extFilm + intFilm;
    for (let i = 0; i < n; i++) total += layerR[i];
    let r = extFilm;
    for (let k = 0; k <= n; k++) {
      t[k] = c.exterior.t_c + (dT * r) / total;
      if (k < n) r += layerR[k];
    }
    if (curved.length === 0 || pass + 1 >= MAX_T_ITERATIONS) break;
    let settled = true;
    for (const i of curved) {
      const l = a.layers[i];
      const m = l.framing && path === "stud" ? l.framing.material : l.material;
      const next = materialRsiAt(m, l.thickness_mm, (t[i] + t[i + 1]) / 2);
      if (Math.abs(next - layerR[i]) > T_SETTLED * layerR[i]) settled = false;
      layerR[i] = next;
    }
    if (settled) break;
  }
  return { t, layerR, coldAdjusted: curved };
}

export function computeProfile(a: ResolvedAssembly, c: CaseConditions): ProfileCase {
  const n = a.layers.length;
  const prep = prepare(a);
  const labels = prep.labels;
  const films = filmsFor(a.kind, c.name);
  const thermalStart = c.thermalStart ?? 0;
  const extFilm = c.fixedSurface
    ? 0
    : (c.exteriorFilmRsi ?? (thermalStart > 0 ? films.interior.rsi : (films.exterior?.rsi ?? 0)));
  const notes = c.notes ? c.notes.slice() : [];

  const { t, layerR, coldAdjusted } = pathTemperatures(a, c, "clear-cavity", extFilm, films.interior.rsi, thermalStart);
  // Plain loops here and below, not callbacks: this runs several times per site check.
  let framed = false;
  for (let i = thermalStart; i < n && !framed; i++) framed = a.layers[i].framing !== null;
  const stud = framed ? pathTemperatures(a, c, "stud", extFilm, films.interior.rsi, thermalStart) : null;
  for (const i of coldAdjusted) {
    const l = a.layers[i];
    const rated = materialRsi(l.material, l.thickness_mm);
    notes.push(
      `The ${lowerName(l.material)} is taken at its mean temperature of ${((t[i] + t[i + 1]) / 2).toFixed(1)} °C: R-${rsiToRip(layerR[i]).toFixed(1)} instead of its rated R-${rsiToRip(rated).toFixed(1)}.`,
    );
  }

  const pos = prep.positions;
  // Layers outboard of a ventilated cavity or a fixed surface share one temperature: compute once.
  const pSat = new Array<number>(n + 1);
  for (let k = 0; k <= n; k++) pSat[k] = k > 0 && t[k] === t[k - 1] ? pSat[k - 1] : saturationPressure(t[k]);
  const pExt = c.saturatedSource ? pSat[c.vapourStart] : c.exterior.p_v_pa;
  const pInt = c.interior.p_v_pa;

  // Permeances along the clear-cavity path. RH-dependent layers are evaluated at the mean RH of
  // their two faces on the condensation-corrected profile (a condensing face is at 100 %), which
  // itself depends on them: iterate to a fixed point.
  const { dependent, anyDependent } = prep;
  const startRh = (c.interior.rh + c.exterior.rh) / 2;
  const perms = prep.cavityDry.slice();
  for (let i = 0; i < n; i++) if (dependent[i]) perms[i] = cavityPermeance(a.layers[i], startRh);
  const next = new Array<number>(n);
  const zCum = new Array<number>(n + 1);
  const pLinear = new Array<number>(n + 1);
  const pv = new Array<number>(n + 1);
  let hullLength = 0;
  let converged = true;
  for (let pass = 0; ; pass++) {
    zCum[0] = 0;
    for (let i = 0; i < n; i++) zCum[i + 1] = zCum[i] + (i < c.vapourStart ? 0 : 1 / (perms[i] * NG_TO_KG));
    const zTot = zCum[n];
    for (let k = 0; k <= n; k++) pLinear[k] = pExt + ((pInt - pExt) * zCum[k]) / zTot;
    hullLength = glaserString(zCum, pSat, pExt, pInt);
    // zCum rises, so one walk along the string finds every interface's segment.
    for (let k = 0, h = 1; k <= n; k++) {
      const z = zCum[k];
      while (h < hullLength && z > hullZ[h]) h++;
      let p: number;
      if (h >= hullLength) p = hullP[hullLength - 1];
      else if (hullZ[h] === hullZ[h - 1]) p = Math.min(hullP[h - 1], hullP[h]);
      else p = hullP[h - 1] + ((hullP[h] - hullP[h - 1]) * (z - hullZ[h - 1])) / (hullZ[h] - hullZ[h - 1]);
      pv[k] = Math.min(p, pLinear[k]);
    }
    if (!anyDependent) break;
    let settled = true;
    for (let i = 0; i < n; i++) {
      if (!dependent[i]) continue;
      const rh = (Math.min(100, (100 * pv[i]) / pSat[i]) + Math.min(100, (100 * pv[i + 1]) / pSat[i + 1])) / 2;
      next[i] = cavityPermeance(a.layers[i], rh);
      if (Math.abs(next[i] - perms[i]) > RH_SETTLED * perms[i]) settled = false;
    }
    // Stop when settled: the profile above was computed with the permeances reported.
    if (settled) break;
    if (pass + 1 >= MAX_RH_ITERATIONS) {
      converged = false;
      break;
    }
    for (let i = 0; i < n; i++)
      if (dependent[i]) perms[i] = pass < RH_DAMP_AFTER ? next[i] : Math.sqrt(next[i] * perms[i]);
  }
  if (!converged)
    notes.push("The humidity-dependent permeances did not settle within 0.5 %; the figures are from the last pass.");
  // Condensation planes: hull vertices that are saturation points below the straight line.
  const planes: CondensationPlane[] = [];
  let totalRate = 0;
  for (let h = 0; h < hullLength; h++) {
    const k = hullK[h];
    if (k < 0 || pLinear[k] <= pSat[k]) continue;
    // Flows in kg/(m²·s): from the interior side (higher z) and onward to the exterior side.
    const inflow = h + 1 < hullLength ? (hullP[h + 1] - hullP[h]) / (hullZ[h + 1] - hullZ[h]) : 0;
    const outflow = h > 0 ? (hullP[h] - hullP[h - 1]) / (hullZ[h] - hullZ[h - 1]) : 0;
    const surface = h === 0 || h === hullLength - 1;
    // Flow toward the plane from both sides: inward drive arrives from the exterior side.
    const rate = Math.max(0, Math.abs(inflow - outflow));
    planes.push({
      interfaceIndex: k,
      label: surface ? `${labels[k]} (surface condensation; rate not modelled)` : labels[k],
      t_c: t[k],
      rate_g_m2_day: surface ? 0 : kgPerSToGPerDay(rate),
    });
    totalRate += planes[planes.length - 1].rate_g_m2_day;
  }

  const condensing = new Array<boolean>(n + 1).fill(false);
  for (const pl of planes) condensing[pl.interfaceIndex] = true;
  const interfaces: ProfileInterface[] = new Array(n + 1);
  for (let k = 0; k <= n; k++) {
    interfaces[k] = {
      position_mm: pos[k],
      label: labels[k],
      t_c: t[k],
      t_f: cToF(t[k]),
      p_sat_pa: pSat[k],
      p_v_pa: pv[k],
      rh: (100 * pv[k]) / pSat[k],
      p_v_linear_pa: pLinear[k],
      condensing: condensing[k],
    };
  }

  const dry = prep.dry;
  const first = planes.length === 0 ? null : c.name === "winter" ? planes[planes.length - 1] : planes[0];
  const sourceP = c.source === "interior" ? pInt : pExt;
  const sourceDew = dewPointFromVapourPressure(Math.max(sourceP, 1e-3));
  const marginIndex = first ? first.interfaceIndex : candidateSurface(a, c.name, c.vapourStart, prep);
  const vapourLayers: VapourLayer[] = new Array(n);
  for (let i = 0; i < n; i++) {
    vapourLayers[i] = {
      index: i,
      material: a.layers[i].material.slug,
      perm_ng: dry[i],
      perm_us: prep.dryPermUs[i],
      class: prep.dryClass[i],
      case_perm_ng: perms[i],
    };
  }

  return {
    name: c.name,
    description: c.description,
    path: "clear-cavity",
    boundaryIndex: c.vapourStart,
    exterior: { t_c: c.exterior.t_c, rh: c.exterior.rh, p_v_pa: pExt, label: c.exterior.label },
    interior: { t_c: c.interior.t_c, rh: c.interior.rh, p_v_pa: pInt },
    interfaces,
    condensingPlanes: planes,
    firstCondensingSurface: first
      ? { interfaceIndex: first.interfaceIndex, label: labels[first.interfaceIndex], t_c: first.t_c }
      : null,
    margin_c: t[marginIndex] - sourceDew,
    marginSurface: labels[marginIndex],
    sourceDewPoint_c: sourceDew,
    rate_g_m2_day: totalRate,
    vapourLayers,
    studPath: stud ? { interfaces_t_c: stud.t, margin_c: stud.t[marginIndex] - sourceDew } : null,
    notes,
  };
}

export { profileChartSeries } from "./profile-series";
