import { ApiError } from "./api-error";
import type { Billing, RequestRef } from "./billing";
import { mergeMetadata, type Params } from "./form";
import {
  newId,
  nowSeconds,
  type CheckoutSession,
  type Interval,
  type LineItem,
  type Price,
  type Product,
  type StandinEvent,
  type SubscriptionStatus,
} from "./objects";
import { json, type Router, type StandinRequest } from "./router";
import { paginate, render, renderList, type EventRecord, type Store } from "./store";

type ApiDeps = { store: Store; billing: Billing; publicUrl: () => string };

const SESSION_LIFETIME_SECONDS = 24 * 60 * 60;

/** The `/v1/...` endpoints the app's SDK calls. Everything else answers the API's own 404. */
export function addApiRoutes(router: Router, { store, billing, publicUrl }: ApiDeps): void {
  const expandOf = (request: StandinRequest): string[] =>
    request.query.stringList("expand") ?? request.body.stringList("expand") ?? [];
  const requestRef = (request: StandinRequest): RequestRef => ({
    id: request.requestId,
    idempotency_key: request.idempotencyKey,
  });

  // Products
  router.add("POST", "/v1/products", (request) => {
    const body = request.body;
    const now = nowSeconds();
    const product = store.insert<Product>({
      id: body.string("id") ?? newId("prod", 14),
      object: "product",
      active: body.boolean("active") ?? true,
      created: now,
      updated: now,
      default_price: null,
      description: body.nullableString("description") ?? null,
      images: body.stringList("images") ?? [],
      livemode: false,
      metadata: body.stringMap("metadata") ?? {},
      name: body.requiredString("name"),
      url: body.nullableString("url") ?? null,
    });
    return json(render(store, product, expandOf(request)));
  });
  router.add("GET", "/v1/products/:id", (request) =>
    json(render(store, store.get("product", request.params.id), expandOf(request))),
  );
  router.add("POST", "/v1/products/:id", (request) => {
    const { body } = request;
    const product = store.get("product", request.params.id);
    product.name = body.string("name") ?? product.name;
    product.active = body.boolean("active") ?? product.active;
    const description = body.nullableString("description");
    if (description !== undefined) product.description = description;
    const metadata = body.stringMap("metadata");
    if (metadata) product.metadata = mergeMetadata(product.metadata, metadata);
    product.updated = nowSeconds();
    return json(render(store, product, expandOf(request)));
  });
  router.add("GET", "/v1/products", (request) => {
    const active = request.query.boolean("active");
    const ids = request.query.stringList("ids");
    const found = store.list(
      "product",
      (product) => (active === undefined || product.active === active) && (!ids || ids.includes(product.id)),
    );
    return json(renderList(store, paginate(found, request.query, "/v1/products"), expandOf(request)));
  });

  // Prices
  router.add("POST", "/v1/prices", (request) => {
    const { body } = request;
    const currency = body.requiredString("currency").toLowerCase();
    if (!/^[a-z]{3}$/.test(currency)) throw ApiError.invalid("currency", "a three-letter ISO currency code");
    const unitAmount = body.requiredInteger("unit_amount");
    if (unitAmount < 0) throw ApiError.invalid("unit_amount", "a non-negative integer");
    const productId = body.string("product") ?? createProductFromData(body.nested("product_data"));
    const product = store.get("product", productId, "product");
    const recurring = body.nested("recurring");
    const interval = recurring?.oneOf<Interval>("interval", ["day", "week", "month", "year"]);
    if (recurring && !interval) throw ApiError.missing("recurring[interval]");
    const lookupKey = body.string("lookup_key") ?? null;
    if (lookupKey) claimLookupKey(lookupKey, body.boolean("transfer_lookup_key") ?? false);
    const price = store.insert<Price>({
      id: newId("price"),
      object: "price",
      active: body.boolean("active") ?? true,
      billing_scheme: "per_unit",
      created: nowSeconds(),
      currency,
      livemode: false,
      lookup_key: lookupKey,
      metadata: body.stringMap("metadata") ?? {},
      nickname: body.string("nickname") ?? null,
      product: product.id,
      recurring: interval
        ? {
            interval,
            interval_count: recurring?.integer("interval_count") ?? 1,
            usage_type: "licensed",
            trial_period_days: null,
          }
        : null,
      tax_behavior: "unspecified",
      type: interval ? "recurring" : "one_time",
      unit_amount: unitAmount,
      unit_amount_decimal: String(unitAmount),
    });
    return json(render(store, price, expandOf(request)));
  });
  router.add("GET", "/v1/prices/:id", (request) =>
    json(render(store, store.get("price", request.params.id), expandOf(request))),
  );
  router.add("POST", "/v1/prices/:id", (request) => {
    const { body } = request;
    const price = store.get("price", request.params.id);
    price.active = body.boolean("active") ?? price.active;
    const nickname = body.nullableString("nickname");
    if (nickname !== undefined) price.nickname = nickname;
    const metadata = body.stringMap("metadata");
    if (metadata) price.metadata = mergeMetadata(price.metadata, metadata);
    const lookupKey = body.nullableString("lookup_key");
    if (lookupKey) claimLookupKey(lookupKey, body.boolean("transfer_lookup_key") ?? false, price.id);
    if (lookupKey !== undefined) price.lookup_key = lookupKey;
    return json(render(store, price, expandOf(request)));
  });
  router.add("GET", "/v1/prices", (request) => {
    const { query } = request;
    const active = query.boolean("active");
    const product = query.string("product");
    const lookupKeys = query.stringList("lookup_keys");
    const type = query.oneOf("type", ["one_time", "recurring"]);
    const currency = query.string("currency")?.toLowerCase();
    const found = store.list(
      "price",
      (price) =>
        (active === undefined || price.active === active) &&
        (!product || price.product === product) &&
        (!lookupKeys || (price.lookup_key !== null && lookupKeys.includes(price.lookup_key))) &&
        (!type || price.type === type) &&
        (!currency || price.currency === currency),
    );
    return json(renderList(store, paginate(found, query, "/v1/prices"), expandOf(request)));
  });

  /** Lookup keys are unique among prices; `transfer_lookup_key` moves one from its current holder. */
  function claimLookupKey(lookupKey: string, transfer: boolean, claimant?: string): void {
    const holder = store.list("price", (price) => price.lookup_key === lookupKey && price.id !== claimant)[0];
    if (!holder) return;
    if (!transfer) {
      throw ApiError.request(
        `A price (\`${holder.id}\`) already uses that lookup key. Pass transfer_lookup_key=true to move it.`,
        "lookup_key",
      );
    }
    holder.lookup_key = null;
  }

  function createProductFromData(data: Params | undefined): string {
    if (!data) throw ApiError.missing("product");
    const now = nowSeconds();
    return store.insert<Product>({
      id: newId("prod", 14),
      object: "product",
      active: data.boolean("active") ?? true,
      created: now,
      updated: now,
      default_price: null,
      description: null,
      images: [],
      livemode: false,
      metadata: data.stringMap("metadata") ?? {},
      name: data.requiredString("name"),
      url: null,
    }).id;
  }

  // Customers
  router.add("POST", "/v1/customers", (request) => {
    const { body } = request;
    const customer = billing.createCustomer({
      email: body.nullableString("email") ?? null,
      name: body.nullableString("name") ?? null,
      metadata: body.stringMap("metadata") ?? {},
    });
    customer.description = body.nullableString("description") ?? null;
    customer.phone = body.nullableString("phone") ?? null;
    return json(render(store, customer, expandOf(request)));
  });
  router.add("GET", "/v1/customers/:id", (request) =>
    json(render(store, store.get("customer", request.params.id), expandOf(request))),
  );
  router.add("POST", "/v1/customers/:id", (request) => {
    const { body } = request;
    const customer = store.get("customer", request.params.id);
    for (const field of ["email", "name", "description", "phone"] as const) {
      const value = body.nullableString(field);
      if (value !== undefined) customer[field] = value;
    }
    const metadata = body.stringMap("metadata");
    if (metadata) customer.metadata = mergeMetadata(customer.metadata, metadata);
    return json(render(store, customer, expandOf(request)));
  });
  router.add("GET", "/v1/customers", (request) => {
    const email = request.query.string("email");
    const found = store.list("customer", (customer) => !email || customer.email === email);
    return json(renderList(store, paginate(found, request.query, "/v1/customers"), expandOf(request)));
  });

  // Checkout sessions
  router.add("POST", "/v1/checkout/sessions", (request) => {
    const session = createCheckoutSession(request.body);
    return json(render(store, session, expandOf(request)));
  });
  router.add("GET", "/v1/checkout/sessions/:id", (request) =>
    json(render(store, store.get("checkout.session", request.params.id), expandOf(request))),
  );
  router.add("GET", "/v1/checkout/sessions/:id/line_items", (request) => {
    const session = store.get("checkout.session", request.params.id);
    const items = session.line_items?.data ?? [];
    return json(paginate(items, request.query, `/v1/checkout/sessions/${session.id}/line_items`));
  });
  router.add("POST", "/v1/checkout/sessions/:id/expire", (request) => {
    const session = store.get("checkout.session", request.params.id);
    if (session.status !== "open") {
      throw ApiError.request(`Only open sessions can be expired; this one is ${session.status}.`);
    }
    session.status = "expired";
    session.url = null;
    return json(render(store, session, expandOf(request)));
  });
  router.add("GET", "/v1/checkout/sessions", (request) => {
    const { query } = request;
    const customer = query.string("customer");
    const subscription = query.string("subscription");
    const paymentIntent = query.string("payment_intent");
    const status = query.oneOf("status", ["open", "complete", "expired"]);
    const found = store.list(
      "checkout.session",
      (session) =>
        (!customer || session.customer === customer) &&
        (!subscription || session.subscription === subscription) &&
        (!paymentIntent || session.payment_intent === paymentIntent) &&
        (!status || session.status === status),
    );
    return json(renderList(store, paginate(found, query, "/v1/checkout/sessions"), expandOf(request)));
  });

  function createCheckoutSession(body: Params): CheckoutSession {
    const mode = body.oneOf("mode", ["payment", "subscription"]);
    if (!mode) throw ApiError.missing("mode");
    const successUrl = body.requiredString("success_url");
    const lines = body.nestedList("line_items");
    if (!lines || lines.length === 0) throw ApiError.missing("line_items");
    const id = newId("cs_test", 58);
    const lineItems: LineItem[] = lines.map((line, index) => {
      const price = store.get("price", line.requiredString("price"), `line_items[${index}][price]`);
      const quantity = line.integer("quantity") ?? 1;
      if (quantity < 1) throw ApiError.invalid(`line_items[${index}][quantity]`, "at least 1");
      if (!price.active) throw ApiError.request(`The price ${price.id} is not active.`, `line_items[${index}][price]`);
      if (mode === "payment" && price.recurring) {
        throw ApiError.request(
          "`payment` mode takes one-time prices only; use `subscription` mode for recurring prices.",
          `line_items[${index}][price]`,
        );
      }
      const amount = price.unit_amount * quantity;
      return {
        id: newId("li"),
        object: "item",
        amount_discount: 0,
        amount_subtotal: amount,
        amount_tax: 0,
        amount_total: amount,
        currency: price.currency,
        description: store.find("product", price.product)?.name ?? price.product,
        price: render(store, price),
        quantity,
      };
    });
    const currency = lineItems[0].currency;
    if (lineItems.some((item) => item.currency !== currency)) {
      throw ApiError.request("All line items must use the same currency.", "line_items");
    }
    if (mode === "subscription") {
      const intervals = new Set(lineItems.map((item) => JSON.stringify(item.price.recurring)));
      if (lineItems.some((item) => !item.price.recurring)) {
        throw ApiError.request("`subscription` mode takes recurring prices only.", "line_items");
      }
      if (intervals.size > 1) throw ApiError.request("All recurring prices must share one interval.", "line_items");
    }
    const customerId = body.string("customer");
    const customerEmail = body.string("customer_email") ?? null;
    if (customerId && customerEmail) {
      throw ApiError.request(
        "You may only specify one of these parameters: customer, customer_email.",
        "customer_email",
      );
    }
    if (customerId) store.get("customer", customerId, "customer");
    const customerCreation = body.oneOf("customer_creation", ["always", "if_required"]) ?? null;
    if (customerCreation && mode !== "payment") {
      throw ApiError.request("customer_creation can only be used in `payment` mode.", "customer_creation");
    }
    const total = lineItems.reduce((sum, item) => sum + item.amount_total, 0);
    const now = nowSeconds();
    return store.insert<CheckoutSession>({
      id,
      object: "checkout.session",
      amount_subtotal: total,
      amount_total: total,
      cancel_url: body.string("cancel_url") ?? null,
      client_reference_id: body.string("client_reference_id") ?? null,
      created: now,
      currency,
      customer: customerId ?? null,
      customer_creation: mode === "payment" ? (customerCreation ?? "if_required") : null,
      customer_details: null,
      customer_email: customerEmail,
      expires_at: body.integer("expires_at") ?? now + SESSION_LIFETIME_SECONDS,
      invoice: null,
      line_items: { object: "list", data: lineItems, has_more: false, url: `/v1/checkout/sessions/${id}/line_items` },
      livemode: false,
      metadata: body.stringMap("metadata") ?? {},
      mode,
      payment_intent: null,
      payment_status: "unpaid",
      status: "open",
      subscription: null,
      success_url: successUrl,
      ui_mode: "hosted",
      url: `${publicUrl()}/checkout/${id}`,
    });
  }

  // Subscriptions
  router.add("GET", "/v1/subscriptions/:id", (request) =>
    json(render(store, store.get("subscription", request.params.id), expandOf(request))),
  );
  router.add("POST", "/v1/subscriptions/:id", (request) => {
    const subscription = store.get("subscription", request.params.id);
    // The response does not wait for the webhook, as with the real service.
    void billing.updateSubscription(
      subscription,
      {
        cancelAtPeriodEnd: request.body.boolean("cancel_at_period_end"),
        metadata: request.body.stringMap("metadata"),
      },
      requestRef(request),
    );
    return json(render(store, subscription, expandOf(request)));
  });
  router.add("DELETE", "/v1/subscriptions/:id", (request) => {
    const subscription = store.get("subscription", request.params.id);
    void billing.cancelNow(subscription, requestRef(request));
    return json(render(store, subscription, expandOf(request)));
  });
  router.add("GET", "/v1/subscriptions", (request) => {
    const { query } = request;
    const customer = query.string("customer");
    const price = query.string("price");
    const status = query.oneOf<SubscriptionStatus | "all">("status", [
      "active",
      "past_due",
      "canceled",
      "unpaid",
      "incomplete",
      "all",
    ]);
    const found = store.list(
      "subscription",
      (subscription) =>
        (!customer || subscription.customer === customer) &&
        (!price || subscription.items.data.some((item) => item.price.id === price)) &&
        // Without a status filter the real API leaves canceled subscriptions out.
        (status === "all" || (status ? subscription.status === status : subscription.status !== "canceled")),
    );
    return json(renderList(store, paginate(found, query, "/v1/subscriptions"), expandOf(request)));
  });

  // Invoices and payment intents (read-only: they come from checkout and renewals)
  router.add("GET", "/v1/invoices/:id", (request) =>
    json(render(store, store.get("invoice", request.params.id), expandOf(request))),
  );
  router.add("GET", "/v1/invoices", (request) => {
    const { query } = request;
    const customer = query.string("customer");
    const subscription = query.string("subscription");
    const status = query.oneOf("status", ["open", "paid"]);
    const found = store.list(
      "invoice",
      (invoice) =>
        (!customer || invoice.customer === customer) &&
        (!subscription || invoice.subscription === subscription) &&
        (!status || invoice.status === status),
    );
    return json(renderList(store, paginate(found, query, "/v1/invoices"), expandOf(request)));
  });
  router.add("GET", "/v1/payment_intents/:id", (request) =>
    json(render(store, store.get("payment_intent", request.params.id), expandOf(request))),
  );

  // Events
  router.add("GET", "/v1/events/:id", (request) => json(eventView(store.event(request.params.id))));
  router.add("GET", "/v1/events", (request) => {
    const type = request.query.string("type");
    const types = request.query.stringList("types");
    const found = [...store.events()]
      .reverse()
      .filter((record) => (!type || record.event.type === type) && (!types || types.includes(record.event.type)))
      .map(eventView);
    return json(paginate(found, request.query, "/v1/events"));
  });
}

/** An event as the API shows it now: `pending_webhooks` drops to 0 once the endpoint took it. */
export function eventView(record: EventRecord): StandinEvent {
  return { ...record.event, pending_webhooks: record.delivered ? 0 : 1 };
}
