// Seasonal moisture balance by the ISO 13788:2012 monthly method (Glaser, month by month).
//
// Each month is a steady state at that month's mean outdoor and indoor conditions. Vapour pressure
// runs along the tightest string from outdoors to indoors that stays at or below saturation (the
// lower convex hull of the saturation points, as in the design-day profile), except that every
// interface already holding water is pinned at saturation. At each bend the vapour arriving minus
// the vapour leaving is condensation (positive) or evaporation (negative, while water is held),
// times the days of the month. The balance starts in the first month that condenses after one that
// does not (ISO 13788 §6), runs twelve months, and reports the peak, the month the water is gone,
// and whether water is left after the year (it then accumulates year on year).
//
// Conventions (why): temperatures on the clear-cavity path (framed layers conduct only through
// their fill: the worst case, as the design-day profile); the engine's winter air films all year,
// with no vapour resistance; layers outboard of a ventilated cavity drop out and the cavity's still
// air replaces the outdoor film; below grade the soil face sits at the ground temperature, saturated,
// all year. Humidity-dependent permeances are evaluated at the mean RH of each layer's faces on the
// month's corrected (condensing, pinned) profile, iterated until they settle. Interior-surface mould:
// ISO 13788 §5 temperature factor with Rsi 0.25 and Rse 0.04 on the coldest (framing) path, against a
// critical surface humidity of 80 % (docs/references.md §7.2 notes, M).
import { indoorHumidity, indoorTemperature } from "./indoor-climate";
import { MONTH_DAYS } from "./climate-year";
import {
  hasTemperatureDependentConductivity,
  lowerName,
  materialRsi,
  materialRsiAt,
  ventedCavityIndex,
  type ResolvedAssembly,
} from "./layers";
import { dewPointFromVapourPressure, saturationPressure } from "./psychrometrics";
import { filmsFor, isBelowGrade, stillAirFilm } from "./thermal";
import type {
  ClimateYear,
  InterfaceWater,
  ResolvedSite,
  SeasonalMonth,
  SeasonalResult,
  SurfaceMouldCheck,
} from "./types";
import { isRhDependent, layerPermeance } from "./vapour";

const NG_TO_KG = 1e-12;
const SECONDS_PER_DAY = 86400;
const KG_TO_G = 1000;
/** Below this (g/m² over a month) a rate is rounding, not condensation. */
const TRACE_G_M2 = 1e-6;
const MAX_RH_PASSES = 8;
const RH_SETTLED = 0.02;
/** ISO 13788 §5: surface resistances for the mould check and the critical surface humidity. */
export const MOULD_RSI = 0.25;
export const MOULD_RSE = 0.04;
export const CRITICAL_SURFACE_RH = 0.8;

export const MONTHLY_METHOD =
  "ISO 13788:2012 monthly method (Glaser): monthly mean conditions in steady state, clear-cavity path, " +
  "condensate held at each interface and evaporated in later months; humidity-dependent permeances at each month's humidity.";

/** One month's boundary conditions (SI). */
export interface MonthConditions {
  days: number;
  outdoor: { t_c: number; rh: number; p_v_pa: number };
  indoor: { t_c: number; rh: number; p_v_pa: number };
}

/** Everything about the stack that does not change from month to month. */
interface Stack {
  n: number;
  start: number;
  extFilm: number;
  intFilm: number;
  fixedSurface: boolean;
  r: Float64Array;
  tempDependent: boolean;
  dependent: boolean[];
  anyDependent: boolean;
  /** Vapour resistance of fixed-permeance layers, (m²·s·Pa)/kg; 0 outboard of the start. */
  z: Float64Array;
}

function buildStack(a: ResolvedAssembly): Stack {
  const n = a.layers.length;
  const below = isBelowGrade(a.kind);
  const vent = below ? -1 : ventedCavityIndex(a);
  const start = vent + 1;
  const films = filmsFor(a.kind, "winter");
  const extFilm = below ? 0 : vent >= 0 ? stillAirFilm(a.kind).rsi : (films.exterior?.rsi ?? 0);
  const r = new Float64Array(n);
  const z = new Float64Array(n);
  const dependent: boolean[] = [];
  let tempDependent = false;
  for (let i = 0; i < n; i++) {
    const l = a.layers[i];
    const dep = isRhDependent(l.material) || (l.framing !== null && isRhDependent(l.framing.material));
    dependent.push(i >= start && dep);
    if (i < start) continue;
    r[i] = materialRsi(l.material, l.thickness_mm);
    if (hasTemperatureDependentConductivity(l.material)) tempDependent = true;
    z[i] = 1 / (layerPermeance(l) * NG_TO_KG);
  }
  return {
    n,
    start,
    extFilm,
    intFilm: films.interior.rsi,
    fixedSurface: below,
    r,
    tempDependent,
    dependent,
    anyDependent: dependent.includes(true),
    z,
  };
}

