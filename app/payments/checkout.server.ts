import { downloadableSetIds, hasLivePlan } from "~/access/premium.server";
import { env } from "~/config/env.server";
import { DetailSet, Entitlement, type User } from "~/models/index.server";
import { ensurePrice, findPlan, findSetOffer, planPriceSpec, setPriceSpec } from "./catalogue.server";
import { stripe } from "./stripe.server";
import type { EntitlementKind } from "~/vocabulary/entitlements";

export type Purchase = { kind: "plan"; plan: string } | { kind: "set"; set: string };

export type CheckoutStart = { ok: true; url: string } | { ok: false; status: 400 | 404 | 409; message: string };

/** The buyer's customer in the payments service, created once and remembered on the user. */
export async function customerFor(user: User): Promise<string> {
  if (user.stripeCustomerId) return user.stripeCustomerId;
  // The idempotency key keeps two quick clicks from making two customers for one person.
  const customer = await stripe().customers.create(
    { email: user.email, name: user.displayName, metadata: { user_id: String(user.id) } },
    { idempotencyKey: `dryside-customer-${user.id}` },
  );
  await user.update({ stripeCustomerId: customer.id });
  return customer.id;
}

function appUrl(path: string): string {
  return new URL(path, env().APP_URL).toString();
}

// The placeholder is filled in by the payments service; it is not URL-encoded on purpose.
const RETURN_PATH = "/account/checkout/return?session_id={CHECKOUT_SESSION_ID}";

/**
 * Opens a hosted checkout for one plan (subscription) or one set (one-time payment) and returns its URL.
 * Grants nothing: the entitlement comes from the signed webhook when the payment is done.
 */
export async function startCheckout(user: User, purchase: Purchase): Promise<CheckoutStart> {
  const viewer = { id: user.id, role: user.role };
  const customer = await customerFor(user);
  const common = {
    customer,
    client_reference_id: String(user.id),
    success_url: appUrl("/").replace(/\/$/, "") + RETURN_PATH,
  };

  if (purchase.kind === "plan") {
    const plan = findPlan(purchase.plan);
    if (!plan) return { ok: false, status: 404, message: `There is no plan called “${purchase.plan}”.` };
    if (await hasLivePlan(viewer))
      return { ok: false, status: 409, message: "You already have a plan. Change or stop it on your billing page." };
    const { price } = await ensurePrice(planPriceSpec(plan));
    const session = await stripe().checkout.sessions.create({
      ...common,
      mode: "subscription",
      line_items: [{ price: price.id, quantity: 1 }],
      metadata: { kind: "plan", plan_slug: plan.slug, user_id: String(user.id) },
      cancel_url: appUrl("/pricing"),
    });
    if (!session.url) throw new Error(`checkout session ${session.id} has no URL`);
    return { ok: true, url: session.url };
  }

  const offer = await findSetOffer(purchase.set);
  if (!offer) return { ok: false, status: 404, message: `There is no set called “${purchase.set}”.` };
  const owned = await downloadableSetIds(viewer);
  if (owned === "all" || owned.has(offer.id))
    return { ok: false, status: 409, message: `You already have “${offer.title}”.` };
  const { price } = await ensurePrice(setPriceSpec(offer));
  const session = await stripe().checkout.sessions.create({
    ...common,
    mode: "payment",
    line_items: [{ price: price.id, quantity: 1 }],
    metadata: { kind: "set", set_slug: offer.slug, user_id: String(user.id) },
    cancel_url: appUrl(`/sets#${offer.slug}`),
  });
  if (!session.url) throw new Error(`checkout session ${session.id} has no URL`);
  return { ok: true, url: session.url };
}

export type CheckoutState =
  | { state: "granted"; kind: EntitlementKind; label: string; setSlug: string | null }
  | { state: "pending" }
  | { state: "unpaid" }
  | { state: "unknown" };

/**
 * What a returning buyer sees. Reads only: the entitlement row (written by the webhook) decides
 * "granted"; the service's session says whether the payment went through at all.
 */
export async function readCheckoutState(user: User, sessionId: string): Promise<CheckoutState> {
  const granted = await Entitlement.findOne({ where: { userId: user.id, stripeCheckoutSessionId: sessionId } });
  if (granted) {
    const set = granted.setId ? await DetailSet.findByPk(granted.setId) : null;
    const label = granted.kind === "plan" ? (findPlan(granted.planSlug ?? "")?.name ?? "Plan") : (set?.title ?? "Set");
    return { state: "granted", kind: granted.kind, label, setSlug: set?.slug ?? null };
  }
  try {
    const session = await stripe().checkout.sessions.retrieve(sessionId);
    // Someone else's session id tells this user nothing.
    if (session.client_reference_id !== String(user.id)) return { state: "unknown" };
    return session.status === "complete" ? { state: "pending" } : { state: "unpaid" };
  } catch {
    return { state: "unknown" };
  }
}
