import { DetailSet, Download, Entitlement, type User } from "~/models/index.server";
import { findPlan } from "./catalogue.server";
import { receiptsFor, type ReceiptRow } from "./receipts.server";
import { stripe } from "./stripe.server";
import { isLive, type EntitlementStatus } from "~/vocabulary/entitlements";

export interface PlanSummary {
  name: string;
  status: EntitlementStatus;
  /** Grants access now (the one rule: isLive); only a live plan can be stopped or kept running. */
  live: boolean;
  renewsOrEndsAt: string | null;
  cancelAtPeriodEnd: boolean;
}

export interface BillingOverview {
  plan: PlanSummary | null;
  sets: { slug: string; title: string; boughtAt: string }[];
  receipts: ReceiptRow[];
  downloads: { setTitle: string; at: string }[];
}

async function currentPlan(userId: number): Promise<Entitlement | null> {
  // The newest plan row: a canceled one still tells the person when it ended.
  return Entitlement.findOne({ where: { userId, kind: "plan" }, order: [["updatedAt", "DESC"]] });
}

/** What the billing page shows, read from the entitlements the webhooks wrote. */
export async function billingOverview(user: User): Promise<BillingOverview> {
  const now = new Date();
  const [plan, boughtSets, receipts, downloads] = await Promise.all([
    currentPlan(user.id),
    Entitlement.findAll({
      where: { userId: user.id, kind: "set" },
      include: [{ model: DetailSet, as: "detailSet", attributes: ["slug", "title"] }],
      order: [["createdAt", "DESC"]],
    }),
    receiptsFor(user.id),
    Download.findAll({
      where: { userId: user.id },
      include: [{ model: DetailSet, as: "detailSet", attributes: ["title"] }],
      order: [["createdAt", "DESC"]],
      limit: 20,
    }),
  ]);
  const sets = boughtSets.filter((set) => isLive(set, now));
  return {
    plan: plan
      ? {
          name: findPlan(plan.planSlug ?? "")?.name ?? "Plan",
          status: plan.status,
          live: isLive(plan, now),
          renewsOrEndsAt: plan.currentPeriodEnd?.toISOString() ?? null,
          cancelAtPeriodEnd: plan.cancelAtPeriodEnd,
        }
      : null,
    sets: sets.map((e) => ({
      slug: e.detailSet?.slug ?? "",
      title: e.detailSet?.title ?? "A set",
      boughtAt: e.createdAt.toISOString(),
    })),
    receipts,
    downloads: downloads.map((d) => ({ setTitle: d.detailSet?.title ?? "A set", at: d.createdAt.toISOString() })),
  };
}

export type PlanChange = { ok: true; cancelAtPeriodEnd: boolean } | { ok: false; message: string };

/**
 * Asks the payments service to stop the plan at the end of the paid period, or to keep it running.
 * The entitlement changes when the service's webhook confirms, like every other change.
 */
export async function requestPlanEnd(user: User, cancelAtPeriodEnd: boolean): Promise<PlanChange> {
  const plans = await Entitlement.findAll({ where: { userId: user.id, kind: "plan" } });
  const plan = plans.find((candidate) => isLive(candidate, new Date()));
  if (!plan?.stripeSubscriptionId) return { ok: false, message: "You have no running plan to change." };
  await stripe().subscriptions.update(plan.stripeSubscriptionId, { cancel_at_period_end: cancelAtPeriodEnd });
  return { ok: true, cancelAtPeriodEnd };
}
