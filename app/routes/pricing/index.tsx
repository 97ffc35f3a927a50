import { parseWithZod } from "@conform-to/zod/v4";
import { data, Link, redirect } from "react-router";
import type { Route } from "./+types/index";
import { getViewer } from "~/access/viewer.server";
import { requireCsrf } from "~/auth/csrf.server";
import { requireUser } from "~/auth/guards.server";
import { BuyButton } from "~/components/buy-button";
import { checkoutFormSchema } from "~/payments/checkout-form";
import { startCheckout } from "~/payments/checkout.server";
import { offersFor } from "~/payments/offers.server";
import { STANDING_CAUTION } from "~/vocabulary/caution";

export const meta: Route.MetaFunction = () => [{ title: "Pricing — Dryside" }];

export async function loader({ context }: Route.LoaderArgs) {
  return offersFor(getViewer(context));
}

// POST /pricing: opens a hosted checkout for a plan or a set. Signed-in members only; grants nothing.
export async function action({ request, context }: Route.ActionArgs) {
  const user = requireUser(request, context);
  const form = await requireCsrf(request);
  const submission = parseWithZod(form, { schema: checkoutFormSchema });
  if (submission.status !== "success") return data({ message: "Choose a plan or a set to buy." }, { status: 400 });
  const chosen = submission.value;
  const purchase =
    chosen.kind === "plan" ? { kind: "plan" as const, plan: chosen.plan } : { kind: "set" as const, set: chosen.set };
  const started = await startCheckout(user, purchase);
  if (!started.ok) return data({ message: started.message }, { status: started.status });
  return redirect(started.url, { status: 303 });
}

export default function Pricing({ loaderData, actionData }: Route.ComponentProps) {
  const { plans, sets, signedIn, hasPlan } = loaderData;
  return (
    <div className="flex flex-col gap-10">
      <header className="max-w-3xl">
        <h1 className="text-3xl">Pricing</h1>
        <p className="mt-2 text-graphite-soft">
          Free details stay free. A plan opens every premium detail, the site check on them and every set pack; a single
          set is yours to keep after one payment.
        </p>
      </header>
      {actionData?.message && (
        <p role="alert" className="rounded border border-caution/50 bg-sheet p-3 text-sm">
          {actionData.message}
        </p>
      )}
      <section aria-labelledby="plans-heading">
        <h2 id="plans-heading" className="text-xl">
          Plans
        </h2>
        <ul className="mt-4 grid gap-4 sm:grid-cols-2">
          {plans.map((plan) => (
            <li
              key={plan.slug}
              className="flex flex-col gap-3 rounded border border-rule bg-sheet p-5"
              data-testid={`plan-${plan.slug}`}
            >
              <h3 className="text-lg">{plan.name}</h3>
              <p className="font-mono text-lg">{plan.price}</p>
              <p className="text-sm text-graphite-soft">{plan.blurb}</p>
              <div className="mt-auto">
                {hasPlan ? (
                  <Link to="/account/billing">Your plan is on the billing page</Link>
                ) : signedIn ? (
                  <BuyButton
                    kind="plan"
                    item={plan.slug}
                    label={`Start the ${plan.name.toLowerCase()}`}
                    testId={`buy-plan-${plan.slug}`}
                  />
                ) : (
                  <Link to="/sign-in?next=/pricing">Sign in to subscribe</Link>
                )}
              </div>
            </li>
          ))}
        </ul>
      </section>
      <section aria-labelledby="sets-heading">
        <h2 id="sets-heading" className="text-xl">
          Single sets, bought once
        </h2>
        <table className="mt-4 w-full text-left text-sm">
          <thead>
            <tr className="border-b border-rule">
              <th className="py-2">Set</th>
              <th>Details</th>
              <th>Price</th>
              <th>
                <span className="sr-only">Buy</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {sets.map((set) => (
              <tr key={set.slug} className="border-b border-rule/60" data-testid={`price-${set.slug}`}>
                <td className="py-2">
                  <Link to={`/sets#${set.slug}`}>{set.title}</Link>
                </td>
                <td>{set.details.length}</td>
                <td className="font-mono">{set.priceLabel}</td>
                <td className="py-2 text-right">
                  {set.owned ? (
                    <Link to={`/sets#${set.slug}`}>Yours: download</Link>
                  ) : signedIn ? (
                    <BuyButton kind="set" item={set.slug} label="Buy" />
                  ) : (
                    <Link to="/sign-in?next=/pricing">Sign in to buy</Link>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
      <p className="max-w-3xl text-sm text-graphite-soft">
        Prices in US dollars. Payment happens on the payments service's own page; Dryside never sees your card.{" "}
        {STANDING_CAUTION}
      </p>
    </div>
  );
}
