import fc from "fast-check";
import { expect, test } from "vitest";
import { FILTER_KEYS, type CatalogueQuery, type FilterKey } from "~/catalogue/query";
import { catalogueQuerySchema } from "~/catalogue/query-parse";
import { countFacets } from "~/catalogue/search.server";
import { toBooleanQuery } from "~/catalogue/fulltext";
import { regimeMask, zoneMask } from "~/catalogue/zone-mask";
import {
  CLIMATE_ZONE_IDS,
  MOISTURE_REGIMES,
  moistureRegime,
  type ClimateZoneId,
  type MoistureRegime,
} from "~/vocabulary/climate-zones";

interface Item {
  tier: string;
  assembly: string;
  substrate: string;
  belowGrade: string;
  strategy: string;
  interiorClass: string;
  zones: ClimateZoneId[];
}

const itemArb: fc.Arbitrary<Item> = fc.record({
  tier: fc.constantFrom("free", "premium"),
  assembly: fc.constantFrom("roof", "slab", "basement-wall"),
  substrate: fc.constantFrom("wood-frame", "icf"),
  belowGrade: fc.constantFrom("none", "basement"),
  strategy: fc.constantFrom("cavity-only", "spray-foam"),
  interiorClass: fc.constantFrom("I", "II", "III", "none"),
  zones: fc.uniqueArray(fc.constantFrom(...CLIMATE_ZONE_IDS), { minLength: 1, maxLength: 4 }),
});

function valuesOf(item: Item, key: FilterKey): string[] {
  if (key === "zone") return item.zones;
  if (key === "regime")
    return [...new Set(item.zones.map(moistureRegime).filter((r): r is MoistureRegime => r !== null))];
  return [item[key]];
}

/** The definition, item by item: counts of each value under every other active filter. */
function naive(items: Item[], query: CatalogueQuery) {
  const passes = (item: Item, key: FilterKey) =>
    query[key].length === 0 || valuesOf(item, key).some((v) => (query[key] as string[]).includes(v));
  const total = items.filter((item) => FILTER_KEYS.every((key) => passes(item, key))).length;
  const facets: Record<string, Record<string, number>> = {};
  for (const key of FILTER_KEYS) {
    facets[key] = {};
    for (const item of items) {
      if (!FILTER_KEYS.every((other) => other === key || passes(item, other))) continue;
      for (const value of valuesOf(item, key)) facets[key][value] = (facets[key][value] ?? 0) + 1;
    }
  }
  return { total, facets };
}

test("facet counts from grouped combinations equal counting detail by detail (property)", () => {
  const queryArb = fc.record({
    zone: fc.uniqueArray(fc.constantFrom(...CLIMATE_ZONE_IDS), { maxLength: 2 }),
    regime: fc.uniqueArray(fc.constantFrom(...MOISTURE_REGIMES), { maxLength: 2 }),
    assembly: fc.uniqueArray(fc.constantFrom("roof", "slab"), { maxLength: 2 }),
    tier: fc.uniqueArray(fc.constantFrom("free", "premium"), { maxLength: 1 }),
    interiorClass: fc.uniqueArray(fc.constantFrom("I", "III", "none"), { maxLength: 2 }),
  });
  fc.assert(
    fc.property(fc.array(itemArb, { maxLength: 40 }), queryArb, (items, partial) => {
      const query = catalogueQuerySchema.parse({ substrate: [], belowGrade: [], strategy: [], ...partial });
      const combinations = items.map((item) => ({
        tier: item.tier,
        assembly: item.assembly,
        substrate: item.substrate,
        below_grade: item.belowGrade,
        strategy: item.strategy,
        interior_class: item.interiorClass,
        zone_mask: zoneMask(item.zones),
        regime_mask: regimeMask(item.zones),
        n: 1,
      }));
      const fast = countFacets(combinations, query);
      const expected = naive(items, query);
      expect(fast.total).toBe(expected.total);
      for (const key of FILTER_KEYS) {
        expect(Object.fromEntries(fast.facets[key].map((f) => [f.value, f.count]))).toEqual(expected.facets[key]);
      }
    }),
    { numRuns: 300 },
  );
});

test("search text becomes a boolean query with every word required and trade synonyms as alternatives", () => {
  expect(toBooleanQuery("exterior foam")).toBe("+exterior* +foam*");
  expect(toBooleanQuery("crawl space")).toBe("+((+crawl* +space*) crawlspace*)");
  // Operators typed by a user are not passed through to MariaDB.
  expect(toBooleanQuery('+foam -"x" (y) ~z')).toBe("+foam*");
  // Words shorter than InnoDB's minimum token (3) are dropped unless a synonym carries them.
  expect(toBooleanQuery("2x6 in")).toBe("+2x6*");
  expect(toBooleanQuery("ci")).toBe("+((+continuous* +insulation*) (+exterior* +insulation*))");
  expect(toBooleanQuery("  ")).toBe("");
});
