import type {
  ASSEMBLY_KINDS,
  BELOW_GRADE_CONDITIONS,
  INSULATION_STRATEGIES,
  SUBSTRATES,
  TIERS,
} from "~/content/vocabularies";
import type { ClimateZoneId, MoistureRegime } from "~/vocabulary/climate-zones";

// The catalogue's URL is its state: one parser for the page, the API and the client, so a shared
// link always means the same search.

export const SORTS = ["relevance", "title", "revised", "r-value"] as const;
export type Sort = (typeof SORTS)[number];
export const PER_PAGE = 24;

/** A catalogue search as the URL states it (validated by query-parse.ts on the server). */
export interface CatalogueQuery {
  q: string;
  zone: ClimateZoneId[];
  regime: MoistureRegime[];
  assembly: (typeof ASSEMBLY_KINDS)[number][];
  substrate: (typeof SUBSTRATES)[number][];
  belowGrade: (typeof BELOW_GRADE_CONDITIONS)[number][];
  strategy: (typeof INSULATION_STRATEGIES)[number][];
  interiorClass: ("I" | "II" | "III" | "none")[];
  tier: (typeof TIERS)[number][];
  sort?: Sort;
  page: number;
}
export const FILTER_KEYS = [
  "zone",
  "regime",
  "assembly",
  "substrate",
  "belowGrade",
  "strategy",
  "interiorClass",
  "tier",
] as const;
export type FilterKey = (typeof FILTER_KEYS)[number];

// URL parameter names (kebab for the two-word keys, so links read naturally).
export const PARAM: Record<FilterKey, string> = {
  zone: "zone",
  regime: "regime",
  assembly: "assembly",
  substrate: "substrate",
  belowGrade: "below-grade",
  strategy: "strategy",
  interiorClass: "interior-class",
  tier: "tier",
};

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

export function paramName(key: FilterKey): string {
  return PARAM[key];
}
