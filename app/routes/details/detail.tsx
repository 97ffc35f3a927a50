import { data, Link } from "react-router";
import type { Route } from "./+types/detail";
import { getViewer } from "~/access/viewer.server";
import { detailPage } from "~/catalogue/detail-page.server";
import { labelFor } from "~/catalogue/vocabulary";
import { LayerTable } from "~/components/layer-table";
import { SectionDrawing } from "~/components/section-drawing";
import { SiteCheckPanel } from "~/components/site-check-panel";
import { UnitsToggle } from "~/components/units-toggle";
import { STANDING_CAUTION } from "~/vocabulary/caution";
import { SaveDetailButton } from "~/components/save-detail-button";
import { unitsFor } from "~/preferences/units.server";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: data ? `${data.detail.title} — Dryside` : "Detail — Dryside" },
  { name: "description", content: data?.detail.summary ?? "" },
];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const page = await detailPage(
    params.slug,
    getViewer(context),
    await unitsFor(request),
    new URL(request.url).searchParams,
  );
  if (!page)
    throw data("No published detail has this address. It may have been withdrawn or renamed.", { status: 404 });
  return page;
}

function formatDate(iso: string | null): string {
  return iso ? new Date(iso).toLocaleDateString("en-CA", { year: "numeric", month: "short", day: "numeric" }) : "—";
}

