import { expect, test } from "vitest";
import { flag, layer, of } from "./fixtures";

const ID = "foam-crawlspace-no-ignition-barrier";

test("XPS facing a crawl space: caution — IRC 2021 R316.5.4 (C)", () => {
  expect(
    flag(of("crawlspace-wall", layer("structure", "cast-concrete", 200), layer("insulation", "xps-board", 50.8)), ID)
      ?.severity,
  ).toBe("caution");
});

test("foam under a floor: the underside needs the barrier — IRC R316.5.4 (C); R316.5.13 (M, from memory)", () => {
  const floor = of(
    "floor",
    layer("insulation", "closed-cell-spray-foam", 89, { framing: { material: "softwood-lumber", fraction: 0.13 } }),
    layer("subfloor", "wood-subfloor", 19),
  );
  expect(flag(floor, ID, { zone: "3A" })?.title).toMatch(/under the floor/);
});

test("must not fire: a listed ignition-barrier coating over the foam", () => {
  expect(
    flag(
      of(
        "crawlspace-wall",
        layer("structure", "cast-concrete", 200),
        layer("insulation", "xps-board", 50.8),
        layer("thermal-barrier", "ignition-barrier-coating", 0.5),
      ),
      ID,
    ),
  ).toBeUndefined();
});