/** One solved month: temperatures, saturation, layer vapour resistances (settled), vapour pressure
 * and the net rate (kg/(m²·s)) at each interface. */
interface Solved {
  t: Float64Array;
  pSat: Float64Array;
  z: Float64Array;
  zCum: Float64Array;
  p: Float64Array;
  rate: Float64Array;
  pExt: number;
  pInt: number;
}

function newSolved(n: number): Solved {
  return {
    t: new Float64Array(n + 1),
    pSat: new Float64Array(n + 1),
    z: new Float64Array(n),
    zCum: new Float64Array(n + 1),
    p: new Float64Array(n + 1),
    rate: new Float64Array(n + 1),
    pExt: 0,
    pInt: 0,
  };
}

/** Scratch reused between calls, per stack size (typed arrays are costly to allocate): twelve dry
 * months, one wet, and the balance's accumulators. The result copies numbers out of them, so nothing
 * outside this module holds a reference. */
interface Scratch {
  months: Solved[];
  held: Float64Array;
  heldBy: Float64Array;
  rateBy: Float64Array;
  condensed: Float64Array;
  evaporated: Float64Array;
  total: Float64Array;
  wet: Uint8Array;
  dry: Uint8Array;
}
const pools = new Map<number, Scratch>();
function scratchFor(n: number): Scratch {
  let pool = pools.get(n);
  if (!pool) {
    pool = {
      months: Array.from({ length: 13 }, () => newSolved(n)),
      held: new Float64Array(n + 1),
      heldBy: new Float64Array(12 * (n + 1)),
      rateBy: new Float64Array(12 * (n + 1)),
      condensed: new Float64Array(12),
      evaporated: new Float64Array(12),
      total: new Float64Array(12),
      wet: new Uint8Array(n + 1),
      dry: new Uint8Array(n + 1),
    };
    pools.set(n, pool);
  }
  for (const a of [pool.held, pool.heldBy, pool.rateBy, pool.condensed, pool.evaporated, pool.total, pool.wet])
    a.fill(0);
  return pool;
}

function copySolved(from: Solved, to: Solved): void {
  to.t.set(from.t);
  to.pSat.set(from.pSat);
  to.z.set(from.z);
  to.pExt = from.pExt;
  to.pInt = from.pInt;
}

/** Temperatures at the n + 1 interfaces (clear-cavity path); insulations whose conductivity
 * depends on temperature are re-evaluated once at their mean temperature. */
function temperatures(a: ResolvedAssembly, s: Stack, te: number, ti: number, out: Float64Array): void {
  let total = s.extFilm + s.intFilm;
  for (let i = s.start; i < s.n; i++) total += s.r[i];
  fillTemperatures(s, s.r, total, te, ti, out);
  if (!s.tempDependent) return;
  const r2 = Float64Array.from(s.r);
  let total2 = s.extFilm + s.intFilm;
  for (let i = s.start; i < s.n; i++) {
    const l = a.layers[i];
    r2[i] = materialRsiAt(l.material, l.thickness_mm, (out[i] + out[i + 1]) / 2);
    total2 += r2[i];
  }
  fillTemperatures(s, r2, total2, te, ti, out);
}

function fillTemperatures(s: Stack, r: Float64Array, total: number, te: number, ti: number, out: Float64Array): void {
  let acc = s.extFilm;
  for (let k = 0; k <= s.n; k++) {
    out[k] = te + ((ti - te) * acc) / total;
    if (k < s.n && k >= s.start) acc += r[k];
  }
}

// Vertices of the vapour-pressure string (interface index, cumulative resistance, pressure): module
// scratch, `nv` long, reset by every solve; grown when a stack needs more.
let vk = new Int32Array(64);
let vz = new Float64Array(64);
let vp = new Float64Array(64);
let nv = 0;

function ensureVertices(n: number): void {
  if (vk.length >= n + 4) return;
  vk = new Int32Array(2 * n + 4);
  vz = new Float64Array(2 * n + 4);
  vp = new Float64Array(2 * n + 4);
}

