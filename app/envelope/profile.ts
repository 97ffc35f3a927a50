// Steady-state dew-point (Glaser) profiles. Temperature falls linearly in cumulative thermal
// resistance; vapour pressure, without condensation, falls linearly in cumulative vapour
// resistance. Where that line rises above saturation, the real profile is the tightest string
// from the outdoor to the indoor vapour pressure that stays at or below saturation: the lower
// convex hull of the saturation points. Each bend of the string is a condensation plane; the
// condensation rate there is the vapour flow arriving minus the flow leaving.
import { isInsulation, type ResolvedAssembly, type ResolvedLayer } from "./layers";
import { dewPointFromVapourPressure, saturationPressure } from "./psychrometrics";
import { filmsFor, isBelowGrade, seriesRsi, type Season } from "./thermal";
import type { CondensationPlane, ProfileCase, ProfileInterface, VapourLayer } from "./types";
import { cToF, kgPerSToGPerDay, ngToPerm } from "./units";
import { isRhDependent, layerPermeance, retarderClass } from "./vapour";

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
}

const NG_TO_KG = 1e-12;
const MAX_RH_ITERATIONS = 8;
const RH_SETTLED = 0.02;

/** A point of the Glaser diagram; k is the interface index, or −1 for a boundary air state. */
interface Point { z: number; p: number; k: number }

/** Lower convex hull (Andrew's monotone chain) of points sorted by z, one point per z. */
function lowerHull(points: readonly Point[]): Point[] {
  const hull: Point[] = [];
  for (const pt of points) {
    while (hull.length >= 2) {
      const a = hull[hull.length - 2];
      const b = hull[hull.length - 1];
      // Keep b only if it lies strictly below the chord a→pt (a convex turn).
      const cross = (b.z - a.z) * (pt.p - a.p) - (b.p - a.p) * (pt.z - a.z);
      if (cross <= 0) hull.pop();
      else break;
    }
    hull.push(pt);
  }
  return hull;
}

function interfaceLabels(a: ResolvedAssembly): string[] {
  const n = a.layers.length;
  const names = a.layers.map((l) => l.material.name.toLowerCase());
  const below = isBelowGrade(a.kind);
  const labels = [`${below ? "soil-side face" : "exterior face"} of ${names[0]}`];
  for (let i = 1; i < n; i++) labels.push(`${names[i - 1]} / ${names[i]}`);
  labels.push(`interior face of ${names[n - 1]}`);
  return labels;
}

function resistsVapour(l: ResolvedLayer): boolean {
  return retarderClass(layerPermeance(l)) !== "permeable";
}

/** Vapour pressure on the Glaser string at cumulative resistance z. */
function hullAt(hull: readonly Point[], z: number): number {
  for (let i = 1; i < hull.length; i++) {
    if (z <= hull[i].z) {
      const h0 = hull[i - 1];
      const h1 = hull[i];
      return h1.z === h0.z ? Math.min(h0.p, h1.p) : h0.p + ((h1.p - h0.p) * (z - h0.z)) / (h1.z - h0.z);
    }
  }
  return hull[hull.length - 1].p;
}

/** Candidate first condensing surface when the Glaser line does not condense: in winter the
 * inner face of the first vapour-resisting layer (≤ 10 perm) outboard of the innermost
 * insulation; in summer the outer face of the first such layer inboard of the outermost
 * insulation (e.g. interior polyethylene). */
function candidateSurface(a: ResolvedAssembly, season: Season, vapourStart: number): number {
  const n = a.layers.length;
  const insulation = a.layers.filter(isInsulation).map((l) => l.index);
  if (season === "winter") {
    const innermost = insulation.length ? Math.max(...insulation) : n - 1;
    for (let i = innermost - 1; i >= vapourStart; i--) if (resistsVapour(a.layers[i])) return i + 1; // inner face of layer i
    return Math.max(vapourStart, Math.min(innermost, n - 1));
  }
  const outermost = insulation.length ? Math.min(...insulation) : 0;
  for (let i = outermost + 1; i < n; i++) if (resistsVapour(a.layers[i])) return i; // outer face of layer i
  return n - 1;
}

