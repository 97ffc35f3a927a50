import { expect, test } from "vitest";
import { regimeBit, regimeMask, zoneBit, zoneMask } from "~/catalogue/zone-mask";
import {
  CLIMATE_ZONE_IDS,
  FEATURED_ZONES,
  MOISTURE_REGIMES,
  MOISTURE_REGIME_LABELS,
  isClimateZoneId,
  isMoistureRegime,
  moistureRegime,
  zoneLabel,
  zoneNumber,
} from "~/vocabulary/climate-zones";

// The zone list is ASHRAE 169-2013 / IECC 2021 R301 (docs/references.md §6.3): thermal zones 0–8,
// moisture regimes A (moist), B (dry), C (marine). Which number/letter pairs exist is from memory of
// IECC 2021 Table R301.1 / Figure R301.1 and ASHRAE 169-2013 Table B-1: zone 0 was added in 169-2013,
// marine applies to zones 3–5 only, and zones 7 and 8 carry no moisture letter.

test("zones run 0 to 8, and each number has the regimes the standard gives it (ASHRAE 169-2013 / IECC 2021 R301, from memory)", () => {
  const byNumber = new Map<number, string[]>();
  for (const zone of CLIMATE_ZONE_IDS)
    byNumber.set(zoneNumber(zone), [...(byNumber.get(zoneNumber(zone)) ?? []), zone]);
  expect([...byNumber.keys()]).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8]);
  expect(Object.fromEntries(byNumber)).toEqual({
    0: ["0A", "0B"],
    1: ["1A", "1B"],
    2: ["2A", "2B"],
    3: ["3A", "3B", "3C"],
    4: ["4A", "4B", "4C"],
    5: ["5A", "5B", "5C"],
    6: ["6A", "6B"],
    7: ["7"],
    8: ["8"],
  });
});

test("every zone has a moisture regime, or is 7 or 8 and has none (IECC 2021 R301.1, from memory)", () => {
  for (const zone of CLIMATE_ZONE_IDS) {
    const regime = moistureRegime(zone);
    if (zoneNumber(zone) >= 7) expect(regime, zone).toBeNull();
    else expect(MOISTURE_REGIMES, zone).toContain(regime);
  }
  expect(CLIMATE_ZONE_IDS.filter((zone) => moistureRegime(zone) === "C")).toEqual(["3C", "4C", "5C"]);
});

test("the bit order of stored zone and regime masks never changes (details.zone_mask / regime_mask as backfilled)", () => {
  // These are the meanings of bits already stored in the database; a new zone goes at the end.
  const storedZoneOrder = [
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
  ];
  expect(CLIMATE_ZONE_IDS).toEqual(storedZoneOrder);
  expect(zoneBit("0A")).toBe(1);
  expect(zoneBit("5A")).toBe(2 ** 12);
  expect(zoneBit("8")).toBe(2 ** 18);
  expect([regimeBit("A"), regimeBit("B"), regimeBit("C")]).toEqual([1, 2, 4]);
  expect(zoneMask(["4C", "5A"])).toBe(2 ** 11 + 2 ** 12);
  expect(regimeMask(["4C", "5A", "7"])).toBe(1 + 4);
  // Both masks fit their columns: INT UNSIGNED for zones, TINYINT UNSIGNED for regimes.
  expect(2 ** CLIMATE_ZONE_IDS.length - 1).toBeLessThanOrEqual(2 ** 32 - 1);
  expect(2 ** MOISTURE_REGIMES.length - 1).toBeLessThanOrEqual(255);
});

test("the type guards accept exactly the listed ids", () => {
  for (const zone of CLIMATE_ZONE_IDS) expect(isClimateZoneId(zone)).toBe(true);
  for (const junk of ["5", "6C", "9A", "5a", " 5A", "", null, undefined, 5])
    expect(isClimateZoneId(junk), String(junk)).toBe(false);
  expect(MOISTURE_REGIMES.every(isMoistureRegime)).toBe(true);
  expect(isMoistureRegime("D")).toBe(false);
});

test("labels name every regime and zone; featured zones are real zones", () => {
  expect(Object.keys(MOISTURE_REGIME_LABELS)).toEqual([...MOISTURE_REGIMES]);
  expect(MOISTURE_REGIME_LABELS).toEqual({ A: "Moist (A)", B: "Dry (B)", C: "Marine (C)" });
  expect(zoneLabel("5A")).toBe("Zone 5A");
  expect(zoneLabel("7")).toBe("Zone 7");
  for (const zone of FEATURED_ZONES) expect(isClimateZoneId(zone)).toBe(true);
});
