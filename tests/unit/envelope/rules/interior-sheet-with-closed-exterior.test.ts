import { expect, test } from "vitest";
import { batt140, flag, gyp, layer, paint, wall } from "./fixtures";

const sandwich = wall(
  layer("cladding", "vinyl-siding", 1),
  layer("insulation", "polyiso-foil-faced", 25.4),
  layer("sheathing", "osb", 11.1),
  batt140,
  layer("vapour-retarder", "polyethylene-sheet-6mil", 0.15),
  gyp,
  paint,
);
const ID = "interior-sheet-with-closed-exterior";

test("poly inside and foil-faced foam outside in 3A: stop, naming both remedies — IRC 2021 Table R702.7(2) (M, from memory); common practice", () => {
  const f = flag(sandwich, ID, { zone: "3A" });
  expect(f?.severity).toBe("stop");
  expect(f?.explanation).toMatch(/variable-permeance retarder/);
  expect(f?.explanation).toMatch(/Class III/);
});

test("the same wall in humid 5A and 6A (inward drive in summer) is caught too: caution, the code permits Class I there — common practice", () => {
  for (const zone of ["5A", "6A"]) expect(flag(sandwich, ID, { zone })?.severity, zone).toBe("caution");
});

test("the same wall in marine 4C and 5C is caught — common practice (inward drive in marine climates)", () => {
  expect(flag(sandwich, ID, { zone: "4C" })?.severity).toBe("caution");
  expect(flag(sandwich, ID, { zone: "5C" })).toBeDefined();
});

test("must not fire: dry 5B (no humid or marine summer), or no interior sheet", () => {
  expect(flag(sandwich, ID, { zone: "5B" })).toBeUndefined();
  const noSheet = wall(...sandwich.layers.filter((l) => l.material !== "polyethylene-sheet-6mil"));
  expect(flag(noSheet, ID, { zone: "3A" })).toBeUndefined();
});
