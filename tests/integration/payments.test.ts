// The paid path end to end without a browser: the real SDK against the local payments stand-in, its
// signed webhooks delivered to the app's webhook route through a small HTTP bridge, and the app's
// loaders and actions called with a signed-in member's session cookie.
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
import Stripe from "stripe";
import { afterAll, beforeAll, expect, test } from "vitest";
import { startPaymentsStandin, type PaymentsStandin } from "../../dev/payments-standin/server";
import { useMigratedDatabase } from "../helpers/database";
import { useMailCatcher } from "../helpers/mail";
import { RouteClient } from "../helpers/route-client";

const WEBHOOK_SECRET = "whsec_payments_integration";
// Test card numbers and outcomes: the payments service's testing page (docs.stripe.com/testing), as the
// stand-in's README lists them.
const CARD_PAYS = "4242424242424242";
const CARD_DECLINED = "4000000000000002";

const mail = useMailCatcher();

let standin: PaymentsStandin;
let bridge: Server;
let sdk: Stripe;
/** Event types the bridge swallows (answers 200 without passing on), to deliver them late on purpose. */
const held = new Set<string>();
const heldEvents: { id: string; type: string }[] = [];

beforeAll(async () => {
  // Webhook deliveries → a Fetch Request → the app's route action, exactly as the server would call it.
  bridge = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (chunk: Buffer) => chunks.push(chunk));
    req.on("end", async () => {
      const raw = Buffer.concat(chunks).toString("utf8");
      const type = (JSON.parse(raw) as { type: string }).type;
      if (held.has(type)) {
        heldEvents.push({ id: (JSON.parse(raw) as { id: string }).id, type });
        res.writeHead(200).end();
        return;
      }
      const { action } = await import("~/routes/api/payments-webhook");
      const request = new Request("http://127.0.0.1:3000/api/payments/webhook", {
        method: "POST",
        headers: { "Content-Type": "application/json", "Stripe-Signature": String(req.headers["stripe-signature"]) },
        body: raw,
      });
      const response = await action({ request, params: {}, context: {} } as never);
      res.writeHead(response.status, { "Content-Type": "application/json" }).end(await response.text());
    });
  });
  await new Promise<void>((resolve) => bridge.listen(0, "127.0.0.1", resolve));
  standin = await startPaymentsStandin({
    port: 0,
    host: "127.0.0.1",
    webhookUrl: `http://127.0.0.1:${(bridge.address() as AddressInfo).port}/webhook`,
    webhookSecret: WEBHOOK_SECRET,
    webhookRetryDelaysMs: [20, 40],
  });
  Object.assign(process.env, {
    STRIPE_SECRET_KEY: "sk_test_integration",
    STRIPE_API_HOST: "127.0.0.1",
    STRIPE_API_PORT: String(standin.port),
    STRIPE_API_PROTOCOL: "http",
    STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET,
    STORAGE_DIR: mkdtempSync(join(process.env.TEST_SCRATCH_DIR ?? tmpdir(), "storage-")),
  });
  sdk = new Stripe("sk_test_integration", {
    host: "127.0.0.1",
    port: standin.port,
    protocol: "http",
    maxNetworkRetries: 0,
    telemetry: false,
  });
});

afterAll(async () => {
  const { resetStripeClient } = await import("~/payments/stripe.server");
  resetStripeClient();
  await standin?.close();
  await new Promise((resolve) => bridge?.close(resolve));
});

useMigratedDatabase();

const password = "paid path passphrase"; // our own minimum is 12 characters
let premiumInSet = "";
let premiumOutsideSet = "";
const SET = "below-grade-essentials";

beforeAll(async () => {
  const { importContent } = await import("~/catalogue/import.server");
  await importContent("content");
  const { Detail, DetailSet } = await import("~/models/index.server");
  const set = await DetailSet.findOne({ where: { slug: SET }, include: [{ model: Detail, as: "details" }] });
  const inSet = ((set as unknown as { details: { slug: string; tier: string }[] }).details ?? [])
    .filter((d) => d.tier === "premium")
    .map((d) => d.slug);
  premiumInSet = inSet[0];
  const outside = await Detail.findAll({ where: { tier: "premium" } });
  premiumOutsideSet = outside.map((d) => d.slug).find((slug) => !inSet.includes(slug))!;
  expect(premiumInSet && premiumOutsideSet).toBeTruthy();
});

