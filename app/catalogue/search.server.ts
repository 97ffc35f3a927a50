import { QueryTypes } from "sequelize";
import { models } from "~/models";
import type { LayerStripEntry } from "~/models/detail";
import { toBooleanQuery } from "./fulltext";
import { effectiveSort, FILTER_KEYS, PER_PAGE, type CatalogueQuery, type FilterKey, type Sort } from "./query";

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

// Facets on plain columns of `details`; zone and regime live in detail_zones.
const COLUMN: Partial<Record<FilterKey, string>> = {
  assembly: "d.assembly",
  substrate: "d.substrate",
  belowGrade: "d.below_grade",
  strategy: "d.strategy",
  interiorClass: "d.interior_class",
  tier: "d.tier",
};
const ZONE_COLUMN: Partial<Record<FilterKey, string>> = { zone: "z.zone", regime: "z.regime" };

interface Filter {
  key: FilterKey | "q";
  sql: string;
}

function buildFilters(query: CatalogueQuery, booleanQuery: string): Filter[] {
  const filters: Filter[] = [];
  if (booleanQuery) filters.push({ key: "q", sql: "MATCH (d.title, d.summary, d.search_text) AGAINST (:booleanQuery IN BOOLEAN MODE)" });
  for (const key of FILTER_KEYS) {
    if (query[key].length === 0) continue;
    const column = COLUMN[key];
    filters.push({
      key,
      sql: column
        ? `${column} IN (:${key})`
        : `EXISTS (SELECT 1 FROM detail_zones fz WHERE fz.detail_id = d.id AND fz.${key} IN (:${key}))`,
    });
  }
  return filters;
}

const LIVE = "d.published_revision_id IS NOT NULL AND d.withdrawn_at IS NULL";

function whereClause(filters: Filter[], except?: FilterKey): string {
  return [LIVE, ...filters.filter((filter) => filter.key !== except).map((filter) => filter.sql)].join(" AND ");
}

const ORDER: Record<Sort, string> = {
  relevance: "score DESC, d.published_at DESC, d.id",
  title: "d.title ASC, d.id",
  revised: "d.published_at DESC, d.id DESC",
  "r-value": "d.r_value_rsi DESC, d.id",
};

interface CardRow {
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
export async function searchCatalogue(query: CatalogueQuery): Promise<CatalogueResult> {
  const started = performance.now();
  const sequelize = models();
  const booleanQuery = toBooleanQuery(query.q);
  const filters = buildFilters(query, booleanQuery);
  const replacements: Record<string, unknown> = { booleanQuery };
  for (const key of FILTER_KEYS) if (query[key].length) replacements[key] = query[key];
  const sort = effectiveSort(query);
  const orderSql = sort === "relevance" && !booleanQuery ? ORDER.revised : ORDER[sort];
  const scoreSql = booleanQuery ? "MATCH (d.title, d.summary, d.search_text) AGAINST (:booleanQuery IN BOOLEAN MODE)" : "0";
  const offset = (query.page - 1) * PER_PAGE;

  const select = <T extends object>(sql: string) => sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements });

  const rowsPromise = select<CardRow>(
    `SELECT d.slug, d.title, d.summary, d.assembly, d.substrate, d.below_grade, d.strategy, d.interior_class, d.tier,
            d.r_value_rsi, d.zones_label, d.layer_strip, d.published_at, ${scoreSql} AS score
       FROM details d WHERE ${whereClause(filters)} ORDER BY ${orderSql} LIMIT ${PER_PAGE} OFFSET ${offset}`,
  );
  const totalPromise = select<{ n: number | bigint }>(`SELECT COUNT(*) AS n FROM details d WHERE ${whereClause(filters)}`);
  const facetPromises = FILTER_KEYS.map((key) => {
    const column = COLUMN[key];
    const sql = column
      ? `SELECT ${column} AS value, COUNT(*) AS n FROM details d WHERE ${whereClause(filters, key)} GROUP BY ${column}`
      : `SELECT ${ZONE_COLUMN[key]} AS value, COUNT(DISTINCT d.id) AS n FROM details d JOIN detail_zones z ON z.detail_id = d.id
          WHERE ${whereClause(filters, key)} AND ${ZONE_COLUMN[key]} IS NOT NULL GROUP BY ${ZONE_COLUMN[key]}`;
    return select<{ value: string; n: number | bigint }>(sql);
  });

  const [rows, [totalRow], ...facetRows] = await Promise.all([rowsPromise, totalPromise, ...facetPromises]);
  const total = Number(totalRow?.n ?? 0);
  const facets = Object.fromEntries(
    FILTER_KEYS.map((key, i) => [
      key,
      facetRows[i].map((row) => ({ value: row.value, count: Number(row.n) })).sort((a, b) => a.value.localeCompare(b.value, "en", { numeric: true })),
    ]),
  ) as Record<FilterKey, FacetCount[]>;

  return {
    total,
    page: query.page,
    pages: Math.max(1, Math.ceil(total / PER_PAGE)),
    sort,
    cards: rows.map(toCard),
    facets,
    ms: Math.round(performance.now() - started),
  };
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
