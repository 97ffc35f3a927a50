// What a pack download asks for (units and zone), read from the link's query string; pure, so it is
// tested without a database.
import { isClimateZoneId, type ClimateZoneId } from "~/vocabulary/climate-zones";
import { parseUnitSystem, type UnitSystem } from "~/vocabulary/units";

export type PackZone = ClimateZoneId | "own";

export interface PackRequest {
  units: UnitSystem;
  /** One zone for every sheet, or "own": each detail checked for the first zone it is written for. */
  zone: PackZone;
}

export function parsePackRequest(search: URLSearchParams, fallbackUnits: UnitSystem): PackRequest | null {
  const units = search.has("units") ? parseUnitSystem(search.get("units")) : fallbackUnits;
  const zone = search.get("zone") ?? "own";
  if (!units) return null;
  if (zone !== "own" && !isClimateZoneId(zone)) return null;
  return { units, zone };
}
