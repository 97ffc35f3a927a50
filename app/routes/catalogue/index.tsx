import { data, Form, Link, useNavigation, useSubmit } from "react-router";
import type { Route } from "./+types/index";
import { DetailCard } from "~/components/detail-card";
import { FacetRail } from "~/components/facet-rail";
import { SearchBox } from "~/components/search-box";
import { UnitsToggle } from "~/components/units-toggle";
import { SORTS, toSearchParams, type CatalogueQuery } from "~/catalogue/query";
import { parseCatalogueQuery } from "~/catalogue/query-parse";
import { searchCatalogue } from "~/catalogue/search.server";
import { unitsFor } from "~/preferences/units.server";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: data && "result" in data ? `Catalogue (${data.result.total}) — Dryside` : "Catalogue — Dryside" },
];

export async function loader({ request }: Route.LoaderArgs) {
  const parsed = parseCatalogueQuery(new URL(request.url).searchParams);
  if (!parsed.ok) {
    throw data(
      `This search address has a problem: ${parsed.errors.map((e) => `${e.param}: ${e.message}`).join("; ")}`,
      { status: 400 },
    );
  }
  const [result, units] = await Promise.all([searchCatalogue(parsed.query), unitsFor(request)]);
  return { query: parsed.query, result, units };
}

const SORT_LABELS: Record<(typeof SORTS)[number], string> = {
  relevance: "Best match",
  revised: "Recently revised",
  title: "Title A–Z",
  "r-value": "Highest R",
};

function pageHref(query: CatalogueQuery, page: number): string {
  const params = toSearchParams({ ...query, page });
  const text = params.toString();
  return text ? `?${text}` : "?";
}

export default function Catalogue({ loaderData }: Route.ComponentProps) {
  const { query, result, units } = loaderData;
  const submit = useSubmit();
  const navigation = useNavigation();
  const busy = navigation.state === "loading" && navigation.location?.pathname === "/details";
  const anyFilter = toSearchParams({ ...query, sort: undefined, page: 1 }).toString() !== "";

  return (
    <div>
      <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl">Catalogue</h1>
          <p className="mt-1 text-sm text-graphite-soft" data-testid="result-count" aria-live="polite">
            {result.total} {result.total === 1 ? "detail" : "details"}
            {query.q ? <> matching “{query.q}”</> : null}
          </p>
        </div>
        <UnitsToggle units={units} />
      </div>

      <Form
        method="get"
        id="catalogue-search"
        className="grid gap-8 lg:grid-cols-[15rem_1fr]"
        onChange={(event) => {
          // Facets and sort apply at once; typing waits for Enter or a chosen suggestion.
          const target = event.target as HTMLElement;
          if (target instanceof HTMLInputElement && target.type === "search") return;
          submit(event.currentTarget, { preventScrollReset: true, replace: true });
        }}
      >
        <aside aria-label="Filters" className="order-2 lg:order-1">
          <FacetRail query={query} facets={result.facets} />
          <div className="mt-6 flex gap-3 text-sm">
            <noscript>
              <button type="submit" className="rounded bg-graphite px-3 py-1 text-paper">
                Apply
              </button>
            </noscript>
            {anyFilter ? <Link to="/details">Clear all</Link> : null}
          </div>
        </aside>

        <section className="order-1 lg:order-2" aria-busy={busy}>
          <div className="flex flex-wrap gap-3">
            <div className="min-w-[16rem] flex-1">
              <SearchBox defaultValue={query.q} />
            </div>
            <label className="flex items-center gap-2 text-sm">
              <span className="text-graphite-soft">Sort</span>
              <select name="sort" defaultValue={result.sort} className="rounded border border-rule bg-sheet px-2 py-2">
                {SORTS.map((sort) => (
                  <option key={sort} value={sort} disabled={sort === "relevance" && !query.q}>
                    {SORT_LABELS[sort]}
                  </option>
                ))}
              </select>
            </label>
            <button type="submit" className="rounded bg-ochre px-4 py-2 font-medium text-white hover:bg-ochre-deep">
              Search
            </button>
          </div>

          {result.cards.length === 0 ? (
            <div className="mt-10 rounded border border-dashed border-rule p-8 text-center">
              <p className="font-serif text-lg">No detail fits all of these choices.</p>
              <p className="mt-2 text-sm text-graphite-soft">Remove a filter, or search with fewer words.</p>
            </div>
          ) : (
            <div className={`mt-6 grid gap-4 sm:grid-cols-2 xl:grid-cols-3 ${busy ? "opacity-60" : ""}`}>
              {result.cards.map((card) => (
                <DetailCard key={card.slug} card={card} units={units} />
              ))}
            </div>
          )}

          {result.pages > 1 ? (
            <nav aria-label="Pages" className="mt-8 flex items-center justify-between text-sm">
              {result.page > 1 ? (
                <Link to={pageHref(query, result.page - 1)} preventScrollReset={false}>
                  ← Previous
                </Link>
              ) : (
                <span />
              )}
              <span className="text-graphite-soft">
                Page {result.page} of {result.pages}
              </span>
              {result.page < result.pages ? <Link to={pageHref(query, result.page + 1)}>Next →</Link> : <span />}
            </nav>
          ) : null}
        </section>
      </Form>
    </div>
  );
}