/** Adds a point to the lower hull whose first vertex is at `base`. */
function hullPush(base: number, k: number, z: number, p: number): void {
  while (nv - base >= 2) {
    const ia = nv - 2;
    const ib = nv - 1;
    const cross = (vz[ib] - vz[ia]) * (p - vp[ia]) - (vp[ib] - vp[ia]) * (z - vz[ia]);
    if (cross <= 0) nv--;
    else break;
  }
  vk[nv] = k;
  vz[nv] = z;
  vp[nv] = p;
  nv++;
}

/** Lower hull of the saturation points between two anchors, appended to the vertex lists. */
function hullSegment(
  zCum: Float64Array,
  pSat: Float64Array,
  k0: number,
  z0: number,
  p0: number,
  k1: number,
  z1: number,
  p1: number,
): void {
  const base = nv;
  hullPush(base, k0, z0, p0);
  for (let k = Math.max(k0 + 1, 0); k < k1; k++) if (zCum[k] > z0 && zCum[k] < z1) hullPush(base, k, zCum[k], pSat[k]);
  hullPush(base, k1, z1, p1);
}

/** The month's temperatures, saturation pressures, boundary pressures and starting resistances
 * (humidity-dependent layers start from the previous month's settled values when given: months
 * change slowly, so the iteration settles in fewer passes). */
function prepareMonth(a: ResolvedAssembly, s: Stack, c: MonthConditions, out: Solved, previous: Solved | null): void {
  const n = s.n;
  temperatures(a, s, c.outdoor.t_c, c.indoor.t_c, out.t);
  for (let k = 0; k <= n; k++) out.pSat[k] = saturationPressure(out.t[k]);
  // The outdoor vapour pressure cannot exceed saturation at the face it meets, nor the indoor at the
  // interior surface (that is surface condensation, which the mould check covers).
  out.pExt = s.fixedSurface ? out.pSat[s.start] : Math.min(c.outdoor.p_v_pa, out.pSat[s.start]);
  out.pInt = Math.min(c.indoor.p_v_pa, out.pSat[n]);
  if (previous && s.anyDependent) {
    out.z.set(previous.z);
    return;
  }
  out.z.set(s.z);
  if (s.anyDependent) {
    const rh0 = (c.indoor.rh + c.outdoor.rh) / 2;
    for (let i = 0; i < n; i++) if (s.dependent[i]) out.z[i] = 1 / (layerPermeance(a.layers[i], rh0) * NG_TO_KG);
  }
}

/** The string with wet interfaces pinned at saturation; humidity-dependent resistances iterated on
 * it from their current values until they settle. */
function solveVapour(a: ResolvedAssembly, s: Stack, wet: Uint8Array, out: Solved): void {
  const n = s.n;
  ensureVertices(n);
  const { zCum, pSat, p, z } = out;
  for (let pass = 0; ; pass++) {
    zCum[0] = 0;
    for (let i = 0; i < n; i++) zCum[i + 1] = zCum[i] + z[i];
    const zTot = zCum[n];
    // Anchors: the two boundary air states and every interface holding water (at saturation).
    nv = 0;
    let k0 = -1;
    let z0 = 0;
    let p0 = out.pExt;
    for (let k = s.start + 1; k < n; k++) {
      if (!wet[k]) continue;
      hullSegment(zCum, pSat, k0, z0, p0, k, zCum[k], pSat[k]);
      nv--;
      k0 = k;
      z0 = zCum[k];
      p0 = pSat[k];
    }
    hullSegment(zCum, pSat, k0, z0, p0, n + 1, zTot, out.pInt);
    // Vapour pressure at every interface along the string.
    let h = 1;
    for (let k = 0; k <= n; k++) {
      const zk = zCum[k];
      while (h < nv - 1 && vz[h] < zk) h++;
      const dz = vz[h] - vz[h - 1];
      p[k] = dz > 0 ? vp[h - 1] + ((vp[h] - vp[h - 1]) * (zk - vz[h - 1])) / dz : vp[h - 1];
    }
    if (!s.anyDependent || pass + 1 >= MAX_RH_PASSES) break;
    let settled = true;
    for (let i = 0; i < n; i++) {
      if (!s.dependent[i]) continue;
      const rh = (Math.min(100, (100 * p[i]) / pSat[i]) + Math.min(100, (100 * p[i + 1]) / pSat[i + 1])) / 2;
      const zNew = 1 / (layerPermeance(a.layers[i], rh) * NG_TO_KG);
      if (Math.abs(zNew - z[i]) > RH_SETTLED * z[i]) settled = false;
      z[i] = zNew;
    }
    if (settled) break;
  }
  out.rate.fill(0);
  for (let h = 1; h < nv - 1; h++) {
    const k = vk[h];
    if (k <= s.start || k >= n) continue;
    const inflow = (vp[h + 1] - vp[h]) / (vz[h + 1] - vz[h]);
    const outflow = (vp[h] - vp[h - 1]) / (vz[h] - vz[h - 1]);
    out.rate[k] = inflow - outflow;
  }
}

