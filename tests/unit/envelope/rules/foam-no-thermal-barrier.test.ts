import { expect, test } from "vitest";
import { flag, gyp, layer, of } from "./fixtures";

const ID = "foam-no-thermal-barrier";

test("XPS left bare on a basement wall: stop — IRC 2021 R316.4 (C2)", () => {
  expect(
    flag(of("basement-wall", layer("structure", "cast-concrete", 200), layer("insulation", "xps-board", 50.8)), ID)
      ?.severity,
  ).toBe("stop");
});

test("must not fire: 1/2 in gypsum inboard of the foam", () => {
  expect(
    flag(
      of("basement-wall", layer("structure", "cast-concrete", 200), layer("insulation", "xps-board", 50.8), gyp),
      ID,
    ),
  ).toBeUndefined();
});
