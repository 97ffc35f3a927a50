import { LIVE_ENTITLEMENT_STATUSES } from "./entitlements";

/**
 * The SQL form of `isLive` for an `entitlements` row aliased `e`, at the database's clock.
 * Built from the same status list, so the page checks and the queries cannot disagree.
 * The statuses are fixed identifiers from the vocabulary, never user input.
 */
export const LIVE_ENTITLEMENT_SQL =
  `e.status IN (${LIVE_ENTITLEMENT_STATUSES.map((status) => `'${status}'`).join(", ")}) ` +
  `AND (e.current_period_end IS NULL OR e.current_period_end > UTC_TIMESTAMP(3))`;
