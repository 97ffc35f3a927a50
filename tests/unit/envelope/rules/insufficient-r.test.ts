import { expect, test } from "vitest";
import { batt140, batt89, flag, gyp, layer, paint, wall } from "./fixtures";

const ID = "insufficient-r";

test("2x4 R-13 with no continuous insulation in zone 6A: below the 20+5ci row, caution — IECC 2021 Table R402.1.3 (C)", () => {
  const f = flag(wall(layer("cladding", "vinyl-siding", 1), layer("sheathing", "osb", 11.1), batt89, gyp, paint), ID, {
    zone: "6A",
  });
  expect(f?.severity).toBe("caution");
  expect(f?.id).toMatch(/^insufficient-r-iecc/);
});

test("must not fire: 2x6 R-21 in zone 3A (row R-20)", () => {
  expect(
    flag(wall(layer("cladding", "vinyl-siding", 1), layer("sheathing", "osb", 11.1), batt140, gyp, paint), ID, {
      zone: "3A",
    }),
  ).toBeUndefined();
});
