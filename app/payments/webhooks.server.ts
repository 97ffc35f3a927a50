import type Stripe from "stripe";
import { UniqueConstraintError, type Transaction } from "sequelize";
import { env } from "~/config/env.server";
import { DetailSet, Entitlement, PaymentEvent, User, sequelize } from "~/models/index.server";
import type { EntitlementStatus } from "~/vocabulary/entitlements";
import type { PaymentEventResult } from "~/models/payment-event.server";
import { findPlan, planForLookupKey } from "./catalogue.server";
import { recordPayment } from "./receipts.server";
import { stripe } from "./stripe.server";

// The only code that grants, renews or revokes entitlements. Rules:
// - the signature is checked on the raw body; a bad one is refused (400) before anything is read or written;
// - every verified event is stored in payment_events with what processing did; an event id seen before
//   (and not failed) is acknowledged and skipped, so redeliveries change nothing;
// - subscription state is read back from the payments service, never trusted from the event alone,
//   because events can arrive late or out of order;
// - a canceled subscription is final: no later-arriving event brings it back;
// - an event older than the newest one applied to an entitlement is ignored, and a period end never moves
//   backwards.

export interface WebhookReply {
  status: 200 | 400 | 500;
  body: { received: boolean; duplicate?: boolean; result?: PaymentEventResult; message?: string; error?: string };
}

interface Applied {
  result: Exclude<PaymentEventResult, "failed">;
  message: string;
}

/** Verifies, records and applies one webhook delivery. */
export async function handlePaymentWebhook(rawBody: string, signature: string | null): Promise<WebhookReply> {
  if (!signature) return { status: 400, body: { received: false, error: "missing_signature" } };
  let event: Stripe.Event;
  try {
    event = stripe().webhooks.constructEvent(rawBody, signature, env().STRIPE_WEBHOOK_SECRET);
  } catch (error) {
    return {
      status: 400,
      body: {
        received: false,
        error: "bad_signature",
        message: error instanceof Error ? error.message : "signature check failed",
      },
    };
  }

  const seen = await PaymentEvent.findByPk(event.id);
  if (seen && seen.result !== "failed")
    return { status: 200, body: { received: true, duplicate: true, result: seen.result } };

  let outcome: Applied | { result: "failed"; message: string };
  try {
    outcome = await applyEvent(event);
  } catch (error) {
    outcome = { result: "failed", message: error instanceof Error ? error.message : String(error) };
  }
  await PaymentEvent.upsert({
    id: event.id,
    type: event.type,
    stripeCreated: event.created,
    payload: JSON.parse(rawBody) as unknown,
    result: outcome.result,
    message: outcome.message.slice(0, 500),
    receivedAt: new Date(),
  });
  // A failure answers 500 so the service delivers the event again; the stored row is then retried.
  return {
    status: outcome.result === "failed" ? 500 : 200,
    body: { received: true, result: outcome.result, message: outcome.message },
  };
}

async function applyEvent(event: Stripe.Event): Promise<Applied> {
  switch (event.type) {
    case "checkout.session.completed":
      return onCheckoutCompleted(event.data.object, event.created);
    case "customer.subscription.created":
    case "customer.subscription.updated":
    case "customer.subscription.deleted":
      return syncSubscription(event.data.object.id, event.created, {});
    case "invoice.paid":
      return onInvoicePaid(event.data.object, event.created);
    case "invoice.payment_failed":
      return onInvoiceFailed(event.data.object, event.created);
    default:
      return { result: "ignored", message: `Dryside does not act on ${event.type}.` };
  }
}

function idOf(value: string | { id: string } | null | undefined): string | null {
  if (!value) return null;
  return typeof value === "string" ? value : value.id;
}

