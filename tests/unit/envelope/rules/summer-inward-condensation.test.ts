import { expect, test } from "vitest";
import { runSiteCheck } from "~/envelope";
import { batt140, flag, gyp, layer, lib, paint, wall } from "./fixtures";

const ID = "summer-inward-condensation";
// Wet stucco tight on foil-faced foam: the drive condenses on the foil, not on an interior sheet.
const a = wall(
  layer("cladding", "brick-veneer", 101.6),
  layer("water-resistive-barrier", "building-paper-grade-d", 0.5),
  layer("insulation", "polyiso-foil-faced", 25.4),
  layer("sheathing", "osb", 11.1),
  batt140,
  gyp,
  paint,
);

test("inward drive condensing inside (not on an interior sheet): caution — common practice (inward drive)", () => {
  const site = { zone: "2A", summer: { t_c: 32, rh: 75, cladding_t_c: 50 }, indoor: { summer_t_c: 22, summer_rh: 50 } };
  const r = runSiteCheck(a, site, lib);
  if (r.profiles.summer.condensingPlanes.length === 0) throw new Error("fixture should condense in summer");
  expect(flag(a, ID, site)?.severity).toBe("caution");
});

test("must not fire: brick with a vented cavity and no foam in a mild summer", () => {
  const vented = wall(
    layer("cladding", "brick-veneer", 101.6),
    layer("drainage-gap", "vented-air-space", 25),
    layer("water-resistive-barrier", "polymeric-housewrap", 0.2),
    layer("sheathing", "osb", 11.1),
    batt140,
    gyp,
    paint,
  );
  expect(flag(vented, ID, { zone: "5A" })).toBeUndefined();
});
