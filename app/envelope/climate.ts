// Climate zones from degree-days (IECC 2021 R301 / ASHRAE 169-2013 thermal criteria, SI bases
// HDD 18 °C and CDD 10 °C; docs/references.md §6.3), moisture regimes, Canada NBC 9.36 zones,
// and the design-condition defaults used when a site gives only its zone.
import { SiteCheckInputError } from "./errors";
import { checkIndoorMethod, DEFAULT_INDOOR_METHOD, indoorBasis, indoorHumidity } from "./indoor-climate";
import { NBC_EDITION, NBC_ZONE_BANDS, PROVINCE_REFERENCE } from "./nbc-tables";
import {
  PROVINCES,
  type CanadianSite,
  type ClimateNormals,
  type CodeEdition,
  type MoistureRegime,
  type NbcZone,
  type ResolvedSite,
  type SiteInput,
  type ZoneId,
} from "./types";
import { degreeDaysFToC } from "./units";
import { CLIMATE_ZONE_IDS } from "~/vocabulary/climate-zones";

export const CLIMATE_ZONES: readonly ZoneId[] = CLIMATE_ZONE_IDS;

/** Thermal zone number 0–8 from degree-days (ASHRAE 169-2013 Table A-3 order: CDD10 decides
 * zones 0–2, then HDD18 decides 3–8). */
export function zoneNumberFromDegreeDays(hdd18: number, cdd10: number): number {
  if (cdd10 > 6000) return 0;
  if (cdd10 > 5000) return 1;
  if (cdd10 > 3500) return 2;
  if (hdd18 <= 2000) return 3;
  if (hdd18 <= 3000) return 4;
  if (hdd18 <= 4000) return 5;
  if (hdd18 <= 5000) return 6;
  if (hdd18 <= 7000) return 7;
  return 8;
}

/** Canada NBC 9.36 climate zone by HDD below 18 °C (NBC Table 9.36.2.6.-A, docs/references.md §6.3). */
export function nbcZoneFromHdd(hdd18: number): NbcZone {
  if (hdd18 < 3000) return "4";
  if (hdd18 < 4000) return "5";
  if (hdd18 < 5000) return "6";
  if (hdd18 < 6000) return "7A";
  if (hdd18 < 7000) return "7B";
  return "8";
}

/** Moisture regime (ASHRAE 169 / IECC R301.3): Marine if all four marine criteria hold, else Dry if
 * P_cm < 2·(T_°C + 7), else Moist. */
export function moistureRegimeFromNormals(n: ClimateNormals): MoistureRegime {
  const marine =
    n.coldest_month_mean_c > -3 &&
    n.coldest_month_mean_c < 18 &&
    n.warmest_month_mean_c < 22 &&
    n.months_above_10c >= 4 &&
    n.wettest_cold_month_mm >= 3 * n.driest_warm_month_mm;
  if (marine) return "C";
  const precipCm = n.annual_precip_mm / 10;
  return precipCm < 2 * (n.annual_mean_c + 7) ? "B" : "A";
}

/** Zones that exist with each moisture regime (7 and 8 have none). */
function makeZoneId(zoneNumber: number, moisture: MoistureRegime | null): ZoneId | null {
  const id = zoneNumber >= 7 ? String(zoneNumber) : `${zoneNumber}${moisture ?? ""}`;
  return (CLIMATE_ZONES as readonly string[]).includes(id) ? (id as ZoneId) : null;
}

export function parseZone(zone: string | number, moisture?: MoistureRegime): ZoneId {
  const text = String(zone).trim().toUpperCase();
  const match = /^([0-8])([ABC])?$/.exec(text);
  if (!match) {
    throw new SiteCheckInputError("zone", `"${zone}" is not a climate zone; use 0–8 with A, B or C (e.g. "5A")`);
  }
  const n = Number(match[1]);
  const regime = (match[2] as MoistureRegime | undefined) ?? moisture ?? null;
  if (n < 7 && regime === null) {
    throw new SiteCheckInputError("moisture", `zone ${n} needs a moisture regime A, B or C (e.g. "${n}A")`);
  }
  const id = makeZoneId(n, regime);
  if (!id) {
    throw new SiteCheckInputError(
      "zone",
      `zone ${n}${regime ?? ""} does not exist; marine (C) applies to zones 3–5 only`,
    );
  }
  return id;
}