async function member(name: string): Promise<{ browser: RouteClient; userId: number }> {
  const { User } = await import("~/models/index.server");
  const { hashPassword } = await import("~/auth/password.server");
  const signIn = await import("~/routes/auth/sign-in");
  const email = `${name}@example.test`;
  const user = await User.create({
    email,
    displayName: name,
    passwordHash: await hashPassword(password),
    role: "member",
    emailVerifiedAt: new Date(),
  });
  const browser = new RouteClient();
  const result = await browser.submit(signIn.action, "/sign-in", { email, password });
  expect(result.status).toBe(302);
  return { browser, userId: user.id };
}

async function detailApi(browser: RouteClient, slug: string): Promise<number> {
  const { loader } = await import("~/routes/api/detail");
  return (await browser.call(loader, `/api/details/${slug}`, { slug })).status;
}

async function startCheckout(browser: RouteClient, form: Record<string, string>): Promise<string> {
  const pricing = await import("~/routes/pricing/index");
  const result = await browser.submit(pricing.action, "/pricing", form);
  expect(result.status).toBe(303);
  const url = result.headers.get("Location")!;
  expect(url.startsWith(standin.url)).toBe(true);
  return url;
}

/** Fills the hosted checkout page's form the way a browser posts it. */
async function pay(checkoutUrl: string, card: string): Promise<Response> {
  const body = new URLSearchParams({
    email: "buyer@example.test",
    card_number: card,
    card_expiry: "12/40",
    card_cvc: "123",
    cardholder_name: "Test Buyer",
  });
  return fetch(`${checkoutUrl}/pay`, { method: "POST", body, redirect: "manual" });
}

async function entitlementsOf(userId: number) {
  const { Entitlement } = await import("~/models/index.server");
  return Entitlement.findAll({ where: { userId }, order: [["id", "ASC"]] });
}

async function redeliver(eventId: string): Promise<number | null> {
  const response = await fetch(`${standin.url}/_standin/events/${eventId}/redeliver`, { method: "POST" });
  return ((await response.json()) as { delivery: { status: number | null } }).delivery.status;
}

