import { expect, test } from "vitest";
import { batt140, flag, gyp, layer, paint, wall } from "./fixtures";

const ID = "exterior-foam-too-thin-for-class-iii";
const withFoam = (mm: number) =>
  wall(
    layer("cladding", "fibre-cement-lap-siding", 8),
    layer("insulation", "polyiso-foil-faced", mm),
    layer("sheathing", "osb", 11.1),
    batt140,
    gyp,
    paint,
  );

test("2x6 with 25 mm polyiso (≈ R-6) and latex paint in zone 5: below the R-7.5 row, stop — IRC 2021 Table R702.7(3) (C2); fibre-cement lap siding is not vented cladding", () => {
  expect(flag(withFoam(25.4), ID, { zone: "5A" })?.severity).toBe("stop");
});

test("must not fire: 50 mm of polyiso (≈ R-12)", () => {
  expect(flag(withFoam(50.8), ID, { zone: "5A" })).toBeUndefined();
});
