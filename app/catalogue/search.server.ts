import { QueryTypes } from "sequelize";
import { liveDetailSql, sequelize } from "~/models/index.server";
import type { LayerStripEntry } from "~/models/detail.server";
import { toBooleanQuery } from "./fulltext";
import { CLIMATE_ZONE_IDS, MOISTURE_REGIMES, type MoistureRegime } from "~/vocabulary/climate-zones";
import { effectiveSort, FILTER_KEYS, PER_PAGE, type CatalogueQuery, type FilterKey, type Sort } from "./query";
import { catalogueVersion, VersionedCache } from "./search-cache.server";
import { regimeBit, zoneBit, zoneMask } from "./zone-mask";

export interface DetailCard {
  slug: string;
  title: string;
  summary: string;
  assembly: string;
  substrate: string;
  belowGrade: string;
  strategy: string;
  interiorClass: string;
  tier: "free" | "premium";
  rsi: number | null;
  zones: string[];
  strip: LayerStripEntry[];
  publishedAt: string | null;
}

export interface FacetCount {
  value: string;
  count: number;
}

export interface CatalogueResult {
  total: number;
  page: number;
  pages: number;
  sort: Sort;
  cards: DetailCard[];
  facets: Record<FilterKey, FacetCount[]>;
  ms: number;
}

// Facets on plain columns of `details`; zones and regimes are bit masks on the same row
// (app/catalogue/zone-mask.ts), so one scan of the covering index `details_facets` counts them all.
const COLUMN: Record<Exclude<FilterKey, "zone" | "regime">, string> = {
  assembly: "d.assembly",
  substrate: "d.substrate",
  belowGrade: "d.below_grade",
  strategy: "d.strategy",
  interiorClass: "d.interior_class",
  tier: "d.tier",
};

interface Filter {
  key: FilterKey;
  sql: string;
}

function buildFilters(query: CatalogueQuery): Filter[] {
  const filters: Filter[] = [];
  for (const key of FILTER_KEYS) {
    const values = query[key] as readonly string[];
    if (values.length === 0) continue;
    if (key === "zone") filters.push({ key, sql: `(d.zone_mask & ${zoneMask(query.zone)}) <> 0` });
    else if (key === "regime") filters.push({ key, sql: `(d.regime_mask & ${regimeMaskOf(query.regime)}) <> 0` });
    else filters.push({ key, sql: `${COLUMN[key]} IN (:${key})` });
  }
  return filters;
}

const regimeMaskOf = (values: readonly MoistureRegime[]) =>
  values.reduce((mask, regime) => mask | regimeBit(regime), 0);

const LIVE = liveDetailSql("d");
const MATCH = "MATCH (d.title, d.summary, d.search_text) AGAINST (:booleanQuery IN BOOLEAN MODE)";

function conjunction(filters: Filter[]): string {
  return filters.length ? filters.map((filter) => `(${filter.sql})`).join(" AND ") : "TRUE";
}

/** One combination of facet values and how many live details have it. */
interface FacetCombination {
  tier: string;
  assembly: string;
  substrate: string;
  below_grade: string;
  strategy: string;
  interior_class: string;
  zone_mask: number;
  regime_mask: number;
  n: number | bigint;
  /** Each facet's values, computed once when a combination is kept in a cache. */
  values?: Record<FilterKey, string[]>;
}

const ROW_FIELD: Record<Exclude<FilterKey, "zone" | "regime">, keyof FacetCombination> = {
  assembly: "assembly",
  substrate: "substrate",
  belowGrade: "below_grade",
  strategy: "strategy",
  interiorClass: "interior_class",
  tier: "tier",
};

/** The values of one facet a combination carries (zones and regimes can be several). */
function valuesOf(row: FacetCombination, key: FilterKey): string[] {
  if (row.values) return row.values[key];
  if (key === "zone") return CLIMATE_ZONE_IDS.filter((zone) => (row.zone_mask & zoneBit(zone)) !== 0);
  if (key === "regime") return MOISTURE_REGIMES.filter((regime) => (row.regime_mask & regimeBit(regime)) !== 0);
  return [String(row[ROW_FIELD[key]])];
}

/**
 * Counts per facet value under all the other active filters (so a facet shows what choosing each of
 * its values would give), and the total under all of them, from the grouped combinations.
 */
function withValues<T extends FacetCombination>(row: T): T {
  const values = Object.fromEntries(FILTER_KEYS.map((key) => [key, valuesOf(row, key)])) as Record<FilterKey, string[]>;
  return { ...row, values };
}

/** A predicate for "this combination passes every active filter of the query". */
export function acceptsAll(query: CatalogueQuery): (row: FacetCombination) => boolean {
  const active = FILTER_KEYS.filter((key) => query[key].length > 0);
  const selected = Object.fromEntries(active.map((key) => [key, new Set<string>(query[key])])) as Partial<
    Record<FilterKey, Set<string>>
  >;
  return (row) => active.every((key) => valuesOf(row, key).some((value) => selected[key]!.has(value)));
}

