import { expect, test } from "vitest";
import { flag, gyp, layer, of } from "./fixtures";

const ID = "solvent-adhesive-on-polystyrene";

test("EPS glued with solvent-based adhesive: stop — common practice (foam makers' instructions)", () => {
  const a = of(
    "basement-wall",
    layer("structure", "cast-concrete", 200),
    layer("insulation", "eps-board", 50.8, { adhesive: "solvent-based" }),
    gyp,
  );
  expect(flag(a, ID)?.severity).toBe("stop");
});

test("must not fire: water-based adhesive, or solvent-based on polyiso (not solvent-sensitive)", () => {
  expect(
    flag(
      of(
        "basement-wall",
        layer("structure", "cast-concrete", 200),
        layer("insulation", "eps-board", 50.8, { adhesive: "water-based" }),
        gyp,
      ),
      ID,
    ),
  ).toBeUndefined();
  expect(
    flag(
      of(
        "basement-wall",
        layer("structure", "cast-concrete", 200),
        layer("insulation", "polyiso-foil-faced", 50.8, { adhesive: "solvent-based" }),
        gyp,
      ),
      ID,
    ),
  ).toBeUndefined();
});
