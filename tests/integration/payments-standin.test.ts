import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import Stripe from "stripe";
import { afterAll, beforeAll, beforeEach, expect, test, vi } from "vitest";
import { parseForm } from "../../dev/payments-standin/form";
import { startPaymentsStandin, type PaymentsStandin } from "../../dev/payments-standin/server";
import { signatureHeader } from "../../dev/payments-standin/webhooks";

// The local payments stand-in, driven through the real SDK, with webhooks received and verified the
// way the app verifies them.

const WEBHOOK_SECRET = "whsec_standin_test_secret";

// Test card numbers and their outcomes: the payments service's testing page (docs.stripe.com/testing),
// cross-checked against a public test-card list (gist adamlutz/3e2641787b1de29e2288).
const CARD_PAYS = "4242424242424242";
const CARD_PAYS_DEBIT = "4000056655665556";
const CARD_PAYS_OTHER_NETWORK = "5555555555554444";
const DECLINES: Array<[card: string, message: string]> = [
  ["4000000000000002", "Your card was declined."], // generic_decline
  ["4000000000009995", "Your card has insufficient funds."], // insufficient_funds
  ["4000000000000069", "Your card has expired."], // expired_card
  ["4000000000000127", "Your card&#39;s security code is incorrect."], // incorrect_cvc (HTML-escaped)
];

type Received = { event: Stripe.Event; rawBody: string };

let standin: PaymentsStandin;
let stripe: Stripe;
let receiver: Server;
let received: Received[] = [];
let failNextDeliveries = 0;

beforeAll(async () => {
  receiver = createServer((request, response) => {
    const chunks: Buffer[] = [];
    request.on("data", (chunk: Buffer) => chunks.push(chunk));
    request.on("end", () => {
      if (failNextDeliveries > 0) {
        failNextDeliveries--;
        response.writeHead(500).end();
        return;
      }
      const rawBody = Buffer.concat(chunks).toString("utf8");
      try {
        // Verified exactly as the app's webhook route does: raw body, header, endpoint secret.
        const event = stripe.webhooks.constructEvent(
          rawBody,
          String(request.headers["stripe-signature"]),
          WEBHOOK_SECRET,
        );
        received.push({ event, rawBody });
        response.writeHead(200).end();
      } catch {
        response.writeHead(400).end();
      }
    });
  });
  await new Promise<void>((resolve) => receiver.listen(0, "127.0.0.1", resolve));
  const webhookPort = (receiver.address() as AddressInfo).port;
  standin = await startPaymentsStandin({
    port: 0,
    host: "127.0.0.1",
    webhookUrl: `http://127.0.0.1:${webhookPort}/webhook`,
    webhookSecret: WEBHOOK_SECRET,
    webhookRetryDelaysMs: [20, 40, 80],
  });
  stripe = new Stripe("sk_test_standin", {
    host: "127.0.0.1",
    port: standin.port,
    protocol: "http",
    maxNetworkRetries: 0,
    telemetry: false,
  });
});

afterAll(async () => {
  await standin?.close();
  await new Promise((resolve) => receiver?.close(resolve));
});

beforeEach(async () => {
  await fetch(`${standin.url}/_standin/reset`, { method: "POST" });
  received = [];
  failNextDeliveries = 0;
});

async function monthlyPrice(unitAmount = 1200): Promise<Stripe.Price> {
  const product = await stripe.products.create({ name: "Below-grade essentials" });
  return stripe.prices.create({
    product: product.id,
    currency: "usd",
    unit_amount: unitAmount,
    recurring: { interval: "month" },
    lookup_key: "below_grade_monthly",
  });
}

function pay(sessionUrl: string, card: string, extra: Record<string, string> = {}): Promise<Response> {
  return fetch(`${sessionUrl}/pay`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams({
      card_number: card,
      card_expiry: "12/34",
      card_cvc: "123",
      cardholder_name: "Test Buyer",
      ...extra,
    }),
  });
}

