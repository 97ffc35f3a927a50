import { ApiError } from "./api-error";
import { mergeMetadata } from "./form";
import {
  addInterval,
  newId,
  nowSeconds,
  type ApiObject,
  type CheckoutSession,
  type Customer,
  type Invoice,
  type InvoiceLine,
  type LineItem,
  type Metadata,
  type PaymentIntent,
  type Subscription,
  type SubscriptionItem,
} from "./objects";
import type { Store } from "./store";

export type RequestRef = { id: string | null; idempotency_key: string | null };

/** Records an event and queues its webhook; resolves when the webhook was delivered or given up. */
export type Publish = (
  type: string,
  object: ApiObject,
  options?: { previous?: Record<string, unknown>; request?: RequestRef },
) => Promise<void>;

/** The money movements: checkout completion, renewals, failures and cancellations, with their events. */
export class Billing {
  constructor(
    private readonly store: Store,
    private readonly publish: Publish,
  ) {}

  createCustomer(fields: { email: string | null; name: string | null; metadata: Metadata }): Customer {
    return this.store.insert({
      id: newId("cus", 14),
      object: "customer",
      balance: 0,
      created: nowSeconds(),
      currency: null,
      delinquent: false,
      description: null,
      email: fields.email,
      invoice_prefix: newId("x", 8).slice(2).toUpperCase(),
      livemode: false,
      metadata: fields.metadata,
      name: fields.name,
      next_invoice_sequence: 1,
      phone: null,
    });
  }

  /** A paid hosted checkout: customer, subscription and first invoice (or a payment), then the events. */
  completeCheckout(session: CheckoutSession, payer: { email: string; name: string }): Promise<void> {
    const lineItems = session.line_items?.data ?? [];
    const needsCustomer = session.mode === "subscription" || session.customer_creation === "always";
    if (session.customer === null && needsCustomer) {
      session.customer = this.createCustomer({ email: payer.email, name: payer.name, metadata: {} }).id;
    }
    session.customer_details = { email: payer.email, name: payer.name };
    session.status = "complete";
    session.payment_status = "paid";
    session.url = null;

    if (session.mode === "payment") {
      session.payment_intent = this.createPaymentIntent(session).id;
      return this.publish("checkout.session.completed", session);
    }
    const customer = this.store.get("customer", session.customer ?? "", "customer");
    const subscription = this.startSubscription(customer, lineItems);
    const invoice = this.issueInvoice(subscription, customer, "subscription_create", true);
    subscription.latest_invoice = invoice.id;
    session.subscription = subscription.id;
    session.invoice = invoice.id;
    // Published in one go so they queue in this order; receivers should still not rely on order.
    return Promise.all([
      this.publish("checkout.session.completed", session),
      this.publish("customer.subscription.created", subscription),
      this.publish("invoice.paid", invoice),
    ]).then(() => undefined);
  }

  updateSubscription(
    subscription: Subscription,
    changes: { cancelAtPeriodEnd?: boolean; metadata?: Metadata },
    request: RequestRef,
  ): Promise<void> {
    if (subscription.status === "canceled") {
      throw ApiError.request("A canceled subscription can only update its cancellation_details and metadata.");
    }
    const before = structuredClone(subscription);
    if (changes.metadata) subscription.metadata = mergeMetadata(subscription.metadata, changes.metadata);
    if (changes.cancelAtPeriodEnd !== undefined && changes.cancelAtPeriodEnd !== subscription.cancel_at_period_end) {
      subscription.cancel_at_period_end = changes.cancelAtPeriodEnd;
      subscription.cancel_at = changes.cancelAtPeriodEnd ? subscription.current_period_end : null;
      subscription.canceled_at = changes.cancelAtPeriodEnd ? nowSeconds() : null;
      subscription.cancellation_details = {
        comment: null,
        feedback: null,
        reason: changes.cancelAtPeriodEnd ? "cancellation_requested" : null,
      };
    }
    return this.publishUpdate(before, subscription, request);
  }

  cancelNow(subscription: Subscription, request: RequestRef): Promise<void> {
    if (subscription.status === "canceled") throw ApiError.request("This subscription is already canceled.");
    const now = nowSeconds();
    subscription.status = "canceled";
    subscription.canceled_at = now;
    subscription.ended_at = now;
    subscription.cancellation_details = { comment: null, feedback: null, reason: "cancellation_requested" };
    return this.publish("customer.subscription.deleted", subscription, { request });
  }