export function countFacets(
  combinations: FacetCombination[],
  query: CatalogueQuery,
): { total: number; facets: Record<FilterKey, FacetCount[]> } {
  const active = FILTER_KEYS.filter((key) => query[key].length > 0);
  const selected = Object.fromEntries(active.map((key) => [key, new Set<string>(query[key])])) as Partial<
    Record<FilterKey, Set<string>>
  >;
  const tallies = Object.fromEntries(FILTER_KEYS.map((key) => [key, new Map<string, number>()])) as Record<
    FilterKey,
    Map<string, number>
  >;
  let total = 0;
  for (const row of combinations) {
    const n = Number(row.n);
    const failing = active.filter((key) => !valuesOf(row, key).some((value) => selected[key]!.has(value)));
    if (failing.length === 0) total += n;
    if (failing.length > 1) continue;
    for (const key of FILTER_KEYS) {
      // A row counts for facet `key` when every filter other than `key` accepts it.
      if (failing.length === 1 && failing[0] !== key) continue;
      for (const value of valuesOf(row, key)) tallies[key].set(value, (tallies[key].get(value) ?? 0) + n);
    }
  }
  const facets = Object.fromEntries(
    FILTER_KEYS.map((key) => [
      key,
      [...tallies[key]]
        .map(([value, count]) => ({ value, count }))
        .sort((a, b) => a.value.localeCompare(b.value, "en", { numeric: true })),
    ]),
  ) as Record<FilterKey, FacetCount[]>;
  return { total, facets };
}

// Facet-only searches sort in SQL (relevance needs text, so it falls back to most recently revised).
const ORDER: Record<Exclude<Sort, "relevance">, string> = {
  title: "d.title ASC, d.id",
  revised: "d.published_at DESC, d.id DESC",
  "r-value": "d.r_value_rsi DESC, d.id",
};

interface CardRow {
  id: number;
  slug: string;
  title: string;
  summary: string;
  assembly: string;
  substrate: string;
  below_grade: string;
  strategy: string;
  interior_class: string;
  tier: "free" | "premium";
  r_value_rsi: string | null;
  zones_label: string;
  layer_strip: LayerStripEntry[] | string;
  published_at: Date | null;
}

/**
 * The catalogue search: results for one page and, for every facet, counts under all the other
 * active filters (so a facet shows what choosing each of its values would give).
 */
const cache = new VersionedCache<Omit<CatalogueResult, "ms">>();

/** The catalogue search, answered from the per-process cache while the catalogue is unchanged. */
export async function searchCatalogue(query: CatalogueQuery): Promise<CatalogueResult> {
  const started = performance.now();
  const version = await catalogueVersion();
  const key = JSON.stringify(query);
  const cached = cache.get(key, version);
  if (cached) return { ...cached, ms: Math.round(performance.now() - started) };
  const result = await searchUncached(query, version);
  cache.set(key, version, result);
  return { ...result, ms: Math.round(performance.now() - started) };
}

async function searchUncached(query: CatalogueQuery, version: string): Promise<Omit<CatalogueResult, "ms">> {
  const booleanQuery = toBooleanQuery(query.q);
  return booleanQuery ? searchWithText(query, booleanQuery, version) : searchFacetsOnly(query, version);
}

const CARD_COLUMNS = `d.id, d.slug, d.title, d.summary, d.assembly, d.substrate, d.below_grade, d.strategy, d.interior_class, d.tier,
  d.r_value_rsi, d.zones_label, d.layer_strip, d.published_at`;
const GROUPING =
  "d.tier, d.assembly, d.substrate, d.below_grade, d.strategy, d.interior_class, d.zone_mask, d.regime_mask";

function replacementsFor(query: CatalogueQuery): Record<string, unknown> {
  const replacements: Record<string, unknown> = {};
  for (const key of FILTER_KEYS) if (query[key].length) replacements[key] = query[key];
  return replacements;
}

function page(
  query: CatalogueQuery,
  total: number,
  sort: Sort,
  cards: DetailCard[],
  facets: Record<FilterKey, FacetCount[]>,
): Omit<CatalogueResult, "ms"> {
  return { total, page: query.page, pages: Math.max(1, Math.ceil(total / PER_PAGE)), sort, cards, facets };
}

/** Facets only: one ordered walk of the facet index for the counts, one indexed query for the page. */
// The combinations do not depend on the filters, so one walk of the facet index serves every
// facet-only search until the catalogue changes.
const combinationsCache = new VersionedCache<FacetCombination[]>(1);

async function facetCombinations(version: string): Promise<FacetCombination[]> {
  const cached = combinationsCache.get("all", version);
  if (cached) return cached;
  const rows = await sequelize.query<FacetCombination>(
    `SELECT ${GROUPING}, COUNT(*) AS n FROM details d FORCE INDEX (details_facets) WHERE ${LIVE} GROUP BY ${GROUPING}`,
    { type: QueryTypes.SELECT },
  );
  const combinations = rows.map(withValues);
  combinationsCache.set("all", version, combinations);
  return combinations;
}

