import type { Billing } from "./billing";
import type { CheckoutSession, Recurring } from "./objects";
import { html, redirect, type Router } from "./router";
import type { Store } from "./store";
import { checkCard, TEST_CARDS } from "./test-cards";

type PageDeps = { store: Store; billing: Billing; webhookWaitMs: number };

type FormState = { email: string; number: string; expiry: string; name: string; error: string | null };

const BLANK_FORM: FormState = { email: "", number: "", expiry: "", name: "", error: null };

/**
 * The hosted checkout page that a session's `url` points to. Form fields: `email` (only when the
 * session knows no customer), `card_number`, `card_expiry` (MM/YY), `card_cvc`, `cardholder_name`.
 */
export function addCheckoutPageRoutes(router: Router, { store, billing, webhookWaitMs }: PageDeps): void {
  router.add("GET", "/checkout/:id", (request) => {
    const session = store.find("checkout.session", request.params.id);
    if (!session) return html(notice("Checkout not found", "This checkout link is not known here."), 404);
    return html(page(store, session, BLANK_FORM));
  });

  router.add("POST", "/checkout/:id/pay", async (request) => {
    const session = store.find("checkout.session", request.params.id);
    if (!session) return html(notice("Checkout not found", "This checkout link is not known here."), 404);
    if (session.status !== "open") return html(page(store, session, BLANK_FORM), 409);
    const { body } = request;
    const form: FormState = {
      email: body.string("email")?.trim() ?? "",
      number: body.string("card_number") ?? "",
      expiry: body.string("card_expiry") ?? "",
      name: body.string("cardholder_name") ?? "",
      error: null,
    };
    const knownEmail = payerEmail(store, session);
    if (!knownEmail && !/^[^@\s]+@[^@\s]+\.[^@\s]+$/.test(form.email)) {
      return html(page(store, session, { ...form, error: "Enter a valid email address." }), 400);
    }
    const outcome = checkCard({
      number: form.number,
      expiry: form.expiry,
      cvc: body.string("card_cvc") ?? "",
      name: form.name,
    });
    // A decline shows the page again and sends nothing: the session stays open for another try.
    if (!outcome.ok) return html(page(store, session, { ...form, error: outcome.message }), 402);

    const delivered = billing.completeCheckout(session, { email: knownEmail ?? form.email, name: form.name.trim() });
    // Wait (briefly) for the webhooks, so the app has usually recorded the payment before the buyer lands.
    await Promise.race([delivered, new Promise((resolve) => setTimeout(resolve, webhookWaitMs).unref())]);
    return redirect(session.success_url.replaceAll("{CHECKOUT_SESSION_ID}", session.id));
  });

  router.add("POST", "/checkout/:id/cancel", (request) => {
    const session = store.find("checkout.session", request.params.id);
    if (!session) return html(notice("Checkout not found", "This checkout link is not known here."), 404);
    // Leaving does not expire the session, as with the real service: the buyer may come back.
    if (session.cancel_url) return redirect(session.cancel_url);
    return html(notice("Checkout left", "No payment was taken. You can close this page."));
  });
}

function payerEmail(store: Store, session: CheckoutSession): string | null {
  if (session.customer_email) return session.customer_email;
  if (session.customer) return store.find("customer", session.customer)?.email ?? null;
  return null;
}

function page(store: Store, session: CheckoutSession, form: FormState): string {
  const items = session.line_items?.data ?? [];
  const recurring = items[0]?.price.recurring ?? null;
  const rows = items
    .map(
      (
        item,
      ) => `<tr><td>${escapeHtml(item.description)}${item.quantity > 1 ? ` <span class="muted">× ${item.quantity}</span>` : ""}</td>
        <td class="amount">${formatAmount(item.amount_total, item.currency)}</td></tr>`,
    )
    .join("\n");
  const total = `${formatAmount(session.amount_total, session.currency)}${recurring ? ` ${cadence(recurring)}` : ""}`;
  const summary = `<table class="summary"><tbody>${rows}</tbody>
    <tfoot><tr><th>Total</th><td class="amount">${escapeHtml(total)}</td></tr></tfoot></table>`;

  if (session.status !== "open") {
    const body =
      session.status === "complete"
        ? `<p>This checkout is already paid.</p><p><a href="${escapeHtml(session.success_url.replaceAll("{CHECKOUT_SESSION_ID}", session.id))}">Continue</a></p>`
        : "<p>This checkout has expired. Start again from the site.</p>";
    return layout("Checkout closed", `${summary}${body}`);
  }

  const emailField = payerEmail(store, session)
    ? ""
    : field(
        "Email",
        `<input name="email" type="email" autocomplete="email" required value="${escapeHtml(form.email)}">`,
      );
  const alert = form.error ? `<p class="alert" role="alert">${escapeHtml(form.error)}</p>` : "";
  const cards = Object.entries(TEST_CARDS)
    .map(
      ([number, outcome]) =>
        `<li><code>${number}</code> ${outcome.ok ? `pays (${outcome.funding})` : `declines: ${escapeHtml(outcome.message)}`}</li>`,
    )
    .join("");
  const action = session.mode === "subscription" ? "Subscribe" : "Pay";
  return layout(
    "Checkout",
    `${summary}
    ${alert}
    <form method="post" action="/checkout/${escapeHtml(session.id)}/pay" class="pay">
      ${emailField}
      ${field("Card number", `<input name="card_number" inputmode="numeric" autocomplete="cc-number" required value="${escapeHtml(form.number)}" placeholder="1234 1234 1234 1234">`)}
      <div class="pair">
        ${field("Expiry (MM/YY)", `<input name="card_expiry" autocomplete="cc-exp" required value="${escapeHtml(form.expiry)}" placeholder="MM/YY">`)}
        ${field("Security code", `<input name="card_cvc" inputmode="numeric" autocomplete="cc-csc" required placeholder="123">`)}
      </div>
      ${field("Name on card", `<input name="cardholder_name" autocomplete="cc-name" required value="${escapeHtml(form.name)}">`)}
      <button type="submit" class="primary">${action} ${escapeHtml(total)}</button>
    </form>
    <form method="post" action="/checkout/${escapeHtml(session.id)}/cancel">
      <button type="submit" class="secondary">Cancel and go back</button>
    </form>
    <details><summary>Test card numbers</summary><p class="muted">Any future expiry and any three-digit code.</p><ul>${cards}</ul></details>`,
  );
}

