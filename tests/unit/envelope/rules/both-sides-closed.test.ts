import { expect, test } from "vitest";
import { batt140, flag, gyp, layer, paint, wall } from "./fixtures";

const ID = "both-sides-closed";
const closed = wall(
  layer("cladding", "vinyl-siding", 1),
  layer("insulation", "polyiso-foil-faced", 25.4),
  layer("sheathing", "osb", 11.1),
  batt140,
  layer("vapour-retarder", "polyethylene-sheet-6mil", 0.15),
  gyp,
  paint,
);

test("foil-faced foam outside and poly inside in dry 6B: closed on both sides, caution — common practice", () => {
  expect(flag(closed, ID, { zone: "6B" })?.severity).toBe("caution");
});

test("must not fire: where the double-vapour-barrier flag already says it (3A), or with a latex-paint interior", () => {
  expect(flag(closed, ID, { zone: "3A" })).toBeUndefined();
  const open = wall(...closed.layers.filter((l) => l.material !== "polyethylene-sheet-6mil"));
  expect(flag(open, ID, { zone: "6B" })).toBeUndefined();
});
