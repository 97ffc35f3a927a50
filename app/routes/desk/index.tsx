import { Link } from "react-router";
import type { Route } from "./+types/index";
import { userContext } from "~/auth/guards.server";
import { REVISION_STATE_LABELS } from "~/vocabulary/revision-states";
import { roleAtLeast } from "~/vocabulary/roles";
import { deskOverview, type RevisionRow } from "~/desk/revisions.server";

export const meta: Route.MetaFunction = () => [{ title: "Desk — Dryside" }];

export async function loader({ context }: Route.LoaderArgs) {
  const user = context.get(userContext);
  return { overview: await deskOverview(user), reviewer: roleAtLeast(user.role, "reviewer") };
}

function RevisionList({
  rows,
  hrefFor,
  empty,
  testId,
}: {
  rows: RevisionRow[];
  hrefFor: (row: RevisionRow) => string;
  empty: string;
  testId: string;
}) {
  if (!rows.length) return <p className="text-sm text-graphite-soft">{empty}</p>;
  return (
    <ul className="divide-y divide-rule rounded border border-rule bg-sheet" data-testid={testId}>
      {rows.map((row) => (
        <li key={row.id} className="flex flex-wrap items-baseline justify-between gap-2 px-4 py-2">
          <Link to={hrefFor(row)}>{row.title}</Link>
          <span className="text-xs text-graphite-soft">
            revision {row.number} · <span data-state={row.state}>{REVISION_STATE_LABELS[row.state]}</span> ·{" "}
            {row.authorName}
            {row.reviewerName && row.state !== "draft" ? ` · reviewer ${row.reviewerName}` : ""} ·{" "}
            {row.updatedAt.slice(0, 10)}
          </span>
        </li>
      ))}
    </ul>
  );
}

export default function Desk({ loaderData }: Route.ComponentProps) {
  const { overview, reviewer } = loaderData;
  return (
    <div className="space-y-10">
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl">Desk</h1>
          <p className="mt-2 max-w-prose text-graphite-soft">
            Write and revise details, send them for review, and keep the material library honest. Nothing reaches the
            catalogue until another reviewer approves it.
          </p>
        </div>
        <div className="flex gap-3">
          <Link
            to="/desk/new"
            className="rounded bg-ochre px-4 py-2 font-medium text-white no-underline hover:bg-ochre-deep"
          >
            New detail
          </Link>
          <Link to="/desk/materials" className="rounded border border-rule px-4 py-2 no-underline">
            Material library
          </Link>
        </div>
      </header>
      <section aria-labelledby="drafts-heading" className="space-y-2">
        <h2 id="drafts-heading" className="text-xl">
          My drafts
        </h2>
        <RevisionList
          rows={overview.drafts}
          hrefFor={(row) => `/desk/revisions/${row.id}`}
          empty="No open drafts. Start one from a published detail's desk link or with “New detail”."
          testId="my-drafts"
        />
      </section>
      <section aria-labelledby="submissions-heading" className="space-y-2">
        <h2 id="submissions-heading" className="text-xl">
          My submissions
        </h2>
        <RevisionList
          rows={overview.submissions}
          hrefFor={(row) => `/desk/revisions/${row.id}`}
          empty="Nothing submitted yet."
          testId="my-submissions"
        />
      </section>
      {reviewer && overview.queue ? (
        <section aria-labelledby="queue-heading" className="space-y-2">
          <h2 id="queue-heading" className="text-xl">
            Review queue
          </h2>
          <p className="text-sm text-graphite-soft">
            Others' submissions. Your own never appear here: another reviewer approves them.
          </p>
          <RevisionList
            rows={overview.queue}
            hrefFor={(row) => `/desk/review/${row.id}`}
            empty="The queue is empty."
            testId="review-queue"
          />
        </section>
      ) : null}
      <section aria-labelledby="published-heading" className="space-y-2">
        <h2 id="published-heading" className="text-xl">
          Recently published
        </h2>
        <ul className="divide-y divide-rule rounded border border-rule bg-sheet" data-testid="recently-published">
          {overview.published.map((row) => (
            <li key={row.id} className="flex flex-wrap items-baseline justify-between gap-2 px-4 py-2">
              <Link to={`/details/${row.slug}`}>{row.title}</Link>
              <span className="flex gap-3 text-xs">
                <span className="text-graphite-soft">
                  revision {row.number} · {row.updatedAt.slice(0, 10)}
                </span>
                <Link to={`/desk/details/${row.slug}/edit`}>Revise</Link>
                {reviewer ? (
                  <Link to={`/desk/details/${row.slug}/withdraw`} className="text-stop">
                    Withdraw
                  </Link>
                ) : null}
              </span>
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
