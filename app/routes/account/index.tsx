import type { Route } from "./+types/index";
import { Link } from "react-router";
import { userContext } from "~/auth/guards.server";
import type { StaffRole } from "~/vocabulary/roles";
import { listSaved } from "~/desk/saved.server";
import { billingOverview } from "~/payments/billing.server";
import { STAFF_ROLE_DESCRIPTIONS } from "~/vocabulary/roles";

export const meta: Route.MetaFunction = () => [{ title: "Your account — Dryside" }];

export async function loader({ context }: Route.LoaderArgs) {
  const user = context.get(userContext);
  const role: StaffRole = user.role;
  return {
    profile: {
      email: user.email,
      displayName: user.displayName,
      role,
      verifiedAt: user.emailVerifiedAt?.toISOString() ?? null,
      memberSince: user.createdAt.toISOString(),
    },
    saved: await listSaved(user.id),
    billing: await billingOverview(user),
  };
}

export default function Account({ loaderData }: Route.ComponentProps) {
  const { profile, saved, billing } = loaderData;
  return (
    <div className="flex flex-col gap-10">
      <header>
        <h1 className="text-3xl" data-testid="account-heading">
          Your account
        </h1>
        <p className="mt-2 text-graphite-soft">Signed in as {profile.displayName}.</p>
      </header>
      <section id="profile" aria-labelledby="profile-heading" className="rounded border border-rule bg-sheet p-6">
        <h2 id="profile-heading" className="text-xl">
          Profile
        </h2>
        <dl className="mt-4 grid grid-cols-[10rem_1fr] gap-y-2 text-sm">
          <dt className="text-graphite-soft">E-mail</dt>
          <dd data-testid="account-email">{profile.email}</dd>
          <dt className="text-graphite-soft">Role</dt>
          <dd data-testid="account-role">{STAFF_ROLE_DESCRIPTIONS[profile.role]}</dd>
          <dt className="text-graphite-soft">E-mail confirmed</dt>
          <dd data-testid="account-verified">
            {profile.verifiedAt ? `Yes, on ${profile.verifiedAt.slice(0, 10)}` : "Not yet"}
          </dd>
          <dt className="text-graphite-soft">Member since</dt>
          <dd>{profile.memberSince.slice(0, 10)}</dd>
        </dl>
      </section>
      <section id="plan" aria-labelledby="plan-heading">
        <h2 id="plan-heading" className="text-xl">
          Plan and sets
        </h2>
        {billing.plan ? (
          <p className="mt-2 text-sm" data-testid="account-plan">
            {billing.plan.name}: {billing.plan.status.replace("_", " ")}
            {billing.plan.renewsOrEndsAt
              ? `, ${billing.plan.cancelAtPeriodEnd || billing.plan.status !== "active" ? "ends" : "renews"} ${billing.plan.renewsOrEndsAt.slice(0, 10)}`
              : ""}
            . <Link to="/account/billing">Billing and receipts</Link>
          </p>
        ) : (
          <p className="mt-2 text-sm text-graphite-soft">
            No plan. Premium details and pack downloads come with a <Link to="/pricing">plan</Link> or a bought{" "}
            <Link to="/sets">set</Link>.
          </p>
        )}
        {billing.sets.length ? (
          <ul className="mt-2 space-y-1 text-sm" data-testid="account-sets">
            {billing.sets.map((set) => (
              <li key={set.slug}>
                <Link to={`/sets#${set.slug}`}>{set.title}</Link>{" "}
                <span className="text-xs text-graphite-soft">bought {set.boughtAt.slice(0, 10)}</span>
              </li>
            ))}
          </ul>
        ) : null}
      </section>
      <section id="downloads" aria-labelledby="downloads-heading">
        <h2 id="downloads-heading" className="text-xl">
          Downloads
        </h2>
        {billing.plan?.live || billing.sets.length ? (
          <p className="mt-2 text-sm">
            Packs of printable sheets are on the <Link to="/sets">sets page</Link>, one download per set.
          </p>
        ) : (
          <p className="mt-2 text-sm text-graphite-soft">Packs become downloadable with a plan or a bought set.</p>
        )}
        {billing.downloads.length ? (
          <ul className="mt-2 space-y-1 text-xs text-graphite-soft">
            {billing.downloads.map((download) => (
              <li key={download.at}>
                {download.setTitle}, downloaded {download.at.slice(0, 16).replace("T", " ")} UTC
              </li>
            ))}
          </ul>
        ) : null}
      </section>
      <section id="saved-details" aria-labelledby="saved-heading">
        <h2 id="saved-heading" className="text-xl">
          Saved details
        </h2>
        {saved.length ? (
          <ul className="mt-2 space-y-1 text-sm" data-testid="saved-details">
            {saved.map((row) => (
              <li key={row.slug}>
                {row.live ? (
                  <Link to={`/details/${row.slug}`}>{row.title}</Link>
                ) : (
                  <span>
                    {row.title} <span className="text-graphite-soft">(withdrawn)</span>
                  </span>
                )}{" "}
                <span className="text-xs text-graphite-soft">
                  {row.tier} · saved {row.savedAt.slice(0, 10)}
                </span>
              </li>
            ))}
          </ul>
        ) : (
          <p className="mt-2 text-sm text-graphite-soft">
            Details you save appear here, and you get an e-mail when one is revised.
          </p>
        )}
      </section>
    </div>
  );
}
