import { CLIMATE_ZONE_IDS, moistureRegime, type ClimateZoneId } from "~/content/zones";

// Bit i stands for CLIMATE_ZONE_IDS[i]; regimes A, B, C are bits 0, 1, 2. The facet-index migration
// backfills with the same order.
export const REGIMES = ["A", "B", "C"] as const;

export function zoneBit(zone: ClimateZoneId): number {
  return 2 ** CLIMATE_ZONE_IDS.indexOf(zone);
}

export function regimeBit(regime: (typeof REGIMES)[number]): number {
  return 2 ** REGIMES.indexOf(regime);
}

export function zoneMask(zones: readonly ClimateZoneId[]): number {
  return zones.reduce((mask, zone) => mask | zoneBit(zone), 0);
}

export function regimeMask(zones: readonly ClimateZoneId[]): number {
  return zones.reduce((mask, zone) => {
    const regime = moistureRegime(zone);
    return regime ? mask | regimeBit(regime) : mask;
  }, 0);
}
