import { expect, test } from "vitest";
import { runSiteCheck } from "~/envelope";
import type { LayerInput } from "~/envelope/types";
import { fixedMaterial, libraryOf } from "./library";

// The docs/references.md §7.2 wall (D) with its R-21 batt framed: studs R-4.375 (R-1.25/in × 3.5 in, common
// practice) at 25 %. Inside 21 °C / 40 %, outside −10 °C / 80 %, films.
const lib = libraryOf(
  fixedMaterial("housewrap", 0, 50),
  fixedMaterial("osb", 0.62, 1.0, { family: "wood-panel", water_sensitive: true }),
  fixedMaterial("batt", 21, 20, { family: "fibrous-insulation", water_sensitive: true }),
  fixedMaterial("stud", 4.375, 2, { family: "lumber", water_sensitive: true }),
  fixedMaterial("gypsum-painted", 0.45, 5.0, { family: "gypsum" }),
);
const L = (role: string, material: string, extra: Partial<LayerInput> = {}): LayerInput => ({
  role,
  material,
  thickness_mm: 10,
  ...extra,
});
const wall = {
  kind: "above-grade-wall" as const,
  layers: [
    L("water-resistive-barrier", "housewrap"),
    L("sheathing", "osb"),
    L("insulation", "batt", { framing: { material: "stud", fraction: 0.25 } }),
    L("interior-finish", "gypsum-painted"),
  ],
};
const site = { zone: "5A", winter: { t_c: -10, rh: 80 }, indoor: { t_c: 21, rh: 40 } };

test("winter profile runs through the clear cavity: OSB inner face −8.93 °C (hand derivation)", () => {
  // Clear cavity: R_tot = 0.17 + 0 + 0.62 + 21 + 0.45 + 0.68 = 22.92; T = −10 + 31 × (0.17 + 0.62) / 22.92 = −8.931 °C.
  // (The framing-averaged layer, 1 / (0.75/21 + 0.25/4.375) = R-10.77, would put it at −8.07 °C.)
  const w = runSiteCheck(wall, site, lib).profiles.winter;
  expect(w.path).toBe("clear-cavity");
  expect(w.interfaces[2].t_c).toBeCloseTo(-8.931, 2);
  // Batt / gypsum: −10 + 31 × (0.79 + 21) / 22.92 = 19.472 °C.
  expect(w.interfaces[3].t_c).toBeCloseTo(19.472, 2);
});

test("the stud path is reported beside it: OSB inner face −6.11 °C (hand derivation)", () => {
  // Through the stud: R_tot = 0.17 + 0.62 + 4.375 + 0.45 + 0.68 = 6.295; T = −10 + 31 × 0.79 / 6.295 = −6.110 °C.
  const w = runSiteCheck(wall, site, lib).profiles.winter;
  expect(w.studPath?.interfaces_t_c[2]).toBeCloseTo(-6.11, 2);
  expect(w.studPath?.margin_c).toBeGreaterThan(w.margin_c);
});

test("the clear-cavity vapour path passes vapour through the fill alone (20 perm), not the area-weighted layer", () => {
  const w = runSiteCheck(wall, site, lib).profiles.winter;
  expect(w.vapourLayers[2].case_perm_ng).toBeCloseTo(w.vapourLayers[2].perm_ng / (0.75 + (0.25 * 2) / 20), 6);
});

test("the summer profile runs through the clear cavity too", () => {
  const s = runSiteCheck(
    wall,
    { ...site, summer: { t_c: 30, rh: 70 }, indoor: { ...site.indoor, summer_t_c: 24, summer_rh: 50 } },
    lib,
  ).profiles.summer;
  expect(s.path).toBe("clear-cavity");
  // Summer films out, R-0.68 in: R_tot = 0.25 + 0.62 + 21 + 0.45 + 0.68 = 23.00;
  // OSB inner face: 30 − 6 × (0.25 + 0.62) / 23.00 = 29.773 °C (hand derivation).
  expect(s.interfaces[2].t_c).toBeCloseTo(29.773, 2);
});