export function computeProfile(a: ResolvedAssembly, c: CaseConditions): ProfileCase {
  const n = a.layers.length;
  const labels = interfaceLabels(a);
  const series = seriesRsi(a, c.name);
  const films = filmsFor(a.kind, c.name);
  const thermalStart = c.thermalStart ?? 0;
  const extFilm = c.fixedSurface ? 0 : thermalStart > 0 ? films.interior.rsi : films.exterior ? series.exterior : 0;
  const layerR = series.layers.map((rsi, i) => (i < thermalStart ? 0 : rsi));
  const total = extFilm + series.interior + layerR.reduce((s, rsi) => s + rsi, 0);

  // Temperatures and positions at the n + 1 interfaces.
  const t: number[] = [];
  const pos: number[] = [];
  let r = extFilm;
  let x = 0;
  const dT = c.interior.t_c - c.exterior.t_c;
  for (let k = 0; k <= n; k++) {
    t.push(c.exterior.t_c + (dT * r) / total);
    pos.push(Math.round(x * 1e6) / 1e6); // thickness sums: keep 0.1 + 0.2 from showing as 0.30000000000000004
    if (k < n) { r += layerR[k]; x += a.layers[k].thickness_mm; }
  }
  const pSat = t.map(saturationPressure);
  const pExt = c.saturatedSource ? pSat[c.vapourStart] : c.exterior.p_v_pa;

  // Permeances: RH-dependent layers are evaluated at the mean RH of their two faces, found by
  // a few passes over the uncondensed profile (it settles quickly; 2 % is far inside the
  // spread of the published curves).
  const dependent = a.layers.map((l) => isRhDependent(l.material) || (l.framing !== null && isRhDependent(l.framing.material)));
  const anyDependent = dependent.includes(true);
  const startRh = (c.interior.rh + c.exterior.rh) / 2;
  const perms = a.layers.map((l, i) => (dependent[i] ? layerPermeance(l, startRh) : layerPermeance(l)));
  let zCum: number[] = [];
  let pLinear: number[] = [];
  for (let pass = 0; ; pass++) {
    zCum = [0];
    for (let i = 0; i < n; i++) zCum.push(zCum[i] + (i < c.vapourStart ? 0 : 1 / (perms[i] * NG_TO_KG)));
    const zTot = zCum[n];
    pLinear = zCum.map((z) => pExt + ((c.interior.p_v_pa - pExt) * z) / zTot);
    if (!anyDependent || pass + 1 >= MAX_RH_ITERATIONS) break;
    let settled = true;
    const next = perms.slice();
    for (let i = 0; i < n; i++) {
      if (!dependent[i]) continue;
      const rh = (Math.min(100, (100 * pLinear[i]) / pSat[i]) + Math.min(100, (100 * pLinear[i + 1]) / pSat[i + 1])) / 2;
      next[i] = layerPermeance(a.layers[i], rh);
      if (Math.abs(next[i] - perms[i]) > RH_SETTLED * perms[i]) settled = false;
    }
    // Stop when settled; the profile above was computed with the permeances reported.
    if (settled) break;
    for (let i = 0; i < n; i++) perms[i] = next[i];
  }
  const zTot = zCum[n];

  // Glaser string: hull over (z, p_sat) with the two boundary vapour pressures; at equal z keep the
  // lowest pressure (surfaces share z with their air when films carry no vapour resistance).
  const candidates: Point[] = [{ z: 0, p: pExt, k: -1 }, { z: zTot, p: c.interior.p_v_pa, k: -1 }];
  for (let k = 0; k <= n; k++) candidates.push({ z: zCum[k], p: pSat[k], k });
  // Ties: the boundary air state first, so a surface exactly at saturation is not a plane.
  candidates.sort((p1, p2) => p1.z - p2.z || p1.p - p2.p || p1.k - p2.k);
  const unique: Point[] = [];
  for (const pt of candidates) if (!unique.length || pt.z > unique[unique.length - 1].z) unique.push(pt);
  const hull = lowerHull(unique);

  // Condensation planes: hull vertices that are saturation points below the straight line.
  const planes: CondensationPlane[] = [];
  for (let h = 0; h < hull.length; h++) {
    const v = hull[h];
    const k = v.k;
    if (k < 0 || pLinear[k] <= pSat[k]) continue;
    // Flows in kg/(m²·s): from the interior side (higher z) and onward to the exterior side.
    const inflow = h + 1 < hull.length ? (hull[h + 1].p - v.p) / (hull[h + 1].z - v.z) : 0;
    const outflow = h > 0 ? (v.p - hull[h - 1].p) / (v.z - hull[h - 1].z) : 0;
    const surface = h === 0 || h === hull.length - 1;
    // Flow toward the plane from both sides: inward drive arrives from the exterior side.
    const rate = Math.max(0, Math.abs(inflow - outflow));
    planes.push({
      interfaceIndex: k,
      label: surface ? `${labels[k]} (surface condensation; rate not modelled)` : labels[k],
      t_c: t[k],
      rate_g_m2_day: surface ? 0 : kgPerSToGPerDay(rate),
    });
  }

  const condensing = new Array<boolean>(n + 1).fill(false);
  for (const pl of planes) condensing[pl.interfaceIndex] = true;
  const interfaces: ProfileInterface[] = t.map((tc, k) => {
    const pv = Math.min(hullAt(hull, zCum[k]), pLinear[k]);
    return {
      position_mm: pos[k], label: labels[k], t_c: tc, t_f: cToF(tc), p_sat_pa: pSat[k], p_v_pa: pv,
      rh: (100 * pv) / pSat[k], p_v_linear_pa: pLinear[k], condensing: condensing[k],
    };
  });

  const first = planes.length === 0 ? null : c.name === "winter" ? planes[planes.length - 1] : planes[0];
  const sourceP = c.source === "interior" ? c.interior.p_v_pa : pExt;
  const sourceDew = dewPointFromVapourPressure(Math.max(sourceP, 1e-3));
  const marginIndex = first ? first.interfaceIndex : candidateSurface(a, c.name, c.vapourStart);
  const vapourLayers: VapourLayer[] = a.layers.map((l, i) => {
    const dry = layerPermeance(l);
    return { index: i, material: l.material.slug, perm_ng: dry, perm_us: ngToPerm(dry), class: retarderClass(dry), case_perm_ng: perms[i] };
  });

  return {
    name: c.name,
    description: c.description,
    boundaryIndex: c.vapourStart,
    exterior: { t_c: c.exterior.t_c, rh: c.exterior.rh, p_v_pa: pExt, label: c.exterior.label },
    interior: { t_c: c.interior.t_c, rh: c.interior.rh, p_v_pa: c.interior.p_v_pa },
    interfaces,
    condensingPlanes: planes,
    firstCondensingSurface: first ? { interfaceIndex: first.interfaceIndex, label: labels[first.interfaceIndex], t_c: first.t_c } : null,
    margin_c: t[marginIndex] - sourceDew,
    marginSurface: labels[marginIndex],
    sourceDewPoint_c: sourceDew,
    rate_g_m2_day: planes.reduce((s, p) => s + p.rate_g_m2_day, 0),
    vapourLayers,
  };
}

export { profileChartSeries } from "./profile-series";