async function onCheckoutCompleted(session: Stripe.Checkout.Session, created: number): Promise<Applied> {
  if (session.payment_status !== "paid")
    return { result: "ignored", message: `checkout ${session.id} is ${session.payment_status}, nothing to grant yet` };
  const user = await User.findByPk(Number(session.client_reference_id));
  if (!user)
    return {
      result: "ignored",
      message: `checkout ${session.id} names no known user (${session.client_reference_id ?? "none"})`,
    };
  const customerId = idOf(session.customer);
  if (customerId && !user.stripeCustomerId) await user.update({ stripeCustomerId: customerId });

  if (session.mode === "subscription") {
    const subscriptionId = idOf(session.subscription);
    if (!subscriptionId)
      return { result: "ignored", message: `subscription checkout ${session.id} has no subscription` };
    return syncSubscription(subscriptionId, created, { userId: user.id, checkoutSessionId: session.id });
  }

  const setSlug = session.metadata?.set_slug;
  const set = setSlug ? await DetailSet.findOne({ where: { slug: setSlug } }) : null;
  if (session.metadata?.kind !== "set" || !set)
    return { result: "ignored", message: `checkout ${session.id} buys nothing Dryside sells (${setSlug ?? "no set"})` };
  const [, grantedNow] = await findOrCreateOnce(() =>
    Entitlement.findOrCreate({
      where: { stripeCheckoutSessionId: session.id },
      defaults: {
        userId: user.id,
        kind: "set",
        planSlug: null,
        setId: set.id,
        status: "active",
        currentPeriodEnd: null,
        stripeCheckoutSessionId: session.id,
        stripeSubscriptionId: null,
        lastEventCreated: created,
      },
    }),
  );
  await recordPayment({
    user,
    kind: "set",
    description: `Set: ${set.title}`,
    amountCents: session.amount_total ?? set.priceCents,
    currency: session.currency ?? set.currency,
    stripeCheckoutSessionId: session.id,
    stripeInvoiceId: null,
    paidAt: new Date(created * 1000),
  });
  return {
    result: grantedNow ? "applied" : "ignored",
    message: grantedNow
      ? `granted set ${set.slug} to user ${user.id}`
      : `set ${set.slug} was already granted for ${session.id}`,
  };
}

function subscriptionOfInvoice(invoice: Stripe.Invoice): string | null {
  const fromParent = invoice.parent?.subscription_details?.subscription;
  // Older API versions name it at the top level.
  const legacy = (invoice as Stripe.Invoice & { subscription?: string | { id: string } | null }).subscription;
  return idOf(fromParent ?? legacy ?? null);
}

async function onInvoicePaid(invoice: Stripe.Invoice, created: number): Promise<Applied> {
  const subscriptionId = subscriptionOfInvoice(invoice);
  if (!subscriptionId) return { result: "ignored", message: `invoice ${invoice.id} is not for a subscription` };
  const synced = await syncSubscription(subscriptionId, created, {});
  const entitlement = await Entitlement.findOne({ where: { stripeSubscriptionId: subscriptionId } });
  const user = entitlement ? await User.findByPk(entitlement.userId) : null;
  if (!entitlement || !user || !invoice.id) return synced;
  const name = findPlan(entitlement.planSlug ?? "")?.name ?? "Plan";
  const recorded = await recordPayment({
    user,
    kind: "plan",
    description: `${name}, ${isoDay(invoice.period_start)} to ${isoDay(periodEndOfInvoice(invoice))}`,
    amountCents: invoice.amount_paid,
    currency: invoice.currency,
    stripeInvoiceId: invoice.id,
    stripeCheckoutSessionId: null,
    paidAt: new Date((invoice.status_transitions?.paid_at ?? created) * 1000),
  });
  return {
    result: synced.result === "applied" || recorded ? "applied" : "ignored",
    message: `${synced.message}; payment ${recorded ? "recorded" : "already recorded"} for ${invoice.id}`,
  };
}

async function onInvoiceFailed(invoice: Stripe.Invoice, created: number): Promise<Applied> {
  const subscriptionId = subscriptionOfInvoice(invoice);
  if (!subscriptionId) return { result: "ignored", message: `invoice ${invoice.id} is not for a subscription` };
  const synced = await syncSubscription(subscriptionId, created, {});
  return { result: synced.result, message: `renewal payment failed for ${subscriptionId}; ${synced.message}` };
}

function isoDay(unixSeconds: number): string {
  return new Date(unixSeconds * 1000).toISOString().slice(0, 10);
}

function periodEndOfInvoice(invoice: Stripe.Invoice): number {
  // The line's period is the service period; the invoice's own period_end is the billing moment.
  return invoice.lines?.data[0]?.period?.end ?? invoice.period_end;
}

/** Access words for the service's subscription states; null means "nothing to grant" (not paid yet). */
function statusFor(status: Stripe.Subscription.Status): EntitlementStatus | null {
  switch (status) {
    case "active":
    case "trialing":
      return "active";
    case "past_due":
    case "unpaid":
      return "past_due";
    case "canceled":
    case "incomplete_expired":
      return "canceled";
    case "paused":
      return "expired";
    default:
      return null;
  }
}

function periodEndOf(subscription: Stripe.Subscription): number | null {
  // Newer API versions keep the period on the items; older ones on the subscription.
  const fromItems = subscription.items.data
    .map((item) => item.current_period_end)
    .filter((end): end is number => typeof end === "number");
  if (fromItems.length > 0) return Math.max(...fromItems);
  const legacy = (subscription as Stripe.Subscription & { current_period_end?: number }).current_period_end;
  return typeof legacy === "number" ? legacy : null;
}