export function zoneNumberOf(zone: ZoneId): number {
  return Number(zone[0]);
}
export function moistureOf(zone: ZoneId): MoistureRegime | null {
  const m = zone[1];
  return m === "A" || m === "B" || m === "C" ? m : null;
}

/** Representative design conditions by zone (common practice defaults, not a design-data
 * source: the user should enter local 99 %/1 % design values). Winter: heating design dry-bulb
 * with humid outdoor air; summer: cooling design dry-bulb and an RH that gives a typical design
 * dew point for the regime; ground: a deep-soil temperature near the annual mean. */
const WINTER_T_C = [18, 8, 0, -4, -10, -18, -23, -30, -38];
const SUMMER_T_C = [35, 34, 34, 34, 33, 32, 31, 29, 26];
const GROUND_T_C = [25, 23, 19, 16, 13, 10, 7, 5, 2];
const SUMMER_RH: Record<MoistureRegime | "none", number> = { A: 60, B: 25, C: 55, none: 50 };
/** Sun-warmed wet cladding sits well above air temperature (common practice: +15 K or more
 * on a sunny face after rain). */
export const CLADDING_SOLAR_RISE_K = 15;
export const DEFAULT_INDOOR = { t_c: 21, summer_t_c: 24, summer_rh: 50 } as const;

/** A Canadian site: a province or territory, an NBC zone, or country "CA" with degree-days. Its
 * HDD comes from the site, else the province's reference place, else the cold end of the zone's band
 * (the safe side). Null for other sites. */
export function resolveCanada(site: SiteInput): CanadianSite | null {
  if (site.country !== undefined && site.country !== "US" && site.country !== "CA") {
    throw new SiteCheckInputError("country", `country must be "US" or "CA" (got "${String(site.country)}")`);
  }
  if (site.province !== undefined && !(PROVINCES as readonly string[]).includes(site.province)) {
    throw new SiteCheckInputError(
      "province",
      `"${String(site.province)}" is not a province or territory code; use one of ${PROVINCES.join(", ")}`,
    );
  }
  if (site.nbcZone !== undefined && !(site.nbcZone in NBC_ZONE_BANDS)) {
    throw new SiteCheckInputError(
      "nbcZone",
      `"${String(site.nbcZone)}" is not an NBC climate zone; use 4, 5, 6, 7A, 7B or 8`,
    );
  }
  const canadian = site.country === "CA" || site.province !== undefined || site.nbcZone !== undefined;
  if (!canadian) return null;
  if (site.country === "US") {
    throw new SiteCheckInputError(
      "country",
      'a province or NBC zone was given with country "US"; use "CA" for a Canadian site',
    );
  }
  const given = site.hdd18 ?? (site.hdd65 !== undefined ? degreeDaysFToC(site.hdd65) : undefined);
  const province = site.province ?? null;
  let hdd18: number;
  let hddSource: CanadianSite["hddSource"];
  let place: string | null = null;
  if (given !== undefined) {
    hdd18 = given;
    hddSource = "given";
  } else if (site.nbcZone !== undefined) {
    hdd18 = NBC_ZONE_BANDS[site.nbcZone].coldEnd;
    hddSource = "nbc-zone";
  } else if (province !== null) {
    hdd18 = PROVINCE_REFERENCE[province].hdd18;
    place = PROVINCE_REFERENCE[province].place;
    hddSource = "province";
  } else {
    throw new SiteCheckInputError(
      "hdd18",
      "a Canadian site needs a province, an NBC zone or heating degree-days below 18 °C",
    );
  }
  const nbcZone = site.nbcZone ?? nbcZoneFromHdd(hdd18);
  return { province, nbcZone, hdd18, hddSource, place, edition: NBC_EDITION };
}

/** The given value, or the default (recorded as defaulted so the page can say "assumed"). */
function pick(defaulted: string[], value: number | undefined, fallback: number, name: string): number {
  if (value !== undefined) return value;
  defaulted.push(name);
  return fallback;
}

function checkNumber(value: number | undefined, field: string, min: number, max: number, what: string): void {
  if (value === undefined) return;
  if (!Number.isFinite(value) || value < min || value > max) {
    throw new SiteCheckInputError(field, `${what} must be a number from ${min} to ${max} (got ${value})`);
  }
}

