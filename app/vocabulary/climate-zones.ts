// Climate zones and moisture regimes: ASHRAE 169-2013 / IECC 2021 R301 (docs/references.md §6.3).
// The one list of zone ids. Its order is the bit order of the stored zone masks
// (app/catalogue/zone-mask.ts; backfilled by db/migrations/2026-12-03-0006-catalogue-facet-index.ts):
// append new zones at the end, never reorder, or add a migration that rewrites `details.zone_mask`.

/** Zone numbers 0–8 with their moisture-regime letter; zones 7 and 8 carry no letter in the IECC. */
export const CLIMATE_ZONE_IDS = [
  "0A",
  "0B",
  "1A",
  "1B",
  "2A",
  "2B",
  "3A",
  "3B",
  "3C",
  "4A",
  "4B",
  "4C",
  "5A",
  "5B",
  "5C",
  "6A",
  "6B",
  "7",
  "8",
] as const;

export type ClimateZoneId = (typeof CLIMATE_ZONE_IDS)[number];

/** Moisture regimes in bit order of the stored regime masks (A bit 0, B bit 1, C bit 2). */
export const MOISTURE_REGIMES = ["A", "B", "C"] as const;

export type MoistureRegime = (typeof MOISTURE_REGIMES)[number];

export const MOISTURE_REGIME_LABELS: Record<MoistureRegime, string> = {
  A: "Moist (A)",
  B: "Dry (B)",
  C: "Marine (C)",
};

/** Zones the home page offers as a first step: the ones most of the library is written for. */
export const FEATURED_ZONES: readonly ClimateZoneId[] = ["2A", "3A", "4A", "4C", "5A", "5B", "6A", "7"];

export function isClimateZoneId(value: unknown): value is ClimateZoneId {
  return typeof value === "string" && (CLIMATE_ZONE_IDS as readonly string[]).includes(value);
}

export function isMoistureRegime(value: unknown): value is MoistureRegime {
  return typeof value === "string" && (MOISTURE_REGIMES as readonly string[]).includes(value);
}

/** The zone number (0–8) of a zone id. */
export function zoneNumber(zone: ClimateZoneId): number {
  return Number.parseInt(zone, 10);
}

/** The moisture regime of a zone id, or null for zones 7 and 8, which have none. */
export function moistureRegime(zone: ClimateZoneId): MoistureRegime | null {
  const letter = zone.slice(1);
  return isMoistureRegime(letter) ? letter : null;
}

/** "Zone 5A" / "Zone 7". */
export function zoneLabel(zone: ClimateZoneId): string {
  return `Zone ${zone}`;
}