test("buying a set: checkout → signed webhook → entitlement → the premium detail API answers 200", {
  timeout: 120_000,
}, async () => {
  const { browser, userId } = await member("setbuyer");
  expect(await detailApi(browser, premiumInSet)).toBe(403);

  const checkoutUrl = await startCheckout(browser, { kind: "set", set: SET });
  const paid = await pay(checkoutUrl, CARD_PAYS);
  expect(paid.status).toBe(303);
  const back = new URL(paid.headers.get("Location")!);
  expect(back.pathname).toBe("/account/checkout/return");
  const sessionId = back.searchParams.get("session_id")!;

  const [entitlement] = await entitlementsOf(userId);
  expect(entitlement).toMatchObject({
    kind: "set",
    status: "active",
    currentPeriodEnd: null,
    stripeCheckoutSessionId: sessionId,
  });

  const ret = await import("~/routes/account/checkout-return");
  const state = await browser.call(ret.loader, `/account/checkout/return?session_id=${sessionId}`, {});
  expect(state.body).toMatchObject({ state: "granted", kind: "set", setSlug: SET });

  expect(await detailApi(browser, premiumInSet)).toBe(200);
  // One set opens its own details only.
  expect(await detailApi(browser, premiumOutsideSet)).toBe(403);

  const { Payment, PaymentEvent } = await import("~/models/index.server");
  const payment = await Payment.findOne({ where: { userId } });
  expect(payment).toMatchObject({ kind: "set", amountCents: 6900, currency: "usd" }); // content/sets.yaml: below-grade-essentials price_cents
  expect(payment?.receiptSentAt).not.toBeNull();
  const receipt = mail.outbox().find((m) => m.to.includes("setbuyer@example.test"));
  expect(receipt?.subject).toBe("Your Dryside receipt — Set: Below-grade essentials");
  expect(receipt?.text).toContain("$69.00");
  const event = await PaymentEvent.findOne({
    where: { type: "checkout.session.completed" },
    order: [["receivedAt", "DESC"]],
  });
  expect(event?.result).toBe("applied");

  // The pack: access checked at download, built once, then served from storage.
  const pack = await import("~/routes/sets/pack");
  const packStarted = Date.now();
  const first = (await browser.respond(pack.loader, `/sets/${SET}/pack?units=ip`, { slug: SET })) as Response;
  expect(first.status).toBe(200);
  expect(first.headers.get("Content-Type")).toBe("application/zip");
  const zip = Buffer.from(await first.arrayBuffer());
  console.log(`pack ${SET}: ${zip.length} bytes built in ${Date.now() - packStarted} ms`);
  const againStarted = Date.now();
  const again = (await browser.respond(pack.loader, `/sets/${SET}/pack?units=ip`, { slug: SET })) as Response;
  expect(again.headers.get("X-Pack-Key")).toBe(first.headers.get("X-Pack-Key"));
  expect(Buffer.from(await again.arrayBuffer()).equals(zip)).toBe(true);
  expect(Date.now() - againStarted).toBeLessThan(1000); // served from storage, not rebuilt
  const { Download } = await import("~/models/index.server");
  expect(await Download.count({ where: { userId } })).toBe(2);

  const dir = mkdtempSync(join(tmpdir(), "pack-"));
  writeFileSync(join(dir, "pack.zip"), zip);
  execFileSync("unzip", ["-q", "pack.zip"], { cwd: dir });
  const names = execFileSync("unzip", ["-Z1", "pack.zip"], { cwd: dir, encoding: "utf8" }).trim().split("\n");
  const pdfs = names.filter((n) => n.endsWith(".pdf"));
  expect(pdfs.length).toBeGreaterThan(0);
  expect(names.filter((n) => n.endsWith(".md")).length).toBe(pdfs.length);
  for (const pdf of pdfs) {
    // poppler-utils' pdfinfo reads the page count from the PDF's own page tree: the detail, the year, the winter profile.
    expect(execFileSync("pdfinfo", [pdf], { cwd: dir, encoding: "utf8" })).toMatch(/^Pages:\s+3$/m);
  }

  // Another member without the set is refused at download time; a visitor is sent to sign in.
  const other = await member("nosetyet");
  const refused = (await other.browser.respond(pack.loader, `/sets/${SET}/pack`, { slug: SET })) as Response;
  expect(refused.status).toBe(403);
  expect(await refused.json()).toMatchObject({
    error: "premium_required",
    offers: [{ href: "/pricing" }, { href: `/sets#${SET}` }],
  });
  const visitor = await new RouteClient().call(pack.loader, `/sets/${SET}/pack`, { slug: SET });
  expect(visitor.status).toBe(302);
});

test("a declined card grants nothing", async () => {
  const { browser, userId } = await member("declined");
  const checkoutUrl = await startCheckout(browser, { kind: "set", set: SET });
  const declined = await pay(checkoutUrl, CARD_DECLINED);
  expect(declined.status).toBe(402); // stand-in README: a decline re-shows the page with HTTP 402
  expect(await entitlementsOf(userId)).toHaveLength(0);
  expect(await detailApi(browser, premiumInSet)).toBe(403);
  const sessionId = new URL(checkoutUrl).pathname.split("/").at(-1)!;
  const ret = await import("~/routes/account/checkout-return");
  expect((await browser.call(ret.loader, `/account/checkout/return?session_id=${sessionId}`, {})).body).toMatchObject({
    state: "unpaid",
  });
});

