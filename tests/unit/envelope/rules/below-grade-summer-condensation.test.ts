import { expect, test } from "vitest";
import { flag, gyp, layer, of } from "./fixtures";

const ID = "below-grade-summer-condensation";

test("humid basement air diffusing out to cool concrete through mineral wool: note — steady-state dew-point method (M); common practice", () => {
  const a = of(
    "basement-wall",
    layer("soil-side-protection", "bituminous-dampproofing", 1.5),
    layer("structure", "cast-concrete", 200),
    layer("insulation", "mineral-wool-board", 50.8),
    gyp,
  );
  expect(flag(a, ID, { zone: "4A", ground_t_c: 12, indoor: { summer_t_c: 24, summer_rh: 60 } })?.severity).toBe("note");
});

test("must not fire: an above-grade wall (its summer case is inward drive, not the ground)", () => {
  const a = of(
    "above-grade-wall",
    layer("cladding", "vinyl-siding", 1),
    layer("sheathing", "osb", 11.1),
    layer("insulation", "mineral-wool-board", 50.8),
    gyp,
  );
  expect(flag(a, ID, { zone: "4A" })).toBeUndefined();
});