/** A paid subscription through the hosted page, with its webhooks already received. */
async function subscribe(): Promise<Stripe.Subscription> {
  const price = await monthlyPrice();
  const session = await stripe.checkout.sessions.create({
    mode: "subscription",
    line_items: [{ price: price.id, quantity: 1 }],
    customer_email: "member@example.test",
    success_url: "http://app.test/account?session={CHECKOUT_SESSION_ID}",
  });
  const response = await pay(session.url ?? "", CARD_PAYS);
  expect(response.status).toBe(303);
  const paid = await stripe.checkout.sessions.retrieve(session.id);
  received = [];
  return stripe.subscriptions.retrieve(String(paid.subscription));
}

function waitForEvent(type: string): Promise<Stripe.Event> {
  return vi.waitFor(
    () => {
      const found = received.find((item) => item.event.type === type);
      if (!found) throw new Error(`no ${type} webhook; got ${received.map((item) => item.event.type).join(", ")}`);
      return found.event;
    },
    { timeout: 3000, interval: 10 },
  );
}

function control(path: string, form: Record<string, string> = {}): Promise<Response> {
  return fetch(`${standin.url}/_standin${path}`, { method: "POST", body: new URLSearchParams(form) });
}

test("health check answers 200", async () => {
  const response = await fetch(`${standin.url}/healthz`);
  expect(response.status).toBe(200);
});

test("form bodies decode nested keys and indexed arrays the way the SDK encodes them", () => {
  const fields = parseForm(
    "line_items[0][price]=price_1&line_items[0][quantity]=2&expand[]=a&expand[]=b&metadata[0]=x",
  );
  expect(fields).toEqual({
    line_items: [{ price: "price_1", quantity: "2" }],
    expand: ["a", "b"],
    metadata: { "0": "x" },
  });
});

test("webhook signatures match the SDK's own signing of the same payload and time", () => {
  const payload = JSON.stringify({ id: "evt_1", object: "event" });
  const timestamp = 1_700_000_000;
  // Reference: the SDK's generateTestHeaderString (stripe 23.1.0), which signs as the service does.
  const expected = stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET, timestamp });
  expect(signatureHeader(payload, WEBHOOK_SECRET, timestamp)).toBe(expected);
});

test("products and prices are created, retrieved and listed with filters and cursors", async () => {
  const product = await stripe.products.create({ name: "Crawlspace set", metadata: { set: "crawlspace" } });
  expect(product.id).toMatch(/^prod_/);
  expect(product.livemode).toBe(false);
  const second = await stripe.products.create({ name: "Roof set" });

  const monthly = await stripe.prices.create({
    product: product.id,
    currency: "usd",
    unit_amount: 1500,
    recurring: { interval: "month" },
    lookup_key: "crawlspace_monthly",
    metadata: { plan: "monthly" },
  });
  const yearly = await stripe.prices.create({
    product: product.id,
    currency: "usd",
    unit_amount: 15000,
    recurring: { interval: "year" },
    lookup_key: "crawlspace_yearly",
  });
  const once = await stripe.prices.create({ product: second.id, currency: "usd", unit_amount: 4900, active: false });
  expect(monthly).toMatchObject({
    object: "price",
    type: "recurring",
    recurring: { interval: "month" },
    unit_amount: 1500,
  });
  expect(once).toMatchObject({ type: "one_time", recurring: null });
  expect((await stripe.prices.retrieve(yearly.id)).lookup_key).toBe("crawlspace_yearly");

  const byKey = await stripe.prices.list({ lookup_keys: ["crawlspace_yearly", "missing_key"] });
  expect(byKey.data.map((price) => price.id)).toEqual([yearly.id]);
  const byProduct = await stripe.prices.list({ product: product.id });
  expect(byProduct.data.map((price) => price.id)).toEqual([yearly.id, monthly.id]); // newest first
  const active = await stripe.prices.list({ active: true });
  expect(active.data.map((price) => price.id)).not.toContain(once.id);

  const firstPage = await stripe.products.list({ limit: 1 });
  expect(firstPage.data.map((item) => item.id)).toEqual([second.id]);
  expect(firstPage.has_more).toBe(true);
  const nextPage = await stripe.products.list({ limit: 1, starting_after: second.id });
  expect(nextPage.data.map((item) => item.id)).toEqual([product.id]);
  expect(nextPage.has_more).toBe(false);
});

