import { suggestionCorpus } from "~/catalogue/suggestions.server";

// GET /api/suggestions: the typeahead corpus, cached briefly by the browser.
export async function loader() {
  return Response.json(
    { suggestions: await suggestionCorpus() },
    { headers: { "Cache-Control": "public, max-age=300" } },
  );
}
