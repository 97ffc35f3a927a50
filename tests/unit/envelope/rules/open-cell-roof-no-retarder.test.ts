import { expect, test } from "vitest";
import { flag, gyp, layer, of, paint } from "./fixtures";

const ID = "open-cell-roof-no-retarder";
const roof = of(
  "roof",
  layer("roofing", "asphalt-shingles", 6),
  layer("underlayment", "synthetic-roof-underlayment", 0.5),
  layer("sheathing", "plywood", 15.9),
  layer("insulation", "open-cell-spray-foam", 241, { framing: { material: "softwood-lumber", fraction: 0.1 } }),
  gyp,
  paint,
);

test("open-cell foam under a zone 6A deck with latex paint: stop — IRC 2021 R806.5 (M, from memory)", () => {
  expect(flag(roof, ID, { zone: "6A" })?.severity).toBe("stop");
});

test("must not fire: with a vapour-retarder primer (Class II)", () => {
  const primed = of("roof", ...roof.layers.slice(0, 5), layer("interior-finish", "vapour-retarder-primer", 0.1));
  expect(flag(primed, ID, { zone: "6A" })).toBeUndefined();
});
