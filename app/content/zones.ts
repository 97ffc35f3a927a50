/**
 * Climate zone ids a detail may claim: ASHRAE 169 / IECC 2021 zone numbers with their moisture
 * regime letter (A moist, B dry, C marine). Zones 7 and 8 carry no letter in the IECC.
 */
export const CLIMATE_ZONE_IDS = [
  "0A", "0B", "1A", "1B", "2A", "2B", "3A", "3B", "3C",
  "4A", "4B", "4C", "5A", "5B", "5C", "6A", "6B", "7", "8",
] as const;

export type ClimateZoneId = (typeof CLIMATE_ZONE_IDS)[number];

export type MoistureRegime = "A" | "B" | "C";

/** The zone number (0–8) of a zone id. */
export function zoneNumber(zone: ClimateZoneId): number {
  return Number.parseInt(zone, 10);
}

/** The moisture regime of a zone id, or null for zones 7 and 8, which have none. */
export function moistureRegime(zone: ClimateZoneId): MoistureRegime | null {
  const letter = zone.slice(1);
  return letter === "A" || letter === "B" || letter === "C" ? letter : null;
}
