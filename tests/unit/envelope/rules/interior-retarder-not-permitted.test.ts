import { expect, test } from "vitest";
import { batt140, flag, gyp, layer, paint, wall } from "./fixtures";

const ID = "interior-retarder-not-permitted";
const withInterior = (material: string) =>
  wall(
    layer("cladding", "vinyl-siding", 1),
    layer("sheathing", "osb", 11.1),
    batt140,
    layer("vapour-retarder", material, 0.15),
    gyp,
    paint,
  );

test("6-mil poly inside in zone 2A: Class I not permitted, stop — IRC 2021 Table R702.7(2) (M, from memory)", () => {
  expect(flag(withInterior("polyethylene-sheet-6mil"), ID, { zone: "2A" })?.severity).toBe("stop");
});

test("must not fire: kraft facing (Class II) in zone 6A", () => {
  expect(flag(withInterior("kraft-facing"), ID, { zone: "6A" })).toBeUndefined();
});