test("customers are created and found by email", async () => {
  const customer = await stripe.customers.create({
    email: "editor@example.test",
    name: "An Editor",
    metadata: { user: "7" },
  });
  await stripe.customers.create({ email: "other@example.test" });
  expect(customer.id).toMatch(/^cus_/);
  const found = await stripe.customers.list({ email: "editor@example.test" });
  expect(found.data.map((item) => item.id)).toEqual([customer.id]);
  expect((await stripe.customers.retrieve(customer.id)) as Stripe.Customer).toMatchObject({
    name: "An Editor",
    metadata: { user: "7" },
  });
});

test("a request without an API key gets 401 in the API's error shape", async () => {
  const response = await fetch(`${standin.url}/v1/products`);
  expect(response.status).toBe(401);
  const body = (await response.json()) as { error: { type: string; message: string } };
  expect(body.error.type).toBe("invalid_request_error");
  expect(body.error.message).toMatch(/API key/);
});

test("an unknown id is a 404 resource_missing, raised by the SDK as its invalid-request error", async () => {
  const error: unknown = await stripe.products.retrieve("prod_doesnotexist").catch((caught: unknown) => caught);
  expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
  expect(error).toMatchObject({ statusCode: 404, code: "resource_missing", param: "id" });
});

test("a missing required parameter is a 400 that names the parameter", async () => {
  const response = await fetch(`${standin.url}/v1/prices`, {
    method: "POST",
    headers: { authorization: "Bearer sk_test_standin", "content-type": "application/x-www-form-urlencoded" },
    body: "unit_amount=100&product_data[name]=Loose",
  });
  expect(response.status).toBe(400);
  expect(await response.json()).toMatchObject({ error: { type: "invalid_request_error", param: "currency" } });
});

test("subscription checkout: hosted page, good card, signed webhooks, then the session is complete", async () => {
  const price = await monthlyPrice(1200);
  const session = await stripe.checkout.sessions.create({
    mode: "subscription",
    line_items: [{ price: price.id, quantity: 1 }],
    customer_email: "member@example.test",
    client_reference_id: "user_42",
    metadata: { set: "below-grade-essentials" },
    success_url: "http://app.test/account?session={CHECKOUT_SESSION_ID}",
    cancel_url: "http://app.test/pricing",
  });
  expect(session.id).toMatch(/^cs_test_/);
  expect(session).toMatchObject({ status: "open", payment_status: "unpaid", amount_total: 1200 });
  expect(session.url).toBe(`${standin.url}/checkout/${session.id}`);

  const page = await fetch(session.url ?? "");
  const html = await page.text();
  expect(page.status).toBe(200);
  expect(html).toContain("Below-grade essentials");
  expect(html).toContain("$12.00 per month");
  expect(html).toContain('name="card_number"');

  const response = await pay(session.url ?? "", CARD_PAYS);
  expect(response.status).toBe(303);
  expect(response.headers.get("location")).toBe(`http://app.test/account?session=${session.id}`);

  // Delivered before the redirect, in this order, each verified by constructEvent in the receiver.
  expect(received.map((item) => item.event.type)).toEqual([
    "checkout.session.completed",
    "customer.subscription.created",
    "invoice.paid",
  ]);
  const completed = received[0].event;
  expect(completed.id).toMatch(/^evt_/);
  expect(completed).toMatchObject({ object: "event", livemode: false, api_version: expect.any(String) });
  expect(completed.data.object).toMatchObject({ id: session.id, client_reference_id: "user_42", status: "complete" });

  const done = await stripe.checkout.sessions.retrieve(session.id, { expand: ["subscription", "line_items"] });
  expect(done).toMatchObject({
    status: "complete",
    payment_status: "paid",
    metadata: { set: "below-grade-essentials" },
  });
  expect(done.customer).toMatch(/^cus_/);
  const subscription = done.subscription as Stripe.Subscription;
  expect(subscription.id).toMatch(/^sub_/);
  expect(subscription).toMatchObject({ status: "active", cancel_at_period_end: false, customer: done.customer });
  expect(subscription.items.data[0].price.id).toBe(price.id);
  expect(subscription.items.data[0].current_period_end).toBeGreaterThan(
    subscription.items.data[0].current_period_start,
  );
  expect(done.line_items?.data.map((item) => item.price?.id)).toEqual([price.id]);

  const invoice = await stripe.invoices.retrieve(String(subscription.latest_invoice));
  expect(invoice).toMatchObject({ status: "paid", amount_paid: 1200, billing_reason: "subscription_create" });
  expect(invoice.id).toMatch(/^in_/);
});

