import { expect, test } from "vitest";
import {
  ENTITLEMENT_KINDS,
  ENTITLEMENT_STATUSES,
  ENTITLEMENT_STATUS_LABELS,
  LIVE_ENTITLEMENT_STATUSES,
  isLive,
} from "~/vocabulary/entitlements";
import { LIVE_ENTITLEMENT_SQL } from "~/vocabulary/entitlements.server";

const end = new Date("2026-12-31T00:00:00.000Z");
const before = new Date(end.getTime() - 1);
const after = new Date(end.getTime() + 1);

test("statuses and kinds as the entitlements table lists them", () => {
  // db/migrations/2026-12-02-0003-entitlements.ts created both ENUM columns with these values.
  expect(ENTITLEMENT_STATUSES).toEqual(["active", "past_due", "canceled", "expired"]);
  expect(ENTITLEMENT_KINDS).toEqual(["plan", "set"]);
  expect(Object.keys(ENTITLEMENT_STATUS_LABELS)).toEqual([...ENTITLEMENT_STATUSES]);
});

test("an active plan is live inside its period and not from the period's end on (the period is [start, end))", () => {
  expect(isLive({ status: "active", currentPeriodEnd: end }, before)).toBe(true);
  expect(isLive({ status: "active", currentPeriodEnd: end }, end)).toBe(false);
  expect(isLive({ status: "active", currentPeriodEnd: end }, after)).toBe(false);
});

test("a failed renewal (past_due) keeps access until the paid period ends, not after", () => {
  expect(isLive({ status: "past_due", currentPeriodEnd: end }, before)).toBe(true);
  expect(isLive({ status: "past_due", currentPeriodEnd: end }, end)).toBe(false);
});

test("canceled and expired never count, even inside a period", () => {
  expect(isLive({ status: "canceled", currentPeriodEnd: end }, before)).toBe(false);
  expect(isLive({ status: "expired", currentPeriodEnd: end }, before)).toBe(false);
  expect(isLive({ status: "canceled", currentPeriodEnd: null }, before)).toBe(false);
});

test("a bought set has no period and stays live while its status is live", () => {
  expect(isLive({ status: "active", currentPeriodEnd: null }, new Date("2099-01-01T00:00:00Z"))).toBe(true);
});

test("the SQL rule is built from the same statuses and the same strict period end", () => {
  expect(LIVE_ENTITLEMENT_STATUSES).toEqual(["active", "past_due"]);
  expect(LIVE_ENTITLEMENT_SQL).toBe(
    "e.status IN ('active', 'past_due') AND (e.current_period_end IS NULL OR e.current_period_end > UTC_TIMESTAMP(3))",
  );
});