  /**
   * Moves a subscription to the end of its period: it ends if it was set to cancel then, otherwise it
   * renews with a new invoice that is paid, or, with `failRenewal`, left open with the subscription past due.
   */
  advancePeriod(subscription: Subscription, failRenewal: boolean): Promise<void> {
    if (subscription.status === "canceled") throw ApiError.request("This subscription is already canceled.");
    const before = structuredClone(subscription);
    if (subscription.cancel_at_period_end) {
      subscription.status = "canceled";
      subscription.ended_at = subscription.current_period_end;
      return this.publish("customer.subscription.deleted", subscription);
    }
    const recurring = subscription.items.data[0]?.price.recurring;
    if (!recurring) throw new Error(`subscription ${subscription.id} has no recurring price`);
    const start = subscription.current_period_end;
    const end = addInterval(start, recurring.interval, recurring.interval_count);
    subscription.current_period_start = start;
    subscription.current_period_end = end;
    for (const item of subscription.items.data) {
      item.current_period_start = start;
      item.current_period_end = end;
    }
    const customer = this.store.get("customer", subscription.customer, "customer");
    const invoice = this.issueInvoice(subscription, customer, "subscription_cycle", !failRenewal);
    subscription.latest_invoice = invoice.id;
    subscription.status = failRenewal ? "past_due" : "active";
    return Promise.all([
      this.publishUpdate(before, subscription, { id: null, idempotency_key: null }),
      this.publish(failRenewal ? "invoice.payment_failed" : "invoice.paid", invoice),
    ]).then(() => undefined);
  }

  /** `customer.subscription.updated` with `previous_attributes`: the old values of the top-level fields that changed. */
  private publishUpdate(before: Subscription, after: Subscription, request: RequestRef): Promise<void> {
    const previous: Record<string, unknown> = {};
    const old = new Map<string, unknown>(Object.entries(before));
    for (const [field, value] of Object.entries(after)) {
      if (JSON.stringify(value) !== JSON.stringify(old.get(field))) previous[field] = old.get(field) ?? null;
    }
    if (Object.keys(previous).length === 0) return Promise.resolve();
    return this.publish("customer.subscription.updated", after, { previous, request });
  }

  private startSubscription(customer: Customer, lineItems: LineItem[]): Subscription {
    const recurring = lineItems[0]?.price.recurring;
    if (!recurring) throw new Error("a subscription checkout needs a recurring price");
    const now = nowSeconds();
    const end = addInterval(now, recurring.interval, recurring.interval_count);
    const id = newId("sub");
    const items: SubscriptionItem[] = lineItems.map((line) => ({
      id: newId("si", 14),
      object: "subscription_item",
      created: now,
      current_period_end: end,
      current_period_start: now,
      metadata: {},
      price: line.price,
      quantity: line.quantity,
      subscription: id,
    }));
    return this.store.insert({
      id,
      object: "subscription",
      billing_cycle_anchor: now,
      cancel_at: null,
      cancel_at_period_end: false,
      canceled_at: null,
      cancellation_details: { comment: null, feedback: null, reason: null },
      collection_method: "charge_automatically",
      created: now,
      currency: lineItems[0]?.currency ?? "usd",
      customer: customer.id,
      current_period_end: end,
      current_period_start: now,
      ended_at: null,
      items: { object: "list", data: items, has_more: false, url: `/v1/subscription_items?subscription=${id}` },
      latest_invoice: null,
      livemode: false,
      metadata: {},
      start_date: now,
      status: "active",
    });
  }

  private issueInvoice(
    subscription: Subscription,
    customer: Customer,
    reason: Invoice["billing_reason"],
    paid: boolean,
  ): Invoice {
    const now = nowSeconds();
    const id = newId("in");
    const period = { start: subscription.current_period_start, end: subscription.current_period_end };
    const lines: InvoiceLine[] = subscription.items.data.map((item) => ({
      id: newId("il"),
      object: "line_item",
      amount: item.price.unit_amount * item.quantity,
      currency: item.price.currency,
      description: `${item.quantity} × ${this.store.find("product", item.price.product)?.name ?? item.price.product}`,
      period,
      pricing: { type: "price_details", price_details: { price: item.price.id, product: item.price.product } },
      quantity: item.quantity,
    }));
    const total = lines.reduce((sum, line) => sum + line.amount, 0);
    const sequence = customer.next_invoice_sequence++;
    return this.store.insert({
      id,
      object: "invoice",
      amount_due: total,
      amount_paid: paid ? total : 0,
      amount_remaining: paid ? 0 : total,
      attempt_count: 1,
      attempted: true,
      billing_reason: reason,
      created: now,
      currency: subscription.currency,
      customer: customer.id,
      customer_email: customer.email,
      lines: { object: "list", data: lines, has_more: false, url: `/v1/invoices/${id}/lines` },
      livemode: false,
      number: `${customer.invoice_prefix}-${String(sequence).padStart(4, "0")}`,
      parent: {
        type: "subscription_details",
        subscription_details: { subscription: subscription.id, metadata: subscription.metadata },
      },
      period_end: period.end,
      period_start: period.start,
      status: paid ? "paid" : "open",
      status_transitions: { finalized_at: now, paid_at: paid ? now : null },
      subscription: subscription.id,
      subtotal: total,
      total,
    });
  }

  private createPaymentIntent(session: CheckoutSession): PaymentIntent {
    return this.store.insert({
      id: newId("pi"),
      object: "payment_intent",
      amount: session.amount_total,
      amount_received: session.amount_total,
      created: nowSeconds(),
      currency: session.currency,
      customer: session.customer,
      livemode: false,
      metadata: {},
      payment_method_types: ["card"],
      status: "succeeded",
    });
  }
}
