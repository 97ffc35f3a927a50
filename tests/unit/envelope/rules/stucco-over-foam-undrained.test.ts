import { expect, test } from "vitest";
import { batt89, flag, gyp, layer, paint, wall } from "./fixtures";

const ID = "stucco-over-foam-undrained";
const barrier = wall(
  layer("cladding", "cement-stucco", 22),
  layer("insulation", "eps-board", 25.4),
  layer("water-resistive-barrier", "polymeric-housewrap", 0.2),
  layer("sheathing", "osb", 11.1),
  batt89,
  gyp,
  paint,
);

test("stucco on EPS on one housewrap with no drainage space: named a face-sealed wall, stop — IRC 2021 R703.7.3 (M, from memory); common practice", () => {
  const f = flag(barrier, ID, { zone: "3B" });
  expect(f?.severity).toBe("stop");
  expect(f?.title).toMatch(/face-sealed/);
  // It replaces the generic foam-on-WRB note rather than repeating it.
  expect(flag(barrier, "foam-against-wrb-no-gap", { zone: "3B" })).toBeUndefined();
});

test("must not fire: a drainage mat between stucco and foam", () => {
  const drained = wall(barrier.layers[0], layer("drainage-gap", "dimpled-drainage-mat", 6), ...barrier.layers.slice(1));
  expect(flag(drained, ID, { zone: "3B" })).toBeUndefined();
});

test("must not fire: stucco on a block wall insulated with foam on the inside (the foam is not behind the stucco)", () => {
  const block = wall(
    layer("cladding", "cement-stucco", 22),
    layer("structure", "hollow-cmu", 194),
    layer("insulation", "xps-board", 25.4),
    gyp,
    paint,
  );
  expect(flag(block, ID, { zone: "2A" })).toBeUndefined();
});
