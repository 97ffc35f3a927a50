import { expect, test } from "vitest";
import { runSiteCheck } from "~/envelope";
import type { LayerInput } from "~/envelope/types";
import { fixedMaterial, libraryOf } from "./library";

const lib = libraryOf(
  fixedMaterial("concrete", 0.64, 1.5, { family: "concrete" }),
  fixedMaterial("batt", 13, 20, { family: "fibrous-insulation", water_sensitive: true }),
  fixedMaterial("gypsum-painted", 0.45, 5.0, { family: "gypsum" }),
);
const L = (role: string, material: string): LayerInput => ({ role, material, thickness_mm: 10 });
const wall = {
  kind: "basement-wall" as const,
  layers: [L("structure", "concrete"), L("insulation", "batt"), L("interior-finish", "gypsum-painted")],
};
const site = { zone: "6A", winter: { t_c: -20, rh: 80 }, indoor: { t_c: 20, rh: 40 }, ground_t_c: 10 };

test("a basement wall is checked above grade (outdoor air, film R-0.17): concrete / batt at −17.83 °C (hand derivation)", () => {
  // R_tot = 0.17 + 0.64 + 13 + 0.45 + 0.68 = 14.94; T = −20 + 40 × (0.17 + 0.64) / 14.94 = −17.831 °C.
  const r = runSiteCheck(wall, site, lib);
  const above = r.profiles.upperWall?.aboveGrade;
  expect(above?.interfaces[1].t_c).toBeCloseTo(-17.831, 2);
  expect(above?.condensingPlanes.length).toBeGreaterThan(0);
});

test("and just below grade against frost-depth soil at 0 °C: concrete / batt at 0.87 °C (hand derivation)", () => {
  // No soil-side film: R_tot = 0.64 + 13 + 0.45 + 0.68 = 14.77; T = 0 + 20 × 0.64 / 14.77 = 0.867 °C.
  const frost = runSiteCheck(wall, site, lib).profiles.upperWall?.frostDepth;
  expect(frost?.interfaces[1].t_c).toBeCloseTo(0.867, 2);
  expect(frost?.exterior.label).toMatch(/frost depth/);
});

test("both are reported beside the deep-ground case, and the top of the wall is flagged where deep ground is not", () => {
  const r = runSiteCheck(wall, site, lib);
  expect(r.profiles.winter.exterior.t_c).toBe(10);
  expect(r.flags.map((f) => f.id)).toContain("below-grade-upper-wall-condensation");
  expect(runSiteCheck({ kind: "above-grade-wall", layers: wall.layers }, site, lib).profiles.upperWall).toBeNull();
});
