import type Stripe from "stripe";
import { DetailSet } from "~/models/index.server";
import { formatMoney, formatRecurring, type BillingInterval } from "./money";
import { stripe } from "./stripe.server";

// The one place that names what Dryside sells. Plans open every premium set; sets are one-time buys
// priced in content/sets.yaml (imported into detail_sets). The payments service finds each by lookup_key.

export interface Plan {
  slug: "monthly" | "annual";
  name: string;
  lookupKey: string;
  interval: BillingInterval;
  amountCents: number;
  currency: string;
  blurb: string;
}

export const PLANS: readonly Plan[] = [
  {
    slug: "monthly",
    name: "Monthly plan",
    lookupKey: "dryside_plan_monthly",
    interval: "month",
    amountCents: 1900,
    currency: "usd",
    blurb: "Every premium detail and set pack while the plan runs. Stop at the end of any month.",
  },
  {
    slug: "annual",
    name: "Annual plan",
    lookupKey: "dryside_plan_annual",
    interval: "year",
    amountCents: 19000,
    currency: "usd",
    blurb: "The same library for a year, at the price of ten months.",
  },
];

export function findPlan(slug: string): Plan | undefined {
  return PLANS.find((plan) => plan.slug === slug);
}

export function planForLookupKey(lookupKey: string | null | undefined): Plan | undefined {
  return PLANS.find((plan) => plan.lookupKey === lookupKey);
}

export function planPriceLabel(plan: Plan): string {
  return formatRecurring(plan.amountCents, plan.currency, plan.interval);
}

export function setLookupKey(setSlug: string): string {
  return `dryside_set_${setSlug.replaceAll("-", "_")}`;
}

export interface SetOffer {
  id: number;
  slug: string;
  title: string;
  summary: string;
  amountCents: number;
  currency: string;
  priceLabel: string;
  lookupKey: string;
}

export async function setOffers(): Promise<SetOffer[]> {
  const sets = await DetailSet.findAll({ order: [["title", "ASC"]] });
  return sets.map(toOffer);
}

export async function findSetOffer(slug: string): Promise<SetOffer | null> {
  const set = await DetailSet.findOne({ where: { slug } });
  return set ? toOffer(set) : null;
}

function toOffer(set: DetailSet): SetOffer {
  return {
    id: set.id,
    slug: set.slug,
    title: set.title,
    summary: set.summary,
    amountCents: set.priceCents,
    currency: set.currency.toLowerCase(),
    priceLabel: formatMoney(set.priceCents, set.currency),
    lookupKey: setLookupKey(set.slug),
  };
}

/** What the payments service needs to hold for one sellable thing. */
export interface PriceSpec {
  lookupKey: string;
  productName: string;
  description: string;
  amountCents: number;
  currency: string;
  interval: BillingInterval | null;
  metadata: Record<string, string>;
}

export function planPriceSpec(plan: Plan): PriceSpec {
  return {
    lookupKey: plan.lookupKey,
    productName: `Dryside ${plan.name}`,
    description: plan.blurb,
    amountCents: plan.amountCents,
    currency: plan.currency,
    interval: plan.interval,
    metadata: { kind: "plan", plan_slug: plan.slug },
  };
}

export function setPriceSpec(offer: SetOffer): PriceSpec {
  return {
    lookupKey: offer.lookupKey,
    productName: `Dryside set: ${offer.title}`,
    description: offer.summary.slice(0, 300),
    amountCents: offer.amountCents,
    currency: offer.currency,
    interval: null,
    metadata: { kind: "set", set_slug: offer.slug },
  };
}

function priceMatches(price: Stripe.Price, spec: PriceSpec): boolean {
  const interval = price.recurring?.interval ?? null;
  return (
    price.active &&
    price.unit_amount === spec.amountCents &&
    price.currency === spec.currency &&
    interval === spec.interval
  );
}

/**
 * Finds the active price for a lookup key, or creates product and price. Idempotent: a price whose
 * amount or cadence changed gets a new price that takes over the lookup key (prices are immutable).
 */
export async function ensurePrice(spec: PriceSpec): Promise<{ price: Stripe.Price; created: boolean }> {
  const client = stripe();
  const found = await client.prices.list({ lookup_keys: [spec.lookupKey], limit: 1 });
  const existing = found.data[0];
  if (existing && priceMatches(existing, spec)) return { price: existing, created: false };
  const productId = existing
    ? typeof existing.product === "string"
      ? existing.product
      : existing.product.id
    : (await client.products.create({ name: spec.productName, description: spec.description, metadata: spec.metadata }))
        .id;
  const price = await client.prices.create({
    product: productId,
    unit_amount: spec.amountCents,
    currency: spec.currency,
    lookup_key: spec.lookupKey,
    transfer_lookup_key: true,
    metadata: spec.metadata,
    ...(spec.interval ? { recurring: { interval: spec.interval } } : {}),
  });
  return { price, created: true };
}

/** Every plan and set price, created or found: run at start-up by scripts/prepare-local.ts. */
export async function syncPaymentsCatalogue(): Promise<{ lookupKey: string; priceId: string; created: boolean }[]> {
  const specs = [...PLANS.map(planPriceSpec), ...(await setOffers()).map(setPriceSpec)];
  const results = [];
  for (const spec of specs) {
    const { price, created } = await ensurePrice(spec);
    results.push({ lookupKey: spec.lookupKey, priceId: price.id, created });
  }
  return results;
}
