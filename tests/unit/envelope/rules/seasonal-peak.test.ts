import { expect, test } from "vitest";
import { cold, mild, seasonalFlag } from "./seasonal-fixtures";

const ID = "seasonal-peak";

test("two cold months collect 1578 g/m² before drying in April: more than 500 g/m², caution — DIN 4108-3:2018 §5.3 (from memory); amounts hand-derived in monthly-balance.test.ts (D)", () => {
  const f = seasonalFlag(ID, [cold, cold, ...Array(10).fill(mild)]);
  expect(f?.severity).toBe("caution");
  expect(f?.explanation).toMatch(/1578 g\/m²/);
});

test("must not fire: a mild year condenses nothing", () => {
  expect(seasonalFlag(ID, Array(12).fill(mild))).toBeUndefined();
});

test("must not fire where the year accumulates: that is the stronger stop, not this caution", () => {
  expect(seasonalFlag(ID, [...Array(11).fill(cold), mild])).toBeUndefined();
});
