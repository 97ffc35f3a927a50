import { expect, test } from "vitest";
import { batt140, flag, gyp, layer, paint, wall } from "./fixtures";

const ID = "hot-humid-exterior-foam-under-10pct";
const withEps = (mm: number) =>
  wall(
    layer("cladding", "vinyl-siding", 1),
    layer("insulation", "eps-board", mm),
    layer("sheathing", "osb", 11.1),
    batt140,
    gyp,
    paint,
  );

test("6 mm EPS over R-21 in zone 2A: under 10 % of total R, caution — DOE/PNNL BASC CZ 1–3 note (C)", () => {
  expect(flag(withEps(6), ID, { zone: "2A" })?.severity).toBe("caution");
});

test("must not fire: 25 mm EPS (over 10 %), or the thin foam in zone 5A", () => {
  expect(flag(withEps(25.4), ID, { zone: "2A" })).toBeUndefined();
  expect(flag(withEps(6), ID, { zone: "5A" })).toBeUndefined();
});