function field(label: string, input: string): string {
  return `<label>${escapeHtml(label)}${input}</label>`;
}

function notice(title: string, message: string): string {
  return layout(title, `<p>${escapeHtml(message)}</p>`);
}

function layout(title: string, content: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)} · local payments stand-in</title>
<style>
  :root { --ink: #2d2a26; --muted: #6f6a62; --paper: #f4f1ea; --card: #fffdf8; --line: #d9d3c7; --accent: #3c5a4f; --warn: #8a3b24; }
  * { box-sizing: border-box; }
  body { margin: 0; background: var(--paper); color: var(--ink); font: 16px/1.5 system-ui, sans-serif; }
  main { max-width: 30rem; margin: 3rem auto; padding: 1.75rem; background: var(--card); border: 1px solid var(--line); border-radius: 6px; }
  .banner { margin: 0 0 1.25rem; padding: .4rem .75rem; border-left: 3px solid var(--accent); color: var(--muted); font-size: .875rem; }
  h1 { margin: 0 0 1rem; font-size: 1.25rem; font-weight: 600; }
  table.summary { width: 100%; border-collapse: collapse; margin-bottom: 1.25rem; }
  .summary td, .summary th { padding: .45rem 0; border-bottom: 1px solid var(--line); text-align: left; font-weight: normal; }
  .summary tfoot th, .summary tfoot td { font-weight: 600; border-bottom: none; }
  .amount { text-align: right !important; font-variant-numeric: tabular-nums; }
  label { display: block; margin-bottom: .85rem; font-size: .875rem; color: var(--muted); }
  input { display: block; width: 100%; margin-top: .25rem; padding: .55rem .65rem; font: inherit; color: var(--ink); background: #fff; border: 1px solid var(--line); border-radius: 4px; }
  input:focus { outline: 2px solid var(--accent); outline-offset: 1px; }
  .pair { display: grid; grid-template-columns: 1fr 1fr; gap: .75rem; }
  button { width: 100%; padding: .65rem; font: inherit; border-radius: 4px; cursor: pointer; }
  .primary { background: var(--accent); color: #fff; border: 1px solid var(--accent); font-weight: 600; }
  .secondary { margin-top: .6rem; background: transparent; color: var(--muted); border: 1px solid var(--line); }
  .alert { padding: .6rem .75rem; border: 1px solid var(--warn); color: var(--warn); border-radius: 4px; }
  .muted { color: var(--muted); }
  details { margin-top: 1.5rem; font-size: .875rem; color: var(--muted); }
  code { font-size: .85rem; }
</style>
</head>
<body>
<main>
<p class="banner">Local test checkout: no real card is charged and no money moves.</p>
<h1>${escapeHtml(title)}</h1>
${content}
</main>
</body>
</html>`;
}

function cadence(recurring: Recurring): string {
  return recurring.interval_count === 1
    ? `per ${recurring.interval}`
    : `every ${recurring.interval_count} ${recurring.interval}s`;
}

/** Amounts are in the currency's minor unit; Intl knows how many decimals each currency has. */
function formatAmount(minor: number, currency: string): string {
  const format = new Intl.NumberFormat("en-US", { style: "currency", currency: currency.toUpperCase() });
  const decimals = format.resolvedOptions().maximumFractionDigits ?? 2;
  return format.format(minor / 10 ** decimals);
}

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (char) => `&#${char.charCodeAt(0)};`);
}
