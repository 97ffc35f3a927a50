import { expect, test } from "vitest";
import { batt140, flag, gyp, layer, paint, wall } from "./fixtures";

const ID = "summer-condensation-interior-sheet";
const brickWith = (retarder: string) =>
  wall(
    layer("cladding", "brick-veneer", 101.6),
    layer("water-resistive-barrier", "building-paper-grade-d", 0.5),
    layer("sheathing", "fibreboard-sheathing", 12.7),
    batt140,
    layer("vapour-retarder", retarder, 0.15),
    gyp,
    paint,
  );

test("sun-warmed wet brick drives vapour onto interior poly: stop — common practice (inward drive behind reservoir cladding)", () => {
  expect(flag(brickWith("polyethylene-sheet-6mil"), ID, { zone: "5A", summer: { t_c: 30, rh: 70 } })?.severity).toBe(
    "stop",
  );
});

test("must not fire: a vented cavity behind the brick breaks the drive", () => {
  const a = brickWith("polyethylene-sheet-6mil");
  const vented = wall(a.layers[0], layer("drainage-gap", "vented-air-space", 25), ...a.layers.slice(1));
  expect(flag(vented, ID, { zone: "5A", summer: { t_c: 30, rh: 70 } })).toBeUndefined();
});
