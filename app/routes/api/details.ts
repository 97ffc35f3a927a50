import type { Route } from "./+types/details";
import { parseCatalogueQuery } from "~/catalogue/query-parse";
import { searchCatalogue } from "~/catalogue/search.server";
import { jsonError } from "~/http/json";
import { STANDING_CAUTION } from "~/vocabulary/caution";

// GET /api/details: the catalogue search with the page's filters and its facet counts.
export async function loader({ request }: Route.LoaderArgs) {
  const parsed = parseCatalogueQuery(new URL(request.url).searchParams);
  if (!parsed.ok)
    return jsonError(400, "invalid_query", "Some search parameters are not valid.", { problems: parsed.errors });
  const result = await searchCatalogue(parsed.query);
  return Response.json({ query: parsed.query, ...result, caution: STANDING_CAUTION });
}
