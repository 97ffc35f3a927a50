import { z } from "zod";
import { ASSEMBLY_KINDS, BELOW_GRADE_CONDITIONS, INSULATION_STRATEGIES, SUBSTRATES, TIERS } from "~/content/detail-schema";
import { CLIMATE_ZONE_IDS } from "~/content/zones";

// The catalogue's URL is its state: one parser for the page, the API and the client, so a shared
// link always means the same search.

export const SORTS = ["relevance", "title", "revised", "r-value"] as const;
export type Sort = (typeof SORTS)[number];
export const PER_PAGE = 24;

const multi = <T extends readonly [string, ...string[]]>(values: T) => z.array(z.enum(values)).max(values.length);

export const catalogueQuerySchema = z.object({
  q: z.string().trim().max(120, "search text is limited to 120 characters").default(""),
  zone: multi(CLIMATE_ZONE_IDS),
  regime: multi(["A", "B", "C"] as const),
  assembly: multi(ASSEMBLY_KINDS),
  substrate: multi(SUBSTRATES),
  belowGrade: multi(BELOW_GRADE_CONDITIONS),
  strategy: multi(INSULATION_STRATEGIES),
  interiorClass: multi(["I", "II", "III", "none"] as const),
  tier: multi(TIERS),
  sort: z.enum(SORTS).optional(),
  page: z.coerce.number().int().min(1).max(10000).default(1),
});

export type CatalogueQuery = z.infer<typeof catalogueQuerySchema>;
export const FILTER_KEYS = ["zone", "regime", "assembly", "substrate", "belowGrade", "strategy", "interiorClass", "tier"] as const;
export type FilterKey = (typeof FILTER_KEYS)[number];

// URL parameter names (kebab for the two-word keys, so links read naturally).
const PARAM: Record<FilterKey, string> = {
  zone: "zone", regime: "regime", assembly: "assembly", substrate: "substrate",
  belowGrade: "below-grade", strategy: "strategy", interiorClass: "interior-class", tier: "tier",
};

export type QueryParseResult = { ok: true; query: CatalogueQuery } | { ok: false; errors: { param: string; message: string }[] };

export function parseCatalogueQuery(params: URLSearchParams): QueryParseResult {
  const raw: Record<string, unknown> = { q: params.get("q") ?? undefined, sort: params.get("sort") || undefined, page: params.get("page") ?? undefined };
  for (const key of FILTER_KEYS) {
    // Accept both repeated parameters and comma lists: ?zone=4A&zone=5A or ?zone=4A,5A
    raw[key] = params.getAll(PARAM[key]).flatMap((value) => value.split(",")).map((value) => value.trim()).filter(Boolean);
  }
  const parsed = catalogueQuerySchema.safeParse(raw);
  if (parsed.success) return { ok: true, query: parsed.data };
  return {
    ok: false,
    errors: parsed.error.issues.map((issue) => {
      const key = issue.path[0] as string;
      const param = (PARAM as Record<string, string>)[key] ?? key;
      const value = issue.path.length > 1 ? raw[key] && (raw[key] as unknown[])[issue.path[1] as number] : raw[key];
      return { param, message: issue.code === "invalid_value" ? `"${String(value)}" is not a known ${param}` : issue.message };
    }),
  };
}

export function effectiveSort(query: CatalogueQuery): Sort {
  return query.sort ?? (query.q ? "relevance" : "revised");
}

/** The query as URL parameters, with defaults left out. */
export function toSearchParams(query: Partial<CatalogueQuery>): URLSearchParams {
  const params = new URLSearchParams();
  if (query.q) params.set("q", query.q);
  for (const key of FILTER_KEYS) {
    for (const value of query[key] ?? []) params.append(PARAM[key], value);
  }
  if (query.sort) params.set("sort", query.sort);
  if (query.page && query.page > 1) params.set("page", String(query.page));
  return params;
}

export function toggleFilter(query: CatalogueQuery, key: FilterKey, value: string): CatalogueQuery {
  const current = query[key] as string[];
  const next = current.includes(value) ? current.filter((v) => v !== value) : [...current, value];
  return { ...query, [key]: next, page: 1 };
}

export function paramName(key: FilterKey): string {
  return PARAM[key];
}
