// National Building Code of Canada 2020 values the site check compares against (docs/references.md §6.3).
// Status as docs/references.md uses it: C2 = confirmed in a secondary copy of the table, M = from
// memory (verify against the printed code before relying on it).
import type { AssemblyKind, NbcEdition, NbcZone, ProvinceCode } from "./types";

export const NBC_EDITION: NbcEdition = "NBC 2020";

/** NBC zones by HDD below 18 °C, Table 9.36.2.6.-A heading (C2). `coldEnd` is the band's highest
 * HDD, used when only a zone is known (the safe side); zone 8 is open-ended. */
export const NBC_ZONE_BANDS: Readonly<Record<NbcZone, { from: number; to: number | null; coldEnd: number }>> = {
  "4": { from: 0, to: 2999, coldEnd: 2999 },
  "5": { from: 3000, to: 3999, coldEnd: 3999 },
  "6": { from: 4000, to: 4999, coldEnd: 4999 },
  "7A": { from: 5000, to: 5999, coldEnd: 5999 },
  "7B": { from: 6000, to: 6999, coldEnd: 6999 },
  "8": { from: 7000, to: null, coldEnd: 7999 },
};
export const NBC_ZONES: readonly NbcZone[] = ["4", "5", "6", "7A", "7B", "8"];

/** A reference place per province or territory (the capital) and its HDD below 18 °C, NBC 2020
 * Appendix C climatic data — all from memory (M). Used only when the site gives a province and no
 * degree-days; much of a province is colder than its capital, so the page asks for the site's own. */
export const PROVINCE_REFERENCE: Readonly<Record<ProvinceCode, { place: string; hdd18: number }>> = {
  AB: { place: "Edmonton", hdd18: 5120 },
  BC: { place: "Victoria", hdd18: 2650 },
  MB: { place: "Winnipeg", hdd18: 5670 },
  NB: { place: "Fredericton", hdd18: 4670 },
  NL: { place: "St. John's", hdd18: 4800 },
  NS: { place: "Halifax", hdd18: 4000 },
  NT: { place: "Yellowknife", hdd18: 8170 },
  NU: { place: "Iqaluit", hdd18: 9980 },
  ON: { place: "Toronto", hdd18: 3520 },
  PE: { place: "Charlottetown", hdd18: 4460 },
  QC: { place: "Québec", hdd18: 5080 },
  SK: { place: "Regina", hdd18: 5600 },
  YT: { place: "Whitehorse", hdd18: 6580 },
};

/** 9.25.4.2: a vapour barrier passes at most 60 ng/(Pa·s·m²), desiccant (dry-cup) method (C2). */
export const NBC_VAPOUR_BARRIER_NG = 60;

/** Table 9.25.5.2, ratio of the thermal resistance outboard of a low-permeance layer's inner face to
 * the resistance inboard of it, by HDD (HDD bands C2, ratios M). `to` is the band's last HDD. */
export const NBC_9_25_5_2: readonly { to: number; ratio: number }[] = [
  { to: 4999, ratio: 0.2 },
  { to: 5999, ratio: 0.3 },
  { to: 6999, ratio: 0.35 },
  { to: 7999, ratio: 0.4 },
  { to: 8999, ratio: 0.5 },
  { to: 9999, ratio: 0.55 },
  { to: 10999, ratio: 0.6 },
  { to: 11999, ratio: 0.65 },
  { to: Number.POSITIVE_INFINITY, ratio: 0.75 },
];

/** The ratio Table 9.25.5.2 requires at an HDD. */
export function outboardRatioAt(hdd18: number): number {
  for (const row of NBC_9_25_5_2) if (Math.floor(hdd18) <= row.to) return row.ratio;
  return NBC_9_25_5_2[NBC_9_25_5_2.length - 1].ratio;
}

export type NbcComponent = "wall" | "attic-ceiling" | "cathedral-roof" | "floor-over-unheated" | "foundation-wall";

/** Minimum effective RSI by component and zone, without a heat-recovery ventilator (Table
 * 9.36.2.6.-A; the table with an HRV, 9.36.2.6.-B, permits less and is not used here: the stricter
 * one errs on the safe side). Foundation walls are Table 9.36.2.8.-A. */
export const NBC_EFFECTIVE_RSI: Readonly<
  Record<NbcComponent, { table: string; status: string; byZone: Readonly<Record<NbcZone, number>> }>
> = {
  wall: {
    table: "Table 9.36.2.6.-A",
    status: "C2",
    byZone: { "4": 2.78, "5": 3.08, "6": 3.08, "7A": 3.08, "7B": 3.85, "8": 3.85 },
  },
  "attic-ceiling": {
    table: "Table 9.36.2.6.-A",
    status: "C2",
    byZone: { "4": 6.91, "5": 8.67, "6": 8.67, "7A": 10.43, "7B": 10.43, "8": 10.43 },
  },
  "cathedral-roof": {
    table: "Table 9.36.2.6.-A",
    status: "C2",
    byZone: { "4": 4.67, "5": 4.67, "6": 4.67, "7A": 5.02, "7B": 5.02, "8": 5.02 },
  },
  "floor-over-unheated": {
    table: "Table 9.36.2.6.-A",
    status: "C2",
    byZone: { "4": 4.67, "5": 4.67, "6": 4.67, "7A": 5.02, "7B": 5.02, "8": 5.02 },
  },
  "foundation-wall": {
    table: "Table 9.36.2.8.-A",
    status: "M",
    byZone: { "4": 1.99, "5": 2.98, "6": 2.98, "7A": 3.46, "7B": 3.46, "8": 3.97 },
  },
};

export const NBC_COMPONENT_LABEL: Readonly<Record<NbcComponent, string>> = {
  wall: "above-grade wall",
  "attic-ceiling": "ceiling below an attic",
  "cathedral-roof": "cathedral ceiling or flat roof",
  "floor-over-unheated": "floor over unheated space",
  "foundation-wall": "foundation wall below grade",
};

/** Assembly kinds the vapour-barrier requirement of 9.25.4.1 reads (insulated walls, ceilings and
 * floors); slabs and crawl-space ground covers are ground moisture, 9.13, not compared here. */
export const NBC_VAPOUR_BARRIER_KINDS: ReadonlySet<AssemblyKind> = new Set([
  "above-grade-wall",
  "rim-joist",
  "roof",
  "floor",
  "basement-wall",
  "crawlspace-wall",
]);
