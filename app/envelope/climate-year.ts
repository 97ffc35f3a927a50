// The site year: 12 monthly mean outdoor temperatures and relative humidities, typed, read from a
// 12-row CSV, or generated from the site's degree-days and design conditions (docs/site-climate.md).
import { SiteCheckInputError } from "./errors";
import type { ClimateYear, ClimateYearInput, MonthClimate, MonthInput, ResolvedSite } from "./types";

export const MONTH_NAMES = [
  "Jan",
  "Feb",
  "Mar",
  "Apr",
  "May",
  "Jun",
  "Jul",
  "Aug",
  "Sep",
  "Oct",
  "Nov",
  "Dec",
] as const;
/** Days per month of a common year (the balance runs over 365 days). */
export const MONTH_DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31] as const;

const T_MIN = -60;
const T_MAX = 50;

/** A bad CSV line: `line` is 1-based, so a form can point at it. */
export class ClimateCsvError extends SiteCheckInputError {
  readonly line: number | null;
  constructor(line: number | null, message: string) {
    super("year.csv", line === null ? message : `line ${line}: ${message}`);
    this.name = "ClimateCsvError";
    this.line = line;
  }
}

function checkMonth(t: unknown, rh: unknown, field: string): { t_c: number; rh: number } {
  if (typeof t !== "number" || !Number.isFinite(t) || t < T_MIN || t > T_MAX) {
    throw new SiteCheckInputError(
      `${field}.t_c`,
      `monthly mean temperature must be a number from ${T_MIN} to ${T_MAX} °C (got ${String(t)})`,
    );
  }
  if (typeof rh !== "number" || !Number.isFinite(rh) || rh <= 0 || rh > 100) {
    throw new SiteCheckInputError(
      `${field}.rh`,
      `monthly mean relative humidity must be a number above 0 and at most 100 % (got ${String(rh)})`,
    );
  }
  return { t_c: t, rh };
}

/** Twelve typed months, January first. */
export function validateMonths(rows: unknown, field = "year.months"): MonthClimate[] {
  if (!Array.isArray(rows) || rows.length !== 12) {
    throw new SiteCheckInputError(
      field,
      `give exactly 12 months, January to December (got ${Array.isArray(rows) ? rows.length : "none"})`,
    );
  }
  return rows.map((row: unknown, i) => {
    const r = (row ?? {}) as Partial<MonthInput>;
    const m = checkMonth(r.t_c, r.rh, `${field}[${i}]`);
    return { month: i + 1, name: MONTH_NAMES[i], ...m };
  });
}

const HEADER = ["month", "temperature_c", "rh_percent"];

function monthNumber(text: string): number | null {
  if (/^\d{1,2}$/.test(text)) {
    const n = Number(text);
    return n >= 1 && n <= 12 ? n : null;
  }
  const i = MONTH_NAMES.findIndex((m) => m.toLowerCase() === text.slice(0, 3).toLowerCase());
  return i >= 0 && text.length >= 3 ? i + 1 : null;
}

function parseNumber(text: string): number | null {
  if (!/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(text)) return null;
  return Number(text);
}

/** Reads `month,temperature_c,rh_percent`: an optional header row, then one row per month (1–12
 * or Jan–Dec, each once, any order). Blank lines and lines starting with # are skipped. Errors name
 * the line. */
export function parseClimateCsv(text: string): MonthClimate[] {
  if (typeof text !== "string" || text.trim() === "")
    throw new ClimateCsvError(null, "the file is empty; it needs 12 rows: month,temperature_c,rh_percent");
  const lines = text.replace(/^\uFEFF/, "").split(/\r\n|\r|\n/);
  const byMonth = new Map<number, MonthClimate>();
  let seenData = false;
  for (let i = 0; i < lines.length; i++) {
    const line = i + 1;
    const raw = lines[i].trim();
    if (raw === "" || raw.startsWith("#")) continue;
    const cells = raw.split(",").map((c) => c.trim());
    if (!seenData && cells.map((c) => c.toLowerCase()).join(",") === HEADER.join(",")) continue;
    seenData = true;
    if (cells.length !== 3)
      throw new ClimateCsvError(line, `expected 3 values (month,temperature_c,rh_percent), found ${cells.length}`);
    const month = monthNumber(cells[0]);
    if (month === null) throw new ClimateCsvError(line, `"${cells[0]}" is not a month; use 1–12 or Jan–Dec`);
    if (byMonth.has(month)) throw new ClimateCsvError(line, `${MONTH_NAMES[month - 1]} appears twice`);
    const t = parseNumber(cells[1]);
    if (t === null || t < T_MIN || t > T_MAX)
      throw new ClimateCsvError(line, `temperature "${cells[1]}" must be a number from ${T_MIN} to ${T_MAX} °C`);
    const rh = parseNumber(cells[2]);
    if (rh === null || rh <= 0 || rh > 100)
      throw new ClimateCsvError(
        line,
        `relative humidity "${cells[2]}" must be a number above 0 and at most 100 (percent)`,
      );
    byMonth.set(month, { month, name: MONTH_NAMES[month - 1], t_c: t, rh });
  }
  const missing = MONTH_NAMES.filter((_, i) => !byMonth.has(i + 1));
  if (missing.length)
    throw new ClimateCsvError(null, `missing ${missing.join(", ")}: the file needs one row for each of the 12 months`);
  return MONTH_NAMES.map((_, i) => byMonth.get(i + 1) as MonthClimate);
}

