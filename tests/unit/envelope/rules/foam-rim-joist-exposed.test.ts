import { expect, test } from "vitest";
import { flag, layer, of } from "./fixtures";

const ID = "foam-rim-joist-exposed";
const rim = (mm: number) =>
  of(
    "rim-joist",
    layer("sheathing", "osb", 11.1),
    layer("structure", "softwood-lumber", 38),
    layer("insulation", "closed-cell-spray-foam", mm),
  );

test("75 mm of exposed spray foam at a rim joist: note — IRC 2018 R316.5.11 (C)", () => {
  expect(flag(rim(75), ID)?.severity).toBe("note");
});

test("must not fire: over 3¼ in (then the thermal-barrier stop applies instead)", () => {
  expect(flag(rim(100), ID)).toBeUndefined();
  expect(flag(rim(100), "foam-no-thermal-barrier")?.severity).toBe("stop");
});
