import { expect, test } from "vitest";
import { batt89, flag, gyp, layer, of, paint } from "./fixtures";

const ID = "below-grade-upper-wall-condensation";

test("batts against the top of a basement wall in zone 6A: the above-grade band condenses, caution — steady-state dew-point method (M); common practice", () => {
  const a = of(
    "basement-wall",
    layer("soil-side-protection", "bituminous-dampproofing", 1.5),
    layer("structure", "cast-concrete", 200),
    batt89,
    gyp,
    paint,
  );
  const f = flag(a, ID, { zone: "6A" });
  expect(f?.severity).toBe("caution");
  expect(f?.explanation).toMatch(/above grade|below grade/);
});

test("must not fire: exterior foam keeps the concrete warm (foam outboard, nothing to condense on inside)", () => {
  const a = of(
    "basement-wall",
    layer("drainage-gap", "dimpled-drainage-mat", 8),
    layer("insulation", "xps-board", 76.2),
    layer("soil-side-protection", "bituminous-dampproofing", 1.5),
    layer("structure", "cast-concrete", 200),
    paint,
  );
  expect(flag(a, ID, { zone: "6A" })).toBeUndefined();
});

test("taped XPS against the concrete: the back of the foam may collect a little on the design day, a note, not a caution — common practice (foam and concrete tolerate it)", () => {
  const a = of(
    "basement-wall",
    layer("soil-side-protection", "bituminous-dampproofing", 1.5),
    layer("structure", "cast-concrete", 200),
    layer("insulation", "xps-board", 50.8, { joints: "taped" }),
    gyp,
  );
  const f = flag(a, ID, { zone: "6A" });
  expect(f === undefined || f.severity === "note").toBe(true);
});