test("declined cards show the reason on the page, send no webhook and leave the session open", async () => {
  const price = await monthlyPrice();
  const session = await stripe.checkout.sessions.create({
    mode: "subscription",
    line_items: [{ price: price.id, quantity: 1 }],
    customer_email: "member@example.test",
    success_url: "http://app.test/ok",
  });
  for (const [card, message] of DECLINES) {
    const response = await pay(session.url ?? "", card);
    expect(response.status).toBe(402);
    expect(await response.text()).toContain(message);
  }
  expect(received).toEqual([]);
  const events = (await (await fetch(`${standin.url}/_standin/events`)).json()) as { data: unknown[] };
  expect(events.data).toEqual([]);
  expect(await stripe.checkout.sessions.retrieve(session.id)).toMatchObject({ status: "open", subscription: null });
});

test("the other success cards pay, and cancel goes back to cancel_url without completing", async () => {
  const product = await stripe.products.create({ name: "Basement pack" });
  const price = await stripe.prices.create({ product: product.id, currency: "usd", unit_amount: 4900 });
  const session = await stripe.checkout.sessions.create({
    mode: "payment",
    line_items: [{ price: price.id, quantity: 2 }],
    success_url: "http://app.test/thanks/{CHECKOUT_SESSION_ID}",
    cancel_url: "http://app.test/sets",
  });
  const cancel = await fetch(`${session.url}/cancel`, { method: "POST", redirect: "manual" });
  expect(cancel.status).toBe(303);
  expect(cancel.headers.get("location")).toBe("http://app.test/sets");
  expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe("open");

  const response = await pay(session.url ?? "", CARD_PAYS_DEBIT, { email: "buyer@example.test" });
  expect(response.headers.get("location")).toBe(`http://app.test/thanks/${session.id}`);
  const done = await stripe.checkout.sessions.retrieve(session.id);
  expect(done).toMatchObject({ status: "complete", payment_status: "paid", amount_total: 9800, subscription: null });
  expect(done.customer_details?.email).toBe("buyer@example.test");
  const intent = await stripe.paymentIntents.retrieve(String(done.payment_intent));
  expect(intent).toMatchObject({ status: "succeeded", amount: 9800 });
  expect(received.map((item) => item.event.type)).toEqual(["checkout.session.completed"]);

  const again = await stripe.checkout.sessions.create({
    mode: "payment",
    line_items: [{ price: price.id, quantity: 1 }],
    success_url: "http://app.test/thanks",
  });
  expect((await pay(again.url ?? "", CARD_PAYS_OTHER_NETWORK, { email: "buyer@example.test" })).status).toBe(303);
});

test("cancel at period end, then the clock reaches the period end: the subscription is deleted", async () => {
  const subscription = await subscribe();
  const updated = await stripe.subscriptions.update(subscription.id, { cancel_at_period_end: true });
  expect(updated.cancel_at_period_end).toBe(true);
  const updateEvent = await waitForEvent("customer.subscription.updated");
  expect(updateEvent.data.previous_attributes).toMatchObject({ cancel_at_period_end: false });

  const advance = await control(`/subscriptions/${subscription.id}/advance`);
  expect(advance.status).toBe(200);
  const deleted = await waitForEvent("customer.subscription.deleted");
  expect(deleted.data.object).toMatchObject({ id: subscription.id, status: "canceled" });
  expect((await stripe.subscriptions.retrieve(subscription.id)).status).toBe("canceled");
});