/** Fills in the zone (from degree-days where not given) and every design default. */
export function resolveSite(input: SiteInput): ResolvedSite {
  let site = input;
  if (site === null || typeof site !== "object") {
    throw new SiteCheckInputError("site", "a site (zone or degree-days) is required");
  }
  const defaulted: string[] = [];
  const notes: string[] = [];
  const canada = resolveCanada(site);
  if (canada) {
    // Canadian sites resolve the US zone (for the design defaults) from the same HDD; most of Canada
    // is zone 6 or colder, and a moist regime is assumed where none is given.
    if (canada.hddSource !== "given") site = { ...site, hdd18: canada.hdd18, hdd65: undefined };
    if (site.zone === undefined && site.moisture === undefined && !site.normals) {
      site = { ...site, moisture: "A" };
      defaulted.push("moisture");
    }
    if (
      site.nbcZone !== undefined &&
      site.hdd18 !== undefined &&
      canada.hddSource === "given" &&
      nbcZoneFromHdd(site.hdd18) !== site.nbcZone
    ) {
      notes.push(
        `The degree-days given point to NBC zone ${nbcZoneFromHdd(site.hdd18)}; NBC zone ${site.nbcZone} as given is used.`,
      );
    }
    if (canada.hddSource === "province")
      notes.push(
        `Heating degree-days ${canada.hdd18} are ${canada.place}'s (NBC Appendix C, from memory); enter the site's own for a site elsewhere in the province.`,
      );
    if (canada.hddSource === "nbc-zone")
      notes.push(
        `Heating degree-days ${canada.hdd18} are the cold end of NBC zone ${canada.nbcZone}; enter the site's own.`,
      );
  }
  checkNumber(site.hdd18, "hdd18", 0, 20000, "heating degree-days (18 °C base)");
  checkNumber(site.cdd10, "cdd10", 0, 12000, "cooling degree-days (10 °C base)");
  checkNumber(site.hdd65, "hdd65", 0, 36000, "heating degree-days (65 °F base)");
  checkNumber(site.cdd50, "cdd50", 0, 21600, "cooling degree-days (50 °F base)");
  if (site.moisture !== undefined && !["A", "B", "C"].includes(site.moisture)) {
    throw new SiteCheckInputError("moisture", `moisture regime must be A, B or C (got "${String(site.moisture)}")`);
  }

  const hdd18 = site.hdd18 ?? (site.hdd65 !== undefined ? degreeDaysFToC(site.hdd65) : undefined);
  const cdd10 = site.cdd10 ?? (site.cdd50 !== undefined ? degreeDaysFToC(site.cdd50) : undefined);
  let moisture: MoistureRegime | undefined = site.moisture;
  if (site.normals) {
    const fromNormals = moistureRegimeFromNormals(site.normals);
    if (moisture && moisture !== fromNormals) {
      notes.push(
        `Moisture regime ${moisture} was given; the climate normals indicate ${fromNormals}. The given regime is used.`,
      );
    }
    moisture = moisture ?? fromNormals;
  }

  let zone: ZoneId;
  let zoneSource: ResolvedSite["zoneSource"];
  if (site.zone !== undefined && site.zone !== "") {
    zone = parseZone(site.zone, moisture);
    zoneSource = "given";
    if (hdd18 !== undefined) {
      const computed = zoneNumberFromDegreeDays(hdd18, cdd10 ?? 0);
      if (computed !== zoneNumberOf(zone)) {
        notes.push(`The degree-days given point to zone ${computed}; zone ${zone} as given is used.`);
      }
    }
  } else if (hdd18 !== undefined) {
    const n = zoneNumberFromDegreeDays(hdd18, cdd10 ?? 0);
    if (cdd10 === undefined && hdd18 <= 2000) {
      throw new SiteCheckInputError(
        "cdd10",
        "with heating degree-days of 2000 (18 °C base) or less, cooling degree-days are needed to tell zones 0–3 apart",
      );
    }
    if (n < 7 && !moisture) {
      throw new SiteCheckInputError(
        "moisture",
        `degree-days give zone ${n}; add a moisture regime (A, B or C) or climate normals`,
      );
    }
    const id = makeZoneId(n, n < 7 ? (moisture ?? null) : null);
    if (!id) {
      throw new SiteCheckInputError(
        "moisture",
        `zone ${n}${moisture ?? ""} does not exist; marine (C) applies to zones 3–5 only`,
      );
    }
    zone = id;
    zoneSource = "degree-days";
  } else {
    throw new SiteCheckInputError("zone", 'give a climate zone (e.g. "5A") or heating and cooling degree-days');
  }

  const zn = zoneNumberOf(zone);
  const regime = moistureOf(zone);
  checkNumber(site.winter?.t_c, "winter.t_c", -60, 40, "winter design temperature (°C)");
  checkNumber(site.winter?.rh, "winter.rh", 0, 100, "winter outdoor RH (%)");
  checkNumber(site.summer?.t_c, "summer.t_c", -10, 55, "summer design temperature (°C)");
  checkNumber(site.summer?.rh, "summer.rh", 0, 100, "summer outdoor RH (%)");
  checkNumber(site.summer?.cladding_t_c, "summer.cladding_t_c", -10, 90, "cladding temperature (°C)");
  checkNumber(site.ground_t_c, "ground_t_c", -20, 35, "ground temperature (°C)");
  checkNumber(site.indoor?.t_c, "indoor.t_c", 5, 35, "indoor temperature (°C)");
  checkNumber(site.indoor?.rh, "indoor.rh", 0, 100, "indoor RH (%)");
  checkNumber(site.indoor?.summer_t_c, "indoor.summer_t_c", 5, 35, "indoor summer temperature (°C)");
  checkNumber(site.indoor?.summer_rh, "indoor.summer_rh", 0, 100, "indoor summer RH (%)");
  const indoorMethod =
    site.indoor?.method === undefined ? DEFAULT_INDOOR_METHOD : checkIndoorMethod(site.indoor.method);
  if (site.edition !== undefined && site.edition !== "IECC/IRC 2021" && site.edition !== "IECC/IRC 2018") {
    throw new SiteCheckInputError("edition", `code edition must be "IECC/IRC 2021" or "IECC/IRC 2018"`);
  }

  // Marine zones have mild winters for their number (common practice adjustment).
  const winterT = WINTER_T_C[zn] + (regime === "C" ? 8 : 0);
  const summerT = SUMMER_T_C[zn] - (regime === "C" ? 6 : 0);
  const summer_t_c = pick(defaulted, site.summer?.t_c, summerT, "summer.t_c");
  const winter_t_c = pick(defaulted, site.winter?.t_c, winterT, "winter.t_c");
  const winter_rh = pick(defaulted, site.winter?.rh, 80, "winter.rh");
  const indoor_t_c = pick(defaulted, site.indoor?.t_c, DEFAULT_INDOOR.t_c, "indoor.t_c");
  // Winter indoor RH: as given, else by the indoor method at the winter design temperature.
  const indoorRh = site.indoor?.rh ?? indoorHumidity(indoorMethod, { t_c: winter_t_c, rh: winter_rh }, indoor_t_c).rh;
  if (site.indoor?.rh === undefined) defaulted.push("indoor.rh");
  const edition: CodeEdition = site.edition ?? "IECC/IRC 2021";
  if (site.edition === undefined) defaulted.push("edition");

  return {
    zone,
    zoneNumber: zn,
    moisture: regime,
    zoneSource,
    hdd18: hdd18 ?? null,
    cdd10: cdd10 ?? null,
    nbcZone: canada ? canada.nbcZone : hdd18 !== undefined ? nbcZoneFromHdd(hdd18) : null,
    winter: { t_c: winter_t_c, rh: winter_rh },
    summer: {
      t_c: summer_t_c,
      rh: pick(defaulted, site.summer?.rh, SUMMER_RH[regime ?? "none"], "summer.rh"),
      cladding_t_c: pick(
        defaulted,
        site.summer?.cladding_t_c,
        summer_t_c + CLADDING_SOLAR_RISE_K,
        "summer.cladding_t_c",
      ),
    },
    ground_t_c: pick(defaulted, site.ground_t_c, GROUND_T_C[zn], "ground_t_c"),
    indoor: {
      t_c: indoor_t_c,
      rh: indoorRh,
      summer_t_c: pick(defaulted, site.indoor?.summer_t_c, DEFAULT_INDOOR.summer_t_c, "indoor.summer_t_c"),
      summer_rh: pick(defaulted, site.indoor?.summer_rh, DEFAULT_INDOOR.summer_rh, "indoor.summer_rh"),
      method: site.indoor?.rh !== undefined ? "given" : indoorMethod,
      basis: indoorBasis(
        site.indoor?.rh !== undefined ? "given" : indoorMethod,
        { t_c: indoor_t_c, rh: indoorRh },
        winter_t_c,
      ),
    },
    edition,
    country: canada ? "CA" : "US",
    canada,
    preferredUnits: canada ? "SI" : "IP",
    defaulted,
    notes,
  };
}
