import { Link } from "react-router";
import type { Route } from "./+types/checkout-return";
import { userContext } from "~/auth/guards.server";
import { readCheckoutState } from "~/payments/checkout.server";

export const meta: Route.MetaFunction = () => [{ title: "Your purchase — Dryside" }];

// Where the hosted checkout sends the buyer back. It only reads: access is granted by the signed
// webhook, which may land a moment after the buyer does, so the page refreshes itself while pending.
export async function loader({ request, context }: Route.LoaderArgs) {
  const user = context.get(userContext);
  const sessionId = new URL(request.url).searchParams.get("session_id");
  if (!sessionId || !/^cs_[A-Za-z0-9_]+$/.test(sessionId)) return { state: "unknown" as const };
  return readCheckoutState(user, sessionId);
}

export default function CheckoutReturn({ loaderData }: Route.ComponentProps) {
  const state = loaderData;
  return (
    <section className="mx-auto max-w-2xl py-10" data-testid="checkout-return" data-state={state.state}>
      {state.state === "pending" && <meta httpEquiv="refresh" content="2" />}
      {state.state === "granted" && (
        <>
          <h1 className="text-3xl">Thank you — it is yours</h1>
          <p className="mt-4" data-testid="checkout-granted">
            {state.kind === "plan"
              ? `Your ${state.label.toLowerCase()} is active: every premium detail and pack is open to you.`
              : `“${state.label}” is yours to keep.`}
          </p>
          <p className="mt-4 flex gap-6">
            {state.setSlug ? (
              <Link to={`/sets#${state.setSlug}`}>Download the pack</Link>
            ) : (
              <Link to="/sets">Browse the sets</Link>
            )}
            <Link to="/account/billing">Billing and receipts</Link>
          </p>
          <p className="mt-6 text-sm text-graphite-soft">A receipt is on its way to your e-mail.</p>
        </>
      )}
      {state.state === "pending" && (
        <>
          <h1 className="text-3xl">Payment received, opening your access…</h1>
          <p className="mt-4 text-graphite-soft">
            The payments service is confirming it with us. This page checks again every two seconds.
          </p>
        </>
      )}
      {state.state === "unpaid" && (
        <>
          <h1 className="text-3xl">The payment was not completed</h1>
          <p className="mt-4 text-graphite-soft">
            Nothing was charged. <Link to="/pricing">Back to pricing</Link>.
          </p>
        </>
      )}
      {state.state === "unknown" && (
        <>
          <h1 className="text-3xl">We could not find that checkout</h1>
          <p className="mt-4 text-graphite-soft">
            Your plan and sets are listed on <Link to="/account/billing">the billing page</Link>.
          </p>
        </>
      )}
    </section>
  );
}