test("a plan opens every premium detail; stopping at period end keeps access until the period ends, then it ends", async () => {
  const { browser, userId } = await member("planholder");
  const paid = await pay(await startCheckout(browser, { kind: "plan", plan: "monthly" }), CARD_PAYS);
  expect(paid.status).toBe(303);
  const [plan] = await entitlementsOf(userId);
  expect(plan).toMatchObject({ kind: "plan", planSlug: "monthly", status: "active", cancelAtPeriodEnd: false });
  expect(plan.currentPeriodEnd!.getTime()).toBeGreaterThan(Date.now());
  expect(await detailApi(browser, premiumInSet)).toBe(200);
  expect(await detailApi(browser, premiumOutsideSet)).toBe(200);

  const billing = await import("~/routes/account/billing");
  const asked = await browser.submit(billing.action, "/account/billing", { intent: "end-at-period-end" });
  expect(asked.status).toBe(303);
  // The stand-in sends customer.subscription.updated; wait for the webhook to land (no sleeps on a guess).
  await waitFor(async () => (await entitlementsOf(userId))[0].cancelAtPeriodEnd === true);
  const overview = await browser.call(billing.loader, "/account/billing", {});
  expect(overview.body).toMatchObject({ plan: { name: "Monthly plan", status: "active", cancelAtPeriodEnd: true } });
  expect(await detailApi(browser, premiumOutsideSet)).toBe(200);

  const advanced = await fetch(`${standin.url}/_standin/subscriptions/${plan.stripeSubscriptionId}/advance`, {
    method: "POST",
  });
  expect(advanced.status).toBe(200);
  const [ended] = await entitlementsOf(userId);
  expect(ended.status).toBe("canceled");
  expect(await detailApi(browser, premiumOutsideSet)).toBe(403);

  // Two receipts would be wrong: only the first invoice was paid.
  const { Payment } = await import("~/models/index.server");
  expect(await Payment.count({ where: { userId } })).toBe(1);
});

test("a renewal moves the period forward and a failed renewal marks the plan past due", async () => {
  const { browser, userId } = await member("renewer");
  await pay(await startCheckout(browser, { kind: "plan", plan: "annual" }), CARD_PAYS);
  const [before] = await entitlementsOf(userId);
  await fetch(`${standin.url}/_standin/subscriptions/${before.stripeSubscriptionId}/advance`, { method: "POST" });
  const [renewed] = await entitlementsOf(userId);
  expect(renewed.status).toBe("active");
  expect(renewed.currentPeriodEnd!.getTime()).toBeGreaterThan(before.currentPeriodEnd!.getTime());
  const { Payment } = await import("~/models/index.server");
  expect(await Payment.count({ where: { userId } })).toBe(2);

  await fetch(`${standin.url}/_standin/subscriptions/${before.stripeSubscriptionId}/advance`, {
    method: "POST",
    body: new URLSearchParams({ fail_renewal: "true" }),
  });
  const [failed] = await entitlementsOf(userId);
  expect(failed.status).toBe("past_due");
});

test("a forged signature is refused with 400 and changes nothing", async () => {
  const { userId } = await member("forger");
  const { PaymentEvent, Entitlement } = await import("~/models/index.server");
  const eventsBefore = await PaymentEvent.count();
  const entitlementsBefore = await Entitlement.count();
  const forged = JSON.stringify({
    id: "evt_forged_1",
    object: "event",
    type: "checkout.session.completed",
    created: Math.floor(Date.now() / 1000),
    data: {
      object: {
        id: "cs_test_forged",
        object: "checkout.session",
        mode: "payment",
        payment_status: "paid",
        client_reference_id: String(userId),
        metadata: { kind: "set", set_slug: SET },
        amount_total: 0,
        currency: "usd",
      },
    },
  });
  const { action } = await import("~/routes/api/payments-webhook");
  const send = (signature: string | null) =>
    action({
      request: new Request("http://127.0.0.1:3000/api/payments/webhook", {
        method: "POST",
        headers: signature ? { "Stripe-Signature": signature } : {},
        body: forged,
      }),
      params: {},
      context: {},
    } as never);
  // Signed correctly in form, but with a secret that is not ours.
  const wrongSecret = sdk.webhooks.generateTestHeaderString({
    payload: forged,
    secret: "whsec_not_the_endpoint_secret",
  });
  expect((await send(wrongSecret)).status).toBe(400);
  expect((await send(null)).status).toBe(400);
  // Our secret, but the body changed after signing.
  const signedOther = sdk.webhooks.generateTestHeaderString({
    payload: forged.replace("0,", "1,"),
    secret: WEBHOOK_SECRET,
  });
  expect((await send(signedOther)).status).toBe(400);
  expect(await PaymentEvent.count()).toBe(eventsBefore);
  expect(await Entitlement.count()).toBe(entitlementsBefore);
  expect(await entitlementsOf(userId)).toHaveLength(0);
});

