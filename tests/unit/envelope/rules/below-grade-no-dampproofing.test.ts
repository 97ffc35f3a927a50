import { expect, test } from "vitest";
import { flag, gyp, layer, of } from "./fixtures";

const ID = "below-grade-no-dampproofing";

test("bare concrete basement wall against soil: stop — IRC 2021 R406.1 (M, from memory)", () => {
  expect(
    flag(of("basement-wall", layer("structure", "cast-concrete", 200), layer("insulation", "xps-board", 50.8), gyp), ID)
      ?.severity,
  ).toBe("stop");
});

test("ICF wall with only taped seams: needs a fully adhered, foam-compatible membrane and a drainage layer — common practice (ICF makers' instructions)", () => {
  const icf = of(
    "basement-wall",
    layer("insulation", "icf-eps-form", 66.7, { joints: "taped" }),
    layer("structure", "cast-concrete", 152),
    layer("insulation", "icf-eps-form", 66.7),
    gyp,
  );
  const f = flag(icf, ID);
  expect(f?.severity).toBe("stop");
  expect(f?.explanation).toMatch(/fully adhered/);
  expect(f?.explanation).toMatch(/drainage/);
});

test("must not fire: dampproofing outboard of the concrete", () => {
  expect(
    flag(
      of(
        "basement-wall",
        layer("drainage-gap", "dimpled-drainage-mat", 8),
        layer("soil-side-protection", "bituminous-dampproofing", 1.5),
        layer("structure", "cast-concrete", 200),
        layer("insulation", "xps-board", 50.8),
        gyp,
      ),
      ID,
    ),
  ).toBeUndefined();
});
