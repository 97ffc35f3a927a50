import { randomBytes } from "node:crypto";

// The shapes the app reads, with the field names of the real API. Only the fields worth imitating.

export type Metadata = Record<string, string>;
export type Interval = "day" | "week" | "month" | "year";

export type ListObject<T> = { object: "list"; data: T[]; has_more: boolean; url: string };

export type Product = {
  id: string;
  object: "product";
  active: boolean;
  created: number;
  updated: number;
  default_price: string | null;
  description: string | null;
  images: string[];
  livemode: false;
  metadata: Metadata;
  name: string;
  url: string | null;
};

export type Recurring = {
  interval: Interval;
  interval_count: number;
  usage_type: "licensed";
  trial_period_days: null;
};

export type Price = {
  id: string;
  object: "price";
  active: boolean;
  billing_scheme: "per_unit";
  created: number;
  currency: string;
  livemode: false;
  lookup_key: string | null;
  metadata: Metadata;
  nickname: string | null;
  product: string;
  recurring: Recurring | null;
  tax_behavior: "unspecified";
  type: "one_time" | "recurring";
  unit_amount: number;
  unit_amount_decimal: string;
};

export type Customer = {
  id: string;
  object: "customer";
  balance: number;
  created: number;
  currency: string | null;
  delinquent: boolean;
  description: string | null;
  email: string | null;
  invoice_prefix: string;
  livemode: false;
  metadata: Metadata;
  name: string | null;
  next_invoice_sequence: number;
  phone: string | null;
};

export type LineItem = {
  id: string;
  object: "item";
  amount_discount: number;
  amount_subtotal: number;
  amount_tax: number;
  amount_total: number;
  currency: string;
  description: string;
  price: Price;
  quantity: number;
};

export type CheckoutSession = {
  id: string;
  object: "checkout.session";
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer: string | null;
  customer_creation: "always" | "if_required" | null;
  customer_details: { email: string | null; name: string | null } | null;
  customer_email: string | null;
  expires_at: number;
  invoice: string | null;
  /** Not sent unless asked for with `expand[]=line_items`, as in the real API. */
  line_items?: ListObject<LineItem>;
  livemode: false;
  metadata: Metadata;
  mode: "payment" | "subscription";
  payment_intent: string | null;
  payment_status: "paid" | "unpaid" | "no_payment_required";
  status: "open" | "complete" | "expired";
  subscription: string | null;
  success_url: string;
  ui_mode: "hosted";
  url: string | null;
};

export type SubscriptionItem = {
  id: string;
  object: "subscription_item";
  created: number;
  current_period_end: number;
  current_period_start: number;
  metadata: Metadata;
  price: Price;
  quantity: number;
  subscription: string;
};

export type SubscriptionStatus = "active" | "past_due" | "canceled" | "unpaid" | "incomplete";

export type Subscription = {
  id: string;
  object: "subscription";
  billing_cycle_anchor: number;
  cancel_at: number | null;
  cancel_at_period_end: boolean;
  canceled_at: number | null;
  cancellation_details: { comment: string | null; feedback: string | null; reason: string | null };
  collection_method: "charge_automatically";
  created: number;
  currency: string;
  customer: string;
  /** Older API versions keep the period on the subscription, newer ones on each item: both are kept. */
  current_period_end: number;
  current_period_start: number;
  ended_at: number | null;
  items: ListObject<SubscriptionItem>;
  latest_invoice: string | null;
  livemode: false;
  metadata: Metadata;
  start_date: number;
  status: SubscriptionStatus;
};

export type InvoiceLine = {
  id: string;
  object: "line_item";
  amount: number;
  currency: string;
  description: string;
  period: { start: number; end: number };
  pricing: { type: "price_details"; price_details: { price: string; product: string } };
  quantity: number;
};

export type Invoice = {
  id: string;
  object: "invoice";
  amount_due: number;
  amount_paid: number;
  amount_remaining: number;
  attempt_count: number;
  attempted: boolean;
  billing_reason: "subscription_create" | "subscription_cycle";
  created: number;
  currency: string;
  customer: string;
  customer_email: string | null;
  lines: ListObject<InvoiceLine>;
  livemode: false;
  number: string;
  /** Newer API versions name the subscription here; `subscription` is kept for older readers. */
  parent: { type: "subscription_details"; subscription_details: { subscription: string; metadata: Metadata } };
  period_end: number;
  period_start: number;
  status: "open" | "paid";
  status_transitions: { finalized_at: number; paid_at: number | null };
  subscription: string;
  subtotal: number;
  total: number;
};

export type PaymentIntent = {
  id: string;
  object: "payment_intent";
  amount: number;
  amount_received: number;
  created: number;
  currency: string;
  customer: string | null;
  livemode: false;
  metadata: Metadata;
  payment_method_types: string[];
  status: "succeeded";
};

export type ApiObject = Product | Price | Customer | CheckoutSession | Subscription | Invoice | PaymentIntent;
export type Kind = ApiObject["object"];
export type ObjectOf<K extends Kind> = Extract<ApiObject, { object: K }>;

export type StandinEvent = {
  id: string;
  object: "event";
  api_version: string;
  created: number;
  data: { object: ApiObject; previous_attributes?: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: string;
};

/** The API version the installed SDK (stripe 23.1.0, esm/apiVersion.js) sends and expects on events. */
export const API_VERSION = "2026-10-28.endive";

const ALPHABET = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz";

/** Ids look like the real ones: a type prefix and random base-62 characters. */
export function newId(prefix: string, length = 24): string {
  const bytes = randomBytes(length);
  let out = "";
  for (const byte of bytes) out += ALPHABET[byte % ALPHABET.length];
  return `${prefix}_${out}`;
}

export function nowSeconds(): number {
  return Math.floor(Date.now() / 1000);
}

/** Adds billing intervals in UTC; a month from 31 January is the last day of February, not 3 March. */
export function addInterval(from: number, interval: Interval, count: number): number {
  const date = new Date(from * 1000);
  if (interval === "day" || interval === "week") {
    date.setUTCDate(date.getUTCDate() + count * (interval === "week" ? 7 : 1));
    return Math.floor(date.getTime() / 1000);
  }
  const months = interval === "year" ? 12 * count : count;
  const day = date.getUTCDate();
  date.setUTCDate(1);
  date.setUTCMonth(date.getUTCMonth() + months);
  const lastDay = new Date(Date.UTC(date.getUTCFullYear(), date.getUTCMonth() + 1, 0)).getUTCDate();
  date.setUTCDate(Math.min(day, lastDay));
  return Math.floor(date.getTime() / 1000);
}