function interfaceLabel(a: ResolvedAssembly, k: number): string {
  const n = a.layers.length;
  if (k === 0)
    return `${isBelowGrade(a.kind) ? "soil-side face" : "exterior face"} of ${lowerName(a.layers[0].material)}`;
  if (k === n) return `interior face of ${lowerName(a.layers[n - 1].material)}`;
  return `${lowerName(a.layers[k - 1].material)} / ${lowerName(a.layers[k].material)}`;
}

/** Monthly boundary conditions from the site year and the site's indoor method. */
export function monthConditions(site: ResolvedSite, year: ClimateYear): MonthConditions[] {
  return year.months.map((m, i) => {
    const outdoor = { t_c: m.t_c, rh: m.rh, p_v_pa: (saturationPressure(m.t_c) * m.rh) / 100 };
    const ti = indoorTemperature(m.t_c, site.indoor.t_c, site.indoor.summer_t_c);
    const method = site.indoor.method;
    const indoor =
      method === "given"
        ? { t_c: ti, rh: site.indoor.rh, p_v_pa: (saturationPressure(ti) * site.indoor.rh) / 100 }
        : indoorHumidity(method, outdoor, ti);
    return { days: MONTH_DAYS[i], outdoor, indoor };
  });
}

/** Interior-surface temperature factor against the critical surface humidity, month by month. */
function mouldCheck(
  a: ResolvedAssembly,
  s: Stack,
  months: readonly MonthConditions[],
  names: readonly string[],
  groundT: number | null,
): { check: SurfaceMouldCheck; byMonth: (number | null)[] } {
  // Coldest path: through the framing wherever it conducts more than the fill.
  let r = MOULD_RSI + (s.fixedSurface ? 0 : MOULD_RSE);
  for (let i = s.start; i < s.n; i++) {
    const l = a.layers[i];
    const fill = materialRsi(l.material, l.thickness_mm);
    r += l.framing ? Math.min(fill, materialRsi(l.framing.material, l.thickness_mm)) : fill;
  }
  const fRsi = (r - MOULD_RSI) / r;
  const byMonth = months.map((m) => {
    const te = groundT ?? m.outdoor.t_c;
    const ti = m.indoor.t_c;
    // Bone-dry indoor air (dew point below about −90 °C) asks nothing of the surface.
    if (ti - te < 0.5 || m.indoor.p_v_pa / CRITICAL_SURFACE_RH < 0.01) return null;
    const tsiMin = dewPointFromVapourPressure(m.indoor.p_v_pa / CRITICAL_SURFACE_RH);
    const f = (tsiMin - te) / (ti - te);
    return Number.isFinite(f) ? f : null;
  });
  let fRsiMax: number | null = null;
  let criticalMonth: number | null = null;
  byMonth.forEach((f, i) => {
    if (f !== null && (fRsiMax === null || f > fRsiMax)) {
      fRsiMax = f;
      criticalMonth = i + 1;
    }
  });
  const pass = fRsiMax === null || fRsi > fRsiMax;
  const fmt = (v: number): string => v.toFixed(3);
  return {
    byMonth,
    check: {
      method: `ISO 13788:2012 §5 temperature factor, Rsi ${MOULD_RSI} and Rse ${s.fixedSurface ? 0 : MOULD_RSE} m²·K/W, critical surface humidity ${CRITICAL_SURFACE_RH * 100} %, coldest (framing) path; corners and other thermal bridges are not modelled`,
      fRsi,
      fRsiMax,
      criticalMonth,
      pass,
      explanation:
        fRsiMax === null
          ? "No month has heat loss through the assembly: no surface mould risk from cold surfaces."
          : `The inside surface on the coldest path has a temperature factor of ${fmt(fRsi)}; the month that asks most (${names[(criticalMonth ?? 1) - 1]}) needs more than ${fmt(fRsiMax)} to keep the surface below 80 % RH. ${pass ? "It passes." : "It fails: the inside surface is cold enough for mould."}`,
    },
  };
}