// ---- Generated year ------------------------------------------------------------------------------
// Monthly means follow an annual cosine, coldest in January and warmest in July (northern
// hemisphere): T_i = T_mean − A·cos(2π·i/12), i = 0 for January. The mean and the amplitude are fitted
// so that the monthly means reproduce the site's degree-days, counted month by month as
// Σ days_i·max(0, 18 − T_i) and Σ days_i·max(0, T_i − 10). Monthly means miss the cold days of mild
// months, so this fit gives a somewhat colder or wider year than the station's: the safe side for
// winter condensation. With only heating degree-days, the amplitude is half the spread of the design
// temperatures (A = ½ · (T_summer − T_winter) / 2: Dryside's assumption, not a published rule).
// Without degree-days, the cold end of the zone's HDD band is used. Relative humidity follows the
// same curve from the winter design RH in January to the summer design RH in July.

const HDD_BASE = 18;
const CDD_BASE = 10;
/** Cold end of each zone's HDD18 band (ASHRAE 169-2013 / IECC 2021, docs/references.md §6.3); zone 8 is
 * open-ended and 9000 is taken. Zones 0–2 are set by cooling degree-days instead (below). */
const ZONE_COLD_HDD: Readonly<Record<number, number>> = { 3: 2000, 4: 3000, 5: 4000, 6: 5000, 7: 7000, 8: 9000 };
/** Low end of the CDD10 band of zones 0–2 (the cooler side). */
const ZONE_LOW_CDD: Readonly<Record<number, number>> = { 0: 6000, 1: 5000, 2: 3500 };
const DESIGN_SPREAD_TO_AMPLITUDE = 0.5;

const COS = MONTH_DAYS.map((_, i) => Math.cos((2 * Math.PI * i) / 12));

function cosineTemps(mean: number, amplitude: number): number[] {
  return COS.map((c) => mean - amplitude * c);
}

/** Heating or cooling degree-days of the cosine year, without building arrays (the fit calls it
 * thousands of times). */
function cosineDegreeDays(mean: number, amplitude: number, kind: "hdd18" | "cdd10"): number {
  let dd = 0;
  for (let i = 0; i < 12; i++) {
    const t = mean - amplitude * COS[i];
    dd += MONTH_DAYS[i] * (kind === "hdd18" ? Math.max(0, HDD_BASE - t) : Math.max(0, t - CDD_BASE));
  }
  return dd;
}

/** Degree-days of a year of monthly means. */
export function monthlyDegreeDays(temps: readonly number[]): { hdd18: number; cdd10: number } {
  let hdd18 = 0;
  let cdd10 = 0;
  for (let i = 0; i < 12; i++) {
    hdd18 += MONTH_DAYS[i] * Math.max(0, HDD_BASE - temps[i]);
    cdd10 += MONTH_DAYS[i] * Math.max(0, temps[i] - CDD_BASE);
  }
  return { hdd18, cdd10 };
}

/** Mean temperature at which a cosine of this amplitude gives the target degree-days (bisection:
 * HDD falls and CDD rises with the mean). */
