import { expect, test } from "vitest";
import { flag, gyp, layer, of } from "./fixtures";

const ID = "spray-foam-curing-odour";

test("closed-cell foam sprayed under a roof deck from inside: curing odour note — common practice", () => {
  const roof = of(
    "roof",
    layer("roofing", "asphalt-shingles", 6),
    layer("sheathing", "plywood", 15.9),
    layer("insulation", "closed-cell-spray-foam", 140, { framing: { material: "softwood-lumber", fraction: 0.1 } }),
    gyp,
  );
  expect(flag(roof, ID, { zone: "4A" })?.severity).toBe("note");
});

test("must not fire: no spray foam in the assembly", () => {
  expect(
    flag(
      of("basement-wall", layer("structure", "cast-concrete", 200), layer("insulation", "xps-board", 50.8), gyp),
      ID,
    ),
  ).toBeUndefined();
});