test("a renewal bills the next period: invoice.paid and the subscription's new period", async () => {
  const subscription = await subscribe();
  const oldEnd = subscription.items.data[0].current_period_end;
  await control(`/subscriptions/${subscription.id}/advance`);

  const paid = await waitForEvent("invoice.paid");
  const invoice = paid.data.object as Stripe.Invoice;
  expect(invoice).toMatchObject({ status: "paid", billing_reason: "subscription_cycle", amount_paid: 1200 });
  expect(invoice.parent?.subscription_details?.subscription).toBe(subscription.id);
  const updated = await waitForEvent("customer.subscription.updated");
  const renewed = updated.data.object as Stripe.Subscription;
  expect(renewed.items.data[0].current_period_start).toBe(oldEnd);
  // One calendar month later (UTC), clamped to the month's last day: the real service's monthly cycle, from memory.
  const expectedEnd = new Date(oldEnd * 1000);
  const day = expectedEnd.getUTCDate();
  expectedEnd.setUTCDate(1);
  expectedEnd.setUTCMonth(expectedEnd.getUTCMonth() + 1);
  expectedEnd.setUTCDate(
    Math.min(day, new Date(Date.UTC(expectedEnd.getUTCFullYear(), expectedEnd.getUTCMonth() + 1, 0)).getUTCDate()),
  );
  expect(renewed.items.data[0].current_period_end).toBe(expectedEnd.getTime() / 1000);
});

test("a failed renewal sends invoice.payment_failed and leaves the subscription past due", async () => {
  const subscription = await subscribe();
  await control(`/subscriptions/${subscription.id}/advance`, { fail_renewal: "true" });
  const failed = await waitForEvent("invoice.payment_failed");
  expect(failed.data.object).toMatchObject({ status: "open", amount_paid: 0, amount_remaining: 1200 });
  expect((await stripe.subscriptions.retrieve(subscription.id)).status).toBe("past_due");
  const pastDue = await stripe.subscriptions.list({ status: "past_due" });
  expect(pastDue.data.map((item) => item.id)).toEqual([subscription.id]);
});

test("cancelling now deletes the subscription and drops it from the default list", async () => {
  const subscription = await subscribe();
  const canceled = await stripe.subscriptions.cancel(subscription.id);
  expect(canceled.status).toBe("canceled");
  await waitForEvent("customer.subscription.deleted");
  expect((await stripe.subscriptions.list({ customer: String(subscription.customer) })).data).toEqual([]);
  expect((await stripe.subscriptions.list({ status: "all" })).data).toHaveLength(1);
});

test("redelivery sends the same event again: same id, same body", async () => {
  await subscribe();
  const listed = await stripe.events.list({ type: "checkout.session.completed" });
  expect(listed.data).toHaveLength(1);
  const original = listed.data[0];
  expect(original.pending_webhooks).toBe(0);

  const response = await control(`/events/${original.id}/redeliver`);
  expect(response.status).toBe(200);
  expect(received).toHaveLength(1);
  expect(received[0].event.id).toBe(original.id);
  expect((await stripe.events.retrieve(original.id)).id).toBe(original.id);

  await control(`/events/${original.id}/redeliver`);
  expect(received[1].rawBody).toBe(received[0].rawBody);
});

test("a failed delivery is retried a bounded number of times and recorded per attempt", async () => {
  failNextDeliveries = 2;
  await subscribe();
  const log = (await (await fetch(`${standin.url}/_standin/events?type=checkout.session.completed`)).json()) as {
    data: Array<{ delivered: boolean; deliveries: Array<{ status: number | null }> }>;
  };
  expect(log.data[0].delivered).toBe(true);
  expect(log.data[0].deliveries.map((attempt) => attempt.status)).toEqual([500, 500, 200]);

  failNextDeliveries = 100;
  const price = await stripe.prices.list({ lookup_keys: ["below_grade_monthly"] });
  const subscription = await stripe.subscriptions.list({ price: price.data[0].id });
  await control(`/subscriptions/${subscription.data[0].id}/advance`);
  const renewals = (await (await fetch(`${standin.url}/_standin/events?type=invoice.paid`)).json()) as {
    data: Array<{ delivered: boolean; deliveries: unknown[] }>;
  };
  const last = renewals.data[renewals.data.length - 1];
  expect(last.delivered).toBe(false);
  expect(last.deliveries).toHaveLength(4); // first try plus one retry per configured delay
});
