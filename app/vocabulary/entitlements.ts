// Entitlements: a user's right to premium content, written only by payment webhooks
// (app/payments/webhooks.server.ts). The entitlements table holds both lists
// (db/migrations/2026-12-02-0003-entitlements.ts): a new status or kind needs a migration.

/** A plan opens every premium set; a set is one bought set. */
export const ENTITLEMENT_KINDS = ["plan", "set"] as const;
export type EntitlementKind = (typeof ENTITLEMENT_KINDS)[number];

export const ENTITLEMENT_STATUSES = ["active", "past_due", "canceled", "expired"] as const;
export type EntitlementStatus = (typeof ENTITLEMENT_STATUSES)[number];

/**
 * Statuses that grant access while inside the paid period. `past_due` is included on purpose: a
 * renewal payment failed, but the period already paid for has not ended, and the payments service
 * retries the card for a while. Cutting a paying subscriber off mid-period for a card problem would
 * take away what they paid for; once the period ends without payment the entitlement stops counting
 * (the period check below), whatever its status says.
 */
export const LIVE_ENTITLEMENT_STATUSES = ["active", "past_due"] as const satisfies readonly EntitlementStatus[];

export const ENTITLEMENT_STATUS_LABELS: Record<EntitlementStatus, string> = {
  active: "Active",
  past_due: "Renewal payment failed: update your card soon",
  canceled: "Ended",
  expired: "Paused",
};

export interface EntitlementTerms {
  status: EntitlementStatus;
  /** End of the paid period; null for a bought set, which does not lapse. */
  currentPeriodEnd: Date | null;
}

/**
 * Whether an entitlement grants access at `now`: a live status, and either no period (a bought set)
 * or a period that has not ended. The period's end instant itself is outside it (the period is
 * half-open, [start, end)), matching `current_period_end > now` in SQL.
 */
export function isLive(entitlement: EntitlementTerms, now: Date): boolean {
  const liveStatus = (LIVE_ENTITLEMENT_STATUSES as readonly EntitlementStatus[]).includes(entitlement.status);
  return (
    liveStatus && (entitlement.currentPeriodEnd === null || entitlement.currentPeriodEnd.getTime() > now.getTime())
  );
}
