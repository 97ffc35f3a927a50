import { expect, test } from "vitest";
import { batt140, flag, gyp, layer, paint, wall } from "./fixtures";

const ID = "foam-against-wrb-no-gap";
const tight = wall(
  layer("cladding", "wood-bevel-siding", 12.7),
  layer("water-resistive-barrier", "polymeric-housewrap", 0.2),
  layer("insulation", "xps-board", 50.8),
  layer("sheathing", "osb", 11.1),
  batt140,
  gyp,
  paint,
);

test("foam tight to housewrap behind absorptive siding, no gap: caution — common practice", () => {
  expect(flag(tight, ID)?.severity).toBe("caution");
});

test("must not fire: a vented gap outboard of the foam", () => {
  expect(
    flag(wall(tight.layers[0], layer("drainage-gap", "vented-air-space", 19), ...tight.layers.slice(1)), ID),
  ).toBeUndefined();
});
