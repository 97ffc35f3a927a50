import { expect, test } from "vitest";
import { flag, gyp, layer, of } from "./fixtures";

const ID = "basement-class-i-interior";

test("poly on the inside of a basement wall: caution — IRC 2021 R702.7 exception (C2)", () => {
  expect(
    flag(
      of(
        "basement-wall",
        layer("structure", "cast-concrete", 200),
        layer("insulation", "xps-board", 76.2),
        layer("vapour-retarder", "polyethylene-sheet-6mil", 0.15),
        gyp,
      ),
      ID,
    )?.severity,
  ).toBe("caution");
});

test("must not fire: foam against the concrete and an open interior", () => {
  expect(
    flag(
      of("basement-wall", layer("structure", "cast-concrete", 200), layer("insulation", "xps-board", 76.2), gyp),
      ID,
    ),
  ).toBeUndefined();
});