test("the same event delivered twice grants one entitlement and is logged once", async () => {
  const { browser, userId } = await member("twice");
  await pay(await startCheckout(browser, { kind: "set", set: SET }), CARD_PAYS);
  const { PaymentEvent, Payment, User } = await import("~/models/index.server");
  const user = await User.findByPk(userId);
  const events = await sdk.events.list({ type: "checkout.session.completed", limit: 100 });
  const completed = events.data.find(
    (e) => (e.data.object as Stripe.Checkout.Session).customer === user?.stripeCustomerId,
  )!;
  expect(await redeliver(completed.id)).toBe(200);
  expect(await entitlementsOf(userId)).toHaveLength(1);
  expect(await PaymentEvent.count({ where: { id: completed.id } })).toBe(1);
  expect(await Payment.count({ where: { userId } })).toBe(1);
  expect(mail.outbox().filter((m) => m.to.includes("twice@example.test"))).toHaveLength(1);
});

test("a customer.subscription.updated that arrives after the deletion does not bring the plan back", async () => {
  const { browser, userId } = await member("latecomer");
  await pay(await startCheckout(browser, { kind: "plan", plan: "monthly" }), CARD_PAYS);
  const [plan] = await entitlementsOf(userId);
  const subscriptionId = plan.stripeSubscriptionId!;

  held.add("customer.subscription.updated");
  await sdk.subscriptions.update(subscriptionId, { cancel_at_period_end: true });
  await waitFor(async () => heldEvents.some((e) => e.type === "customer.subscription.updated"));
  held.clear();
  await sdk.subscriptions.cancel(subscriptionId);
  await waitFor(async () => (await entitlementsOf(userId))[0].status === "canceled");
  const snapshot = (await entitlementsOf(userId))[0].get({ plain: true });

  const late = heldEvents.find((e) => e.type === "customer.subscription.updated")!;
  expect(await redeliver(late.id)).toBe(200);
  const { PaymentEvent } = await import("~/models/index.server");
  const logged = await PaymentEvent.findByPk(late.id);
  expect(logged?.result).toBe("ignored");
  expect((await entitlementsOf(userId))[0].get({ plain: true })).toEqual(snapshot);
  expect(await detailApi(browser, premiumOutsideSet)).toBe(403);
});

test("the admin payments page lists events with their results; members are refused", async () => {
  const admin = await import("~/routes/admin/payments");
  const { browser } = await member("curious");
  expect((await browser.call(admin.loader, "/admin/payments", {})).status).toBe(403);
  const { User } = await import("~/models/index.server");
  await User.update({ role: "admin" }, { where: { email: "curious@example.test" } });
  const view = await browser.call(admin.loader, "/admin/payments", {});
  expect(view.status).toBe(200);
  const body = view.body as { events: { type: string; result: string }[]; counts: Record<string, number> };
  expect(body.events.some((e) => e.type === "checkout.session.completed" && e.result === "applied")).toBe(true);
  expect(body.counts.ignored).toBeGreaterThan(0);
});

function waitFor(check: () => Promise<boolean>): Promise<void> {
  return expect.poll(check, { timeout: 5000, interval: 25 }).toBe(true);
}
