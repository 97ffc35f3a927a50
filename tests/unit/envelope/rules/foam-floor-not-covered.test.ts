import { expect, test } from "vitest";
import { flag, layer, of } from "./fixtures";

const ID = "foam-floor-not-covered";

test("foam in a floor with nothing above it: stop — IRC 2021 R316.5.13 (M, from memory), R316.4 (C2)", () => {
  expect(
    flag(of("floor", layer("subfloor", "wood-subfloor", 19), layer("insulation", "xps-board", 50.8)), ID)?.severity,
  ).toBe("stop");
});

test("must not fire: a 3/4 in subfloor over the foam", () => {
  expect(
    flag(of("floor", layer("insulation", "xps-board", 50.8), layer("subfloor", "wood-subfloor", 19)), ID),
  ).toBeUndefined();
});
