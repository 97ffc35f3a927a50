import { expect, test } from "vitest";
import { runSiteCheck } from "~/envelope";
import { cold, mild, seasonalFlag } from "./seasonal-fixtures";
import { lib } from "./fixtures";

const ID = "seasonal-accumulation";

test("eleven cold months and one mild one: the two-layer wall keeps water after the year, caution (the monthly method overstates; it does not stop) — ISO 13788:2012 §6 (hand-derived rates in monthly-balance.test.ts, D)", () => {
  const f = seasonalFlag(ID, [...Array(11).fill(cold), mild]);
  expect(f?.severity).toBe("caution");
  expect(f?.explanation).toMatch(/still there after twelve months/);
});

test("must not fire: two cold months, then ten mild ones dry it out by April (hand-derived, D)", () => {
  expect(seasonalFlag(ID, [cold, cold, ...Array(10).fill(mild)])).toBeUndefined();
});

test("must not fire when the caller asked for the design day only (no balance to judge)", () => {
  const wall = {
    kind: "above-grade-wall" as const,
    layers: [{ role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 }],
  };
  expect(runSiteCheck(wall, { zone: "7" }, lib, { seasonal: false }).flags.some((f) => f.id === ID)).toBe(false);
});