export default function DetailPage({ loaderData }: Route.ComponentProps) {
  const { detail, units, siteValues, initialCheck, saved } = loaderData;
  const facts = [
    ["Assembly", labelFor(detail.assembly)],
    ["Substrate", labelFor(detail.substrate)],
    ["Below grade", labelFor(detail.belowGrade)],
    ["Strategy", labelFor(detail.strategy)],
    ["Interior retarder", detail.interiorClass === "none" ? "none" : `Class ${detail.interiorClass}`],
    ["Zones", detail.zones.join(", ")],
  ];
  return (
    <article className="space-y-10">
      <header className="grid gap-6 lg:grid-cols-[2fr_1fr]">
        <div>
          <p className="text-xs uppercase tracking-wide text-graphite-soft">
            <Link to="/details" className="no-print">
              Catalogue
            </Link>{" "}
            / {labelFor(detail.assembly)}
          </p>
          <h1 className="mt-2 text-3xl leading-tight">{detail.title}</h1>
          <p className="mt-3 max-w-prose text-lg text-graphite-soft">{detail.summary}</p>
          <p className="mt-3 text-sm text-graphite-soft" data-testid="revision-line">
            Revision {detail.revision.number} · published {formatDate(detail.revision.publishedAt)} · written by{" "}
            {detail.revision.authorName}
            {detail.revision.reviewerName ? (
              <>
                , reviewed by {detail.revision.reviewerName} on {formatDate(detail.revision.reviewedAt)}
              </>
            ) : null}
          </p>
        </div>
        <div className="flex flex-col items-start gap-3 lg:items-end">
          <UnitsToggle units={units} />
          <SaveDetailButton slug={detail.slug} saved={saved} />
          <span
            className={`rounded-sm border px-2 py-0.5 text-xs font-semibold uppercase tracking-wide ${detail.tier === "premium" ? "border-ochre text-ochre-deep" : "border-vapour/50 text-vapour"}`}
          >
            {detail.tier}
          </span>
          <button type="button" onClick={() => window.print()} className="no-print text-sm text-ochre-deep underline">
            Print this sheet
          </button>
        </div>
      </header>

      <section className="grid gap-8 lg:grid-cols-[3fr_2fr]">
        <figure className="rounded border border-rule bg-sheet p-3">
          <SectionDrawing
            assembly={{ kind: detail.assembly, layers: detail.drawing }}
            units={units}
            title={detail.title}
          />
        </figure>
        <dl className="grid grid-cols-[auto_1fr] content-start gap-x-4 gap-y-2 text-sm">
          {facts.map(([term, value]) => (
            <div key={term} className="contents">
              <dt className="text-graphite-soft">{term}</dt>
              <dd>{value}</dd>
            </div>
          ))}
          {detail.sets.length ? (
            <div className="contents">
              <dt className="text-graphite-soft">In sets</dt>
              <dd>
                {detail.sets.map((set, i) => (
                  <span key={set.slug}>
                    {i ? ", " : ""}
                    <Link to={`/sets#${set.slug}`}>{set.title}</Link>
                  </span>
                ))}
              </dd>
            </div>
          ) : null}
        </dl>
      </section>

      {detail.full ? (
        <>
          <section aria-labelledby="layers-title">
            <h2 id="layers-title" className="mb-3 text-xl">
              Layers, exterior to interior
            </h2>
            <LayerTable
              layers={detail.full.layers}
              result={(initialCheck && "result" in initialCheck ? initialCheck.result : null) ?? null}
              units={units}
            />
          </section>
          <div className="no-print">
            <SiteCheckPanel
              slug={detail.slug}
              units={units}
              values={siteValues}
              initial={initialCheck}
              claimedZones={detail.zones}
            />
          </div>
          <section
            className="prose prose-stone max-w-none prose-headings:font-serif"
            data-testid="detail-body"
            // biome-ignore lint/security/noDangerouslySetInnerHtml: the body is rendered by marked and sanitised by DOMPurify on the server (app/markdown/render.server.ts)
            dangerouslySetInnerHTML={{ __html: detail.full.bodyHtml }}
          />
          {detail.full.attachments.length ? (
            <section aria-labelledby="attachments-title" data-testid="attachments">
              <h2 id="attachments-title" className="text-xl">
                Drawings and photos
              </h2>
              <ul className="mt-3 grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
                {detail.full.attachments.map((file) => (
                  <li key={file.id} className="rounded border border-rule bg-sheet p-2">
                    {file.contentType === "application/pdf" ? (
                      <a href={file.href}>
                        {file.name} (PDF, {Math.ceil(file.byteSize / 1024)} KB)
                      </a>
                    ) : (
                      <a href={file.href}>
                        <img
                          src={file.href}
                          alt={file.caption ?? file.name}
                          loading="lazy"
                          className="max-h-64 w-full object-contain"
                        />
                      </a>
                    )}
                    {file.caption ? <p className="mt-1 text-xs text-graphite-soft">{file.caption}</p> : null}
                  </li>
                ))}
              </ul>
            </section>
          ) : null}
          <section aria-labelledby="references-title">
            <h2 id="references-title" className="text-xl">
              References
            </h2>
            <ul className="mt-2 list-disc pl-6 text-sm">
              {detail.full.references.map((reference) => (
                <li key={reference}>{reference}</li>
              ))}
            </ul>
          </section>
        </>
      ) : (
        <section className="rounded border border-ochre/60 bg-sheet p-6" data-testid="premium-preview">
          <h2 className="text-xl">Preview</h2>
          <p className="mt-2 max-w-prose text-graphite-soft">{detail.preview?.excerpt}</p>
          <p className="mt-4 max-w-prose" data-testid="premium-refusal">
            {detail.refusal?.message} The layer table, the site check for your climate, the install sequence and the
            cautions come with it.
          </p>
          <p className="mt-4 flex flex-wrap gap-3">
            {detail.refusal?.offers.map((offer, i) => (
              <Link
                key={offer.href}
                to={offer.href}
                className={
                  i === 0
                    ? "rounded bg-ochre px-4 py-2 font-medium text-white no-underline hover:bg-ochre-deep"
                    : "rounded border border-rule px-4 py-2 no-underline"
                }
              >
                {offer.label}
              </Link>
            ))}
          </p>
        </section>
      )}

      <section aria-labelledby="history-title">
        <h2 id="history-title" className="text-xl">
          Revision history
        </h2>
        <ol className="mt-3 space-y-3" data-testid="revision-history">
          {detail.history.map((entry) => (
            <li key={entry.number} className="border-l-2 border-rule pl-4">
              <p className="text-sm font-medium">
                Revision {entry.number}{" "}
                <span className="font-normal text-graphite-soft">
                  · {formatDate(entry.publishedAt)} · {entry.state}
                </span>
              </p>
              {entry.changeNote ? <p className="text-sm">{entry.changeNote}</p> : null}
              {entry.changes.length ? (
                <ul className="mt-1 list-disc pl-5 text-xs text-graphite-soft">
                  {entry.changes.map((change) => (
                    <li key={change}>{change}</li>
                  ))}
                </ul>
              ) : null}
              <p className="text-xs text-graphite-soft">
                Written by {entry.authorName}
                {entry.reviewerName ? `, reviewed by ${entry.reviewerName}` : ""}
              </p>
            </li>
          ))}
        </ol>
      </section>

      {detail.related.length ? (
        <section aria-labelledby="related-title" className="no-print">
          <h2 id="related-title" className="text-xl">
            Related details
          </h2>
          <ul className="mt-2 grid gap-2 sm:grid-cols-2">
            {detail.related.map((related) => (
              <li key={related.slug}>
                <Link to={`/details/${related.slug}`}>{related.title}</Link>{" "}
                <span className="text-xs text-graphite-soft">{related.tier}</span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <p className="hidden text-xs print:block">{STANDING_CAUTION}</p>
    </article>
  );
}
