import { z } from "zod";
import {
  ASSEMBLY_KINDS,
  BELOW_GRADE_CONDITIONS,
  INSULATION_STRATEGIES,
  SUBSTRATES,
  TIERS,
} from "~/content/vocabularies";
import { CLIMATE_ZONE_IDS, MOISTURE_REGIMES } from "~/vocabulary/climate-zones";
import { FILTER_KEYS, PARAM, SORTS, type CatalogueQuery } from "./query";

// Validation of the catalogue URL, for loaders and API routes (zod stays out of the client bundle).
const multi = <T extends readonly [string, ...string[]]>(values: T) => z.array(z.enum(values)).max(values.length);

export const catalogueQuerySchema = z.object({
  q: z.string().trim().max(120, "search text is limited to 120 characters").default(""),
  zone: multi(CLIMATE_ZONE_IDS),
  regime: multi(MOISTURE_REGIMES),
  assembly: multi(ASSEMBLY_KINDS),
  substrate: multi(SUBSTRATES),
  belowGrade: multi(BELOW_GRADE_CONDITIONS),
  strategy: multi(INSULATION_STRATEGIES),
  interiorClass: multi(["I", "II", "III", "none"] as const),
  tier: multi(TIERS),
  sort: z.enum(SORTS).optional(),
  page: z.coerce.number().int().min(1).max(10000).default(1),
});

export type QueryParseResult =
  | { ok: true; query: CatalogueQuery }
  | { ok: false; errors: { param: string; message: string }[] };

export function parseCatalogueQuery(params: URLSearchParams): QueryParseResult {
  const raw: Record<string, unknown> = {
    q: params.get("q") ?? undefined,
    sort: params.get("sort") || undefined,
    page: params.get("page") ?? undefined,
  };
  for (const key of FILTER_KEYS) {
    // Accept both repeated parameters and comma lists: ?zone=4A&zone=5A or ?zone=4A,5A
    raw[key] = params
      .getAll(PARAM[key])
      .flatMap((value) => value.split(","))
      .map((value) => value.trim())
      .filter(Boolean);
  }
  const parsed = catalogueQuerySchema.safeParse(raw);
  if (parsed.success) return { ok: true, query: parsed.data };
  return {
    ok: false,
    errors: parsed.error.issues.map((issue) => {
      const key = issue.path[0] as string;
      const param = (PARAM as Record<string, string>)[key] ?? key;
      const value = issue.path.length > 1 ? raw[key] && (raw[key] as unknown[])[issue.path[1] as number] : raw[key];
      return {
        param,
        message: issue.code === "invalid_value" ? `"${String(value)}" is not a known ${param}` : issue.message,
      };
    }),
  };
}
