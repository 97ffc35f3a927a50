import { expect, test } from "vitest";
import { batt89, flag, gyp, layer, of } from "./fixtures";

const ID = "below-grade-water-sensitive-insulation";

test("fibreglass batts against a basement wall: stop — common practice (docs/references.md §8, M, from memory)", () => {
  expect(flag(of("basement-wall", layer("structure", "cast-concrete", 200), batt89, gyp), ID)?.severity).toBe("stop");
});

test("must not fire: a mineral-wool stud wall inside taped XPS on the concrete (the foam keeps the concrete's moisture off it)", () => {
  const a = of(
    "basement-wall",
    layer("soil-side-protection", "bituminous-dampproofing", 1.5),
    layer("structure", "cast-concrete", 200),
    layer("insulation", "xps-board", 50.8, { joints: "taped" }),
    layer("insulation", "mineral-wool-batt", 88.9, { framing: { material: "softwood-lumber", fraction: 0.2 } }),
    gyp,
  );
  expect(flag(a, ID)).toBeUndefined();
});
