import { Link } from "react-router";
import type { Route } from "./+types/index";
import { getViewer } from "~/access/viewer.server";
import { BuyButton } from "~/components/buy-button";
import { offersFor } from "~/payments/offers.server";

export const meta: Route.MetaFunction = () => [{ title: "Sets — Dryside" }];

export async function loader({ context }: Route.LoaderArgs) {
  return offersFor(getViewer(context));
}

export default function Sets({ loaderData }: Route.ComponentProps) {
  const { sets, signedIn } = loaderData;
  return (
    <div className="flex flex-col gap-8">
      <header className="max-w-3xl">
        <h1 className="text-3xl">Sets</h1>
        <p className="mt-2 text-graphite-soft">
          Details grouped the way jobs come in. Each set downloads as a pack: one PDF sheet per detail and its Markdown
          source. A plan opens them all; <Link to="/pricing">see pricing</Link>.
        </p>
      </header>
      {sets.map((set) => (
        <section
          key={set.slug}
          id={set.slug}
          aria-labelledby={`${set.slug}-heading`}
          className="scroll-mt-6 rounded border border-rule bg-sheet p-6"
          data-testid={`set-${set.slug}`}
        >
          <div className="flex flex-wrap items-baseline justify-between gap-4">
            <h2 id={`${set.slug}-heading`} className="text-xl">
              {set.title}
            </h2>
            <p className="font-mono">{set.priceLabel}</p>
          </div>
          <p className="mt-2 max-w-3xl text-sm text-graphite-soft">{set.summary}</p>
          <ul className="mt-4 grid gap-1 text-sm sm:grid-cols-2">
            {set.details.map((detail) => (
              <li key={detail.slug}>
                <Link to={`/details/${detail.slug}`}>{detail.title}</Link>
                {detail.tier === "free" && (
                  <span className="ml-2 text-xs uppercase tracking-wide text-vapour">free</span>
                )}
              </li>
            ))}
          </ul>
          <div className="mt-5 flex flex-wrap items-center gap-4">
            {set.owned ? (
              <>
                <a
                  href={`/sets/${set.slug}/pack`}
                  download
                  className="rounded bg-vapour px-4 py-2 font-semibold text-sheet no-underline"
                  data-testid={`download-${set.slug}`}
                >
                  Download the pack (ZIP)
                </a>
                <a href={`/sets/${set.slug}/pack?units=si`} download className="text-sm">
                  SI units
                </a>
              </>
            ) : signedIn ? (
              <BuyButton
                kind="set"
                item={set.slug}
                label={`Buy this set, ${set.priceLabel}`}
                testId={`buy-${set.slug}`}
              />
            ) : (
              <Link to={`/sign-in?next=${encodeURIComponent(`/sets#${set.slug}`)}`}>Sign in to buy this set</Link>
            )}
          </div>
        </section>
      ))}
    </div>
  );
}
