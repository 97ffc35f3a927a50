import { expect, test } from "vitest";
import { batt140, batt89, flag, gyp, layer, paint, wall } from "./fixtures";

const ID = "winter-condensing-surface";

test("2x6 R-21 with only latex paint in zone 6A: condensation at the sheathing, caution — steady-state dew-point method (ASHRAE HoF ch.25, M)", () => {
  const open = wall(
    layer("cladding", "vinyl-siding", 1),
    layer("water-resistive-barrier", "polymeric-housewrap", 0.2),
    layer("sheathing", "osb", 11.1),
    batt140,
    gyp,
    paint,
  );
  const f = flag(open, ID, { zone: "6A" });
  expect(f?.severity).toBe("caution");
  expect(f?.explanation).toMatch(/clear cavity/);
});

test("must not fire: 100 mm of exterior XPS over a 2x4 keeps the sheathing above the indoor dew point in zone 4A", () => {
  const warm = wall(
    layer("cladding", "vinyl-siding", 1),
    layer("insulation", "xps-board", 101.6),
    layer("sheathing", "osb", 11.1),
    batt89,
    gyp,
    paint,
  );
  expect(flag(warm, ID, { zone: "4A" })).toBeUndefined();
});