async function userForCustomer(customerId: string): Promise<User | null> {
  const byColumn = await User.findOne({ where: { stripeCustomerId: customerId } });
  if (byColumn) return byColumn;
  const customer = await stripe().customers.retrieve(customerId);
  const userId = "deleted" in customer && customer.deleted ? null : Number(customer.metadata?.user_id);
  return userId ? User.findByPk(userId) : null;
}

/** Runs a find-or-create and retries once when a concurrent delivery inserted the same unique row first. */
async function findOrCreateOnce<T>(task: () => Promise<T>): Promise<T> {
  try {
    return await task();
  } catch (error) {
    if (error instanceof UniqueConstraintError) return task();
    throw error;
  }
}

/**
 * Brings the plan entitlement of one subscription in line with the subscription's current state in the
 * payments service. `created` is the triggering event's time.
 */
async function syncSubscription(
  subscriptionId: string,
  created: number,
  hints: { userId?: number; checkoutSessionId?: string },
): Promise<Applied> {
  const subscription = await stripe().subscriptions.retrieve(subscriptionId);
  const plan = planForLookupKey(subscription.items.data[0]?.price.lookup_key);
  if (!plan) return { result: "ignored", message: `subscription ${subscriptionId} is not for a Dryside plan` };
  const status = statusFor(subscription.status);
  const periodEndSeconds = periodEndOf(subscription);
  const periodEnd = periodEndSeconds === null ? null : new Date(periodEndSeconds * 1000);
  const customerId = idOf(subscription.customer);

  const attempt = async (): Promise<Applied> =>
    sequelize.transaction(async (transaction: Transaction) => {
      const existing = await Entitlement.findOne({
        where: { stripeSubscriptionId: subscriptionId },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (existing) {
        if (existing.status === "canceled" && status !== "canceled") {
          return { result: "ignored", message: `subscription ${subscriptionId} was canceled; it is not brought back` };
        }
        if (existing.lastEventCreated !== null && created < existing.lastEventCreated) {
          return {
            result: "ignored",
            message: `event from ${created} is older than the last applied (${existing.lastEventCreated})`,
          };
        }
        const keepLaterEnd =
          status !== "canceled" && existing.currentPeriodEnd && periodEnd && periodEnd < existing.currentPeriodEnd;
        const next = {
          status: status ?? existing.status,
          planSlug: plan.slug,
          currentPeriodEnd: keepLaterEnd ? existing.currentPeriodEnd : (periodEnd ?? existing.currentPeriodEnd),
          cancelAtPeriodEnd: subscription.cancel_at_period_end,
          stripeCheckoutSessionId: existing.stripeCheckoutSessionId ?? hints.checkoutSessionId ?? null,
          lastEventCreated: Math.max(existing.lastEventCreated ?? 0, created),
        };
        const changed =
          next.status !== existing.status ||
          next.planSlug !== existing.planSlug ||
          next.currentPeriodEnd?.getTime() !== existing.currentPeriodEnd?.getTime() ||
          next.cancelAtPeriodEnd !== existing.cancelAtPeriodEnd ||
          next.stripeCheckoutSessionId !== existing.stripeCheckoutSessionId;
        await existing.update(next, { transaction });
        return changed
          ? {
              result: "applied",
              message: `plan ${plan.slug} for user ${existing.userId}: ${next.status} until ${next.currentPeriodEnd?.toISOString() ?? "open"}${next.cancelAtPeriodEnd ? ", ends then" : ""}`,
            }
          : { result: "ignored", message: `subscription ${subscriptionId} unchanged (${next.status})` };
      }
      if (!status)
        return {
          result: "ignored",
          message: `subscription ${subscriptionId} is ${subscription.status}: nothing to grant yet`,
        };
      const user = hints.userId
        ? await User.findByPk(hints.userId, { transaction })
        : customerId
          ? await userForCustomer(customerId)
          : null;
      if (!user)
        throw new Error(`no Dryside user for subscription ${subscriptionId} (customer ${customerId ?? "none"})`);
      await Entitlement.create(
        {
          userId: user.id,
          kind: "plan",
          planSlug: plan.slug,
          setId: null,
          status,
          currentPeriodEnd: periodEnd,
          cancelAtPeriodEnd: subscription.cancel_at_period_end,
          stripeCheckoutSessionId: hints.checkoutSessionId ?? null,
          stripeSubscriptionId: subscriptionId,
          lastEventCreated: created,
        },
        { transaction },
      );
      return {
        result: "applied",
        message: `plan ${plan.slug} granted to user ${user.id}: ${status} until ${periodEnd?.toISOString() ?? "open"}`,
      };
    });
  return findOrCreateOnce(attempt);
}
