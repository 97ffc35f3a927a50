import { Link } from "react-router";
import type { DetailCard as Card } from "~/catalogue/search.server";
import { labelFor } from "~/catalogue/vocabulary";
import { SectionStrip } from "./section-strip";
import { formatR, type UnitSystem } from "~/envelope/units";

export function DetailCard({ card, units }: { card: Card; units: UnitSystem }) {
  return (
    <article
      className="flex flex-col rounded border border-rule bg-sheet p-4 shadow-[0_1px_0_rgba(0,0,0,0.04)]"
      data-testid="detail-card"
    >
      <SectionStrip layers={card.strip} className="mb-3" />
      <div className="flex items-start justify-between gap-3">
        <h3 className="text-base leading-snug">
          <Link to={`/details/${card.slug}`} className="text-graphite no-underline hover:text-ochre-deep">
            {card.title}
          </Link>
        </h3>
        {card.tier === "premium" ? (
          <span className="shrink-0 rounded-sm border border-ochre px-1.5 text-[0.7rem] font-semibold uppercase tracking-wide text-ochre-deep">
            Premium
          </span>
        ) : (
          <span className="shrink-0 rounded-sm border border-vapour/50 px-1.5 text-[0.7rem] font-semibold uppercase tracking-wide text-vapour">
            Free
          </span>
        )}
      </div>
      <p className="mt-2 flex-1 text-sm text-graphite-soft">{card.summary}</p>
      <dl className="mt-3 grid grid-cols-2 gap-x-3 gap-y-1 text-xs">
        <dt className="text-graphite-soft">Assembly</dt>
        <dd>{labelFor(card.assembly)}</dd>
        <dt className="text-graphite-soft">Zones</dt>
        <dd>{card.zones.join(", ")}</dd>
        <dt className="text-graphite-soft">Clear-wall R</dt>
        <dd className="tabular-nums">{card.rsi === null ? "—" : formatR(card.rsi, units)}</dd>
      </dl>
    </article>
  );
}
