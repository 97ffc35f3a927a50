import {
  CLIMATE_ZONE_IDS,
  MOISTURE_REGIMES,
  moistureRegime,
  type ClimateZoneId,
  type MoistureRegime,
} from "~/vocabulary/climate-zones";

// Bit i stands for CLIMATE_ZONE_IDS[i]; regimes A, B, C are bits 0, 1, 2 (MOISTURE_REGIMES order).
// The facet-index migration backfilled with the same order, so the vocabulary's lists only grow at the end.

export function zoneBit(zone: ClimateZoneId): number {
  return 2 ** CLIMATE_ZONE_IDS.indexOf(zone);
}

export function regimeBit(regime: MoistureRegime): number {
  return 2 ** MOISTURE_REGIMES.indexOf(regime);
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
