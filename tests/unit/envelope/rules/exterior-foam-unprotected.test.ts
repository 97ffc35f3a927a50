import { expect, test } from "vitest";
import { flag, gyp, layer, of } from "./fixtures";

const ID = "exterior-foam-unprotected";
const bare = of(
  "basement-wall",
  layer("insulation", "xps-board", 50.8),
  layer("soil-side-protection", "bituminous-dampproofing", 1.5),
  layer("structure", "cast-concrete", 200),
  gyp,
);

test("XPS outside a basement wall with no cover: caution in every zone, not only warm ones — IRC R318.4 (M, from memory); common practice (UV, impact, insects)", () => {
  for (const zone of ["3A", "5A", "7"]) expect(flag(bare, ID, { zone })?.severity, zone).toBe("caution");
  expect(flag(bare, ID, { zone: "7" })?.explanation).toMatch(/sunlight/);
});

test("must not fire: a protection layer outboard of the foam", () => {
  expect(
    flag(of("basement-wall", layer("soil-side-protection", "cementitious-parge-coat", 6), ...bare.layers), ID, {
      zone: "5A",
    }),
  ).toBeUndefined();
});