// ISO 13788:2012 leaves ground contact out of the monthly method's scope (from memory): the soil face
// is held saturated at the ground temperature all year, so condensate there can never evaporate
// outward, and the wall's own moisture from the soil is not modelled at all.
const SOIL_SCOPE_NOTE =
  "Against soil the monthly method is outside its scope: the soil face is held saturated at ground temperature all year, so these figures are shown for reference and raise no flag. The top of the wall (above grade and at frost depth) and the design-day cases judge this assembly.";

/** The seasonal balance of an assembly over a site year. */
export function seasonalBalance(a: ResolvedAssembly, site: ResolvedSite, year: ClimateYear): SeasonalResult {
  const s = buildStack(a);
  const n = s.n;
  const months = monthConditions(site, year);
  const groundT = s.fixedSurface ? site.ground_t_c : null;
  if (s.fixedSurface) {
    for (const m of months) {
      const p = saturationPressure(site.ground_t_c);
      m.outdoor = { t_c: site.ground_t_c, rh: 100, p_v_pa: p };
    }
  }
  const scratch = scratchFor(n);
  const { dry, held, heldBy, rateBy, condensed, evaporated, total, wet } = scratch;
  const pool = scratch.months;
  const drySolved = months.map((m, i) => {
    const o = pool[i];
    prepareMonth(a, s, m, o, i > 0 ? pool[i - 1] : null);
    solveVapour(a, s, dry, o);
    return o;
  });
  const condenses = drySolved.map((o, i) => {
    let g = 0;
    for (let k = 0; k <= n; k++) g += Math.max(0, o.rate[k]);
    return g * SECONDS_PER_DAY * KG_TO_G * months[i].days > TRACE_G_M2;
  });

  // Start: the first condensing month after a month without; if every month condenses, the month
  // after the warmest.
  let startIdx: number | null = null;
  for (let i = 0; i < 12; i++)
    if (condenses[i] && !condenses[(i + 11) % 12]) {
      startIdx = i;
      break;
    }
  if (startIdx === null && condenses.every(Boolean)) {
    let warm = 0;
    for (let i = 1; i < 12; i++) if (year.months[i].t_c > year.months[warm].t_c) warm = i;
    startIdx = (warm + 1) % 12;
  }

  const work = pool[12];
  if (startIdx !== null) {
    for (let step = 0; step < 12; step++) {
      const mi = (startIdx + step) % 12;
      let anyWet = false;
      for (let k = 0; k <= n; k++) {
        wet[k] = held[k] > 0 ? 1 : 0;
        if (wet[k]) anyWet = true;
      }
      let o = drySolved[mi];
      if (anyWet) {
        copySolved(o, work);
        solveVapour(a, s, wet, work);
        o = work;
      }
      const seconds = months[mi].days * SECONDS_PER_DAY;
      for (let k = 0; k <= n; k++) {
        const delta = o.rate[k] * seconds * KG_TO_G;
        rateBy[mi * (n + 1) + k] = o.rate[k] * SECONDS_PER_DAY * KG_TO_G;
        if (delta > 0) {
          condensed[mi] += delta;
          held[k] += delta;
        } else if (delta < 0 && held[k] > 0) {
          const out = Math.min(held[k], -delta);
          evaporated[mi] += out;
          held[k] -= out;
          if (held[k] < TRACE_G_M2) {
            evaporated[mi] += held[k];
            held[k] = 0;
          }
        }
        heldBy[mi * (n + 1) + k] = held[k];
        total[mi] += held[k];
      }
    }
  }

  // Interfaces that held water at some point; the critical one held the most.
  const everWet: number[] = [];
  let critical = -1;
  let criticalPeak = 0;
  for (let k = 0; k <= n; k++) {
    let peak = 0;
    for (let mi = 0; mi < 12; mi++) peak = Math.max(peak, heldBy[mi * (n + 1) + k]);
    if (peak > 0) everWet.push(k);
    if (peak > criticalPeak) {
      criticalPeak = peak;
      critical = k;
    }
  }
  let peak = 0;
  let peakIdx: number | null = null;
  for (let mi = 0; mi < 12; mi++)
    if (total[mi] > peak) {
      peak = total[mi];
      peakIdx = mi;
    }
  const endIdx = startIdx === null ? null : (startIdx + 11) % 12;
  const endOfYear = endIdx === null ? 0 : total[endIdx];
  let driesOut: number | null = null;
  if (startIdx !== null && endOfYear === 0) {
    // The last month (in balance order) whose end finds the stack dry after holding water.
    for (let step = 1; step < 12; step++) {
      const mi = (startIdx + step) % 12;
      const prev = (startIdx + step - 1) % 12;
      if (total[mi] === 0 && total[prev] > 0) driesOut = mi + 1;
    }
  }
  const verdict: SeasonalResult["verdict"] =
    startIdx === null || peak === 0 ? "no-condensation" : endOfYear > 0 ? "accumulates" : "dries-within-year";

  const mould = mouldCheck(
    a,
    s,
    months,
    year.months.map((m) => m.name),
    groundT,
  );
  const labels = new Map<number, string>();
  const label = (k: number): string => {
    let l = labels.get(k);
    if (l === undefined) {
      l = interfaceLabel(a, k);
      labels.set(k, l);
    }
    return l;
  };

  const result: SeasonalMonth[] = months.map((m, mi) => {
    const o = drySolved[mi];
    // Margin: the interface closest to saturation on the straight (uncondensed) line.
    const zTot = o.zCum[n];
    let kMin = n;
    let worst = Number.POSITIVE_INFINITY;
    const from = Math.min(s.start + 1, n);
    for (let k = from; k <= n; k++) {
      const pLin = o.pExt + ((o.pInt - o.pExt) * o.zCum[k]) / zTot;
      const ratio = o.pSat[k] / Math.max(pLin, 1e-3);
      if (ratio < worst) {
        worst = ratio;
        kMin = k;
      }
    }
    const pLinMin = o.pExt + ((o.pInt - o.pExt) * o.zCum[kMin]) / zTot;
    const interfaces: InterfaceWater[] = everWet.map((k) => ({
      interfaceIndex: k,
      label: label(k),
      accumulated_g_m2: heldBy[mi * (n + 1) + k],
      rate_g_m2_day: rateBy[mi * (n + 1) + k],
    }));
    return {
      month: mi + 1,
      name: year.months[mi].name,
      days: m.days,
      outdoor: { ...m.outdoor },
      indoor: { ...m.indoor },
      condensed_g_m2: condensed[mi],
      evaporated_g_m2: evaporated[mi],
      accumulated_g_m2: total[mi],
      critical_g_m2: critical >= 0 ? heldBy[mi * (n + 1) + critical] : 0,
      margin_c: o.t[kMin] - dewPointFromVapourPressure(Math.max(pLinMin, 1e-3)),
      marginInterface: label(kMin),
      interfaces,
      fRsiMin: mould.byMonth[mi],
    };
  });

  const name = (i: number | null): string => (i === null ? "" : year.months[i].name);
  const g = (v: number): string => (v < 10 ? v.toFixed(1) : Math.round(v).toString());
  const explanation =
    verdict === "no-condensation"
      ? "No month condenses inside the assembly at these monthly conditions."
      : verdict === "dries-within-year"
        ? `Condensation starts in ${name(startIdx)} and peaks at ${g(peak)} g/m² in ${name(peakIdx)}${critical >= 0 ? ` at ${label(critical)}` : ""}; it has all evaporated by the end of ${driesOut === null ? "the year" : year.months[driesOut - 1].name}: the assembly dries within the year.`
        : `Condensation starts in ${name(startIdx)} and ${g(endOfYear)} g/m² is still held twelve months later${critical >= 0 ? ` at ${label(critical)}` : ""}: water accumulates year on year.`;

  return {
    method: MONTHLY_METHOD,
    climate: year,
    indoorMethod: site.indoor.method,
    startMonth: startIdx === null ? null : startIdx + 1,
    months: result,
    criticalInterface: critical >= 0 ? { interfaceIndex: critical, label: label(critical) } : null,
    peak_g_m2: peak,
    peakMonth: peakIdx === null ? null : peakIdx + 1,
    driesOutMonth: driesOut,
    endOfYear_g_m2: endOfYear,
    verdict,
    surface: mould.check,
    explanation,
    scopeNote: isBelowGrade(a.kind) ? SOIL_SCOPE_NOTE : null,
  };
}
