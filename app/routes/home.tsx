import { Form, Link } from "react-router";
import type { Route } from "./+types/home";
import { getLibraryOverview } from "~/catalogue/overview.server";
import { FEATURED_ZONES, zoneLabel } from "~/vocabulary/climate-zones";

export const meta: Route.MetaFunction = () => [
  { title: "Dryside — reviewed building-envelope details" },
  {
    name: "description",
    content: "Reviewed wall, roof, crawlspace, basement and slab details, checked against your climate.",
  },
];

export async function loader() {
  return { overview: await getLibraryOverview() };
}

export default function Home({ loaderData }: Route.ComponentProps) {
  const { overview } = loaderData;
  return (
    <div className="grid gap-12 lg:grid-cols-[3fr_2fr]">
      <section>
        <h1 className="text-4xl leading-tight">Assembly details that stay warm and dry where you build.</h1>
        <p className="mt-4 max-w-prose text-lg text-graphite-soft">
          Dryside is a library of reviewed building-envelope details — walls, roofs, crawlspaces, basements, slabs and
          rim joists. Every detail lists its layers from outside to inside, explains how it controls water, air, vapour
          and heat, and runs a site check for your climate before you build it.
        </p>
        <Form method="get" action="/details" className="mt-8 flex max-w-xl gap-2" role="search">
          <label htmlFor="home-q" className="sr-only">
            Search details
          </label>
          <input
            id="home-q"
            name="q"
            placeholder="e.g. sealed crawlspace, exterior foam, basement wall"
            className="flex-1 rounded border border-rule bg-sheet px-3 py-2"
          />
          <button type="submit" className="rounded bg-ochre px-4 py-2 font-medium text-white hover:bg-ochre-deep">
            Search
          </button>
        </Form>
        <div className="mt-6">
          <p className="text-sm text-graphite-soft">Or start from your climate zone:</p>
          <ul className="mt-2 flex flex-wrap gap-2">
            {FEATURED_ZONES.map((zone) => (
              <li key={zone}>
                <Link
                  to={`/details?zone=${zone}`}
                  className="inline-block rounded border border-rule bg-sheet px-3 py-1 text-sm no-underline hover:border-ochre"
                >
                  {zoneLabel(zone)}
                </Link>
              </li>
            ))}
          </ul>
        </div>
      </section>
      <aside className="rounded border border-rule bg-sheet p-6">
        <p className="text-sm text-graphite-soft">
          <span className="font-serif text-3xl text-graphite" data-testid="published-count">
            {overview.publishedCount}
          </span>{" "}
          reviewed details, {overview.freeCount} free to read.
        </p>
        <h2 className="mt-6 text-lg">Lately revised</h2>
        {overview.recentRevisions.length === 0 ? (
          <p className="mt-2 text-sm text-graphite-soft">Nothing has been published yet.</p>
        ) : (
          <ul className="mt-2 space-y-3">
            {overview.recentRevisions.map((revision) => (
              <li key={`${revision.slug}-${revision.number}`}>
                <Link to={`/details/${revision.slug}`} className="font-medium">
                  {revision.title}
                </Link>
                <p className="text-xs text-graphite-soft">
                  Revision {revision.number} · {new Date(revision.publishedAt).toLocaleDateString("en-CA")}
                  {revision.changeNote ? ` — ${revision.changeNote}` : ""}
                </p>
              </li>
            ))}
          </ul>
        )}
      </aside>
    </div>
  );
}