async function searchFacetsOnly(query: CatalogueQuery, version: string): Promise<Omit<CatalogueResult, "ms">> {
  const filters = buildFilters(query);
  const replacements = replacementsFor(query);
  const sort = effectiveSort(query);
  const orderSql = sort === "relevance" ? ORDER.revised : ORDER[sort];
  const [rows, combinations] = await Promise.all([
    sequelize.query<CardRow>(
      `SELECT ${CARD_COLUMNS} FROM details d WHERE ${LIVE} AND ${conjunction(filters)}
        ORDER BY ${orderSql} LIMIT ${PER_PAGE} OFFSET ${(query.page - 1) * PER_PAGE}`,
      { type: QueryTypes.SELECT, replacements },
    ),
    facetCombinations(version),
  ]);
  const { total, facets } = countFacets(combinations, query);
  return page(query, total, sort, rows.map(toCard), facets);
}

/** One detail that matched a text search, with what facets and sorting need. */
interface TextMatch extends FacetCombination {
  id: number;
  score: number;
  title: string;
  published_ms: number;
  rsi: number;
}

// The FULLTEXT match is the costly part of a text search, and people refine facets and pages after
// typing: the matches for each text are kept (per catalogue version) and filtered, counted, sorted
// and paged in memory.
const textMatches = new VersionedCache<TextMatchSet>(50);

interface TextMatchSet {
  matches: TextMatch[];
  /** The matches in each sort order, sorted on first use. */
  sorted: Partial<Record<Sort, TextMatch[]>>;
}

async function matchesFor(booleanQuery: string, version: string): Promise<TextMatchSet> {
  const cached = textMatches.get(booleanQuery, version);
  if (cached) return cached;
  const rows = await sequelize.query<
    Omit<TextMatch, "n" | "published_ms" | "rsi"> & { published_at: Date | null; r_value_rsi: string | null }
  >(
    `SELECT d.id, ${MATCH} AS score, d.title, d.published_at, d.r_value_rsi, ${GROUPING} FROM details d WHERE ${LIVE} AND ${MATCH}`,
    { type: QueryTypes.SELECT, replacements: { booleanQuery } },
  );
  const matches = rows.map((row) =>
    withValues({
      ...row,
      n: 1,
      score: Number(row.score),
      published_ms: row.published_at ? new Date(row.published_at).getTime() : 0,
      rsi: row.r_value_rsi === null ? -1 : Number(row.r_value_rsi),
    }),
  );
  const set = { matches, sorted: {} };
  textMatches.set(booleanQuery, version, set);
  return set;
}

const COMPARE: Record<Sort, (a: TextMatch, b: TextMatch) => number> = {
  relevance: (a, b) => b.score - a.score || b.published_ms - a.published_ms || a.id - b.id,
  title: (a, b) => a.title.localeCompare(b.title, "en") || a.id - b.id,
  revised: (a, b) => b.published_ms - a.published_ms || b.id - a.id,
  "r-value": (a, b) => b.rsi - a.rsi || a.id - b.id,
};

async function searchWithText(
  query: CatalogueQuery,
  booleanQuery: string,
  version: string,
): Promise<Omit<CatalogueResult, "ms">> {
  const set = await matchesFor(booleanQuery, version);
  const { total, facets } = countFacets(set.matches, query);
  const sort = effectiveSort(query);
  const ordered = (set.sorted[sort] ??= [...set.matches].sort(COMPARE[sort]));
  const start = (query.page - 1) * PER_PAGE;
  const accepts = acceptsAll(query);
  const pageIds: number[] = [];
  let seen = 0;
  for (const match of ordered) {
    if (!accepts(match)) continue;
    if (seen++ >= start) pageIds.push(match.id);
    if (pageIds.length === PER_PAGE) break;
  }
  if (pageIds.length === 0) return page(query, total, sort, [], facets);
  const rows = await sequelize.query<CardRow>(`SELECT ${CARD_COLUMNS} FROM details d WHERE d.id IN (:ids)`, {
    type: QueryTypes.SELECT,
    replacements: { ids: pageIds },
  });
  const byId = new Map(rows.map((row) => [row.id, row]));
  return page(
    query,
    total,
    sort,
    pageIds.flatMap((id) => (byId.has(id) ? [toCard(byId.get(id)!)] : [])),
    facets,
  );
}

function toCard(row: CardRow): DetailCard {
  return {
    slug: row.slug,
    title: row.title,
    summary: row.summary,
    assembly: row.assembly,
    substrate: row.substrate,
    belowGrade: row.below_grade,
    strategy: row.strategy,
    interiorClass: row.interior_class,
    tier: row.tier,
    rsi: row.r_value_rsi === null ? null : Number(row.r_value_rsi),
    zones: row.zones_label.split(" ").filter(Boolean),
    // The connector hands JSON columns back as text on raw queries.
    strip: typeof row.layer_strip === "string" ? (JSON.parse(row.layer_strip) as LayerStripEntry[]) : row.layer_strip,
    publishedAt: row.published_at ? new Date(row.published_at).toISOString() : null,
  };
}