function meanFor(amplitude: number, target: number, kind: "hdd18" | "cdd10"): number {
  let lo = -60;
  let hi = 50;
  for (let k = 0; k < 40; k++) {
    const mid = (lo + hi) / 2;
    const dd = cosineDegreeDays(mid, amplitude, kind);
    const tooCold = kind === "hdd18" ? dd > target : dd < target;
    if (tooCold) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/** Mean and amplitude matching both degree-days: for each amplitude the mean matches HDD; the
 * amplitude is then chosen to match CDD (scan, then bisection on the bracketing step). */
function fitBoth(hdd18: number, cdd10: number): { mean: number; amplitude: number } {
  const miss = (a: number): number => cosineDegreeDays(meanFor(a, hdd18, "hdd18"), a, "cdd10") - cdd10;
  let best = { a: 0, err: Math.abs(miss(0)) };
  let prev = { a: 0, m: miss(0) };
  for (let a = 1; a <= 30; a += 1) {
    const m = miss(a);
    if (Math.abs(m) < best.err) best = { a, err: Math.abs(m) };
    if (Math.sign(m) !== Math.sign(prev.m)) {
      let lo = prev.a;
      let hi = a;
      for (let k = 0; k < 24; k++) {
        const mid = (lo + hi) / 2;
        if (Math.sign(miss(mid)) === Math.sign(prev.m)) lo = mid;
        else hi = mid;
      }
      const amplitude = (lo + hi) / 2;
      return { mean: meanFor(amplitude, hdd18, "hdd18"), amplitude };
    }
    prev = { a, m };
  }
  return { mean: meanFor(best.a, hdd18, "hdd18"), amplitude: best.a };
}

const round1 = (v: number): number => Math.round(v * 10) / 10;

/** The fit is the costly part and a site is checked against many details: keep recent years. */
const generated = new Map<string, ClimateYear>();
const GENERATED_CACHE_SIZE = 256;

/** A year from the site's degree-days, design temperatures and design humidities. */
export function generateClimateYear(site: ResolvedSite): ClimateYear {
  const key = `${site.hdd18}|${site.cdd10}|${site.zoneNumber}|${site.winter.t_c}|${site.summer.t_c}|${site.winter.rh}|${site.summer.rh}`;
  const hit = generated.get(key);
  if (hit) return copyYear(hit);
  const year = fitYear(site);
  if (generated.size >= GENERATED_CACHE_SIZE) generated.delete(generated.keys().next().value as string);
  generated.set(key, year);
  return copyYear(year);
}

function copyYear(y: ClimateYear): ClimateYear {
  return { source: y.source, note: y.note, months: y.months.map((m) => ({ ...m })) };
}

function fitYear(site: ResolvedSite): ClimateYear {
  const designAmplitude = Math.max(0, (DESIGN_SPREAD_TO_AMPLITUDE * (site.summer.t_c - site.winter.t_c)) / 2);
  let mean: number;
  let amplitude: number;
  let basis: string;
  if (site.hdd18 !== null && site.cdd10 !== null && site.hdd18 > 0 && site.cdd10 > 0) {
    ({ mean, amplitude } = fitBoth(site.hdd18, site.cdd10));
    basis = `fitted to HDD18 ${Math.round(site.hdd18)} and CDD10 ${Math.round(site.cdd10)}`;
  } else if (site.hdd18 !== null && site.hdd18 > 0) {
    amplitude = designAmplitude;
    mean = meanFor(amplitude, site.hdd18, "hdd18");
    basis = `fitted to HDD18 ${Math.round(site.hdd18)}, amplitude from the design temperatures`;
  } else if (site.zoneNumber <= 2) {
    amplitude = designAmplitude;
    const cdd = site.cdd10 ?? ZONE_LOW_CDD[site.zoneNumber];
    mean = meanFor(amplitude, cdd, "cdd10");
    basis = `fitted to CDD10 ${Math.round(cdd)}${site.cdd10 === null ? ` (low end of zone ${site.zoneNumber})` : ""}, amplitude from the design temperatures`;
  } else {
    amplitude = designAmplitude;
    const hdd = ZONE_COLD_HDD[site.zoneNumber];
    mean = meanFor(amplitude, hdd, "hdd18");
    basis = `fitted to HDD18 ${hdd} (cold end of zone ${site.zoneNumber}), amplitude from the design temperatures`;
  }
  const temps = cosineTemps(mean, amplitude);
  const rhW = site.winter.rh;
  const rhS = site.summer.rh;
  const months: MonthClimate[] = temps.map((t, i) => ({
    month: i + 1,
    name: MONTH_NAMES[i],
    t_c: round1(t),
    rh: round1(Math.min(100, Math.max(1, rhW + ((rhS - rhW) * (1 - Math.cos((2 * Math.PI * i) / 12))) / 2))),
  }));
  return {
    source: "generated",
    months,
    note: `Generated: monthly means on an annual cosine (mean ${round1(mean)} °C, swing ±${round1(amplitude)} K, coldest in January), ${basis}; RH from ${round1(rhW)} % in January to ${round1(rhS)} % in July. Enter the site's monthly normals for a real year.`,
  };
}

/** The site year from the input: typed months, else a CSV, else generated. */
export function resolveClimateYear(input: ClimateYearInput | undefined, site: ResolvedSite): ClimateYear {
  if (input !== undefined && (input === null || typeof input !== "object")) {
    throw new SiteCheckInputError("year", "the site year must be an object with months (12 rows) or csv");
  }
  if (input?.months !== undefined) {
    return { source: "typed", months: validateMonths(input.months), note: "Monthly means as entered." };
  }
  if (input?.csv !== undefined) {
    return { source: "csv", months: parseClimateCsv(input.csv), note: "Monthly means from the uploaded file." };
  }
  return generateClimateYear(site);
}
