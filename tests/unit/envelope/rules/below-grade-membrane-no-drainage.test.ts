import { expect, test } from "vitest";
import { flag, gyp, layer, of } from "./fixtures";

const ID = "below-grade-membrane-no-drainage";
const undrained = of(
  "basement-wall",
  layer("soil-side-protection", "bituminous-dampproofing", 1),
  layer("structure", "cast-concrete", 200),
  layer("insulation", "xps-board", 76.2),
  gyp,
);

test("dampproofing with nothing draining it: caution — IRC R405/R406 (M, from memory); common practice", () => {
  expect(flag(undrained, ID)?.severity).toBe("caution");
});

test("must not fire: a dimpled drainage mat outboard", () => {
  expect(
    flag(of("basement-wall", layer("drainage-gap", "dimpled-drainage-mat", 8), ...undrained.layers), ID),
  ).toBeUndefined();
});
