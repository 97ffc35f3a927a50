import { expect, test } from "vitest";
import { runSiteCheck } from "~/envelope";
import type { LayerInput } from "~/envelope/types";
import { fixedMaterial, libraryOf } from "./library";

// docs/references.md §7.2 constructed Glaser cases (status D): inside 21 °C / 40 %, outside −10 °C / 80 %,
// films 0.68/0.17 with no vapour resistance; layers painted gypsum (R-0.45, 5 perm), R-21 batt
// (20 perm), 7/16 OSB (R-0.62, 1.0 perm), housewrap (0, 50 perm).
const lib = libraryOf(
  fixedMaterial("housewrap", 0, 50),
  fixedMaterial("osb", 0.62, 1.0, { family: "wood-panel", water_sensitive: true }),
  fixedMaterial("batt", 21, 20, { family: "fibrous-insulation", water_sensitive: true }),
  fixedMaterial("gypsum-painted", 0.45, 5.0, { family: "gypsum" }),
  fixedMaterial("poly", 0, 0.06, { family: "sheet-retarder" }),
  fixedMaterial("xps1", 5, 1.1, { family: "foam-board", foam_plastic: true }),
  fixedMaterial("xps2", 10, 0.55, { family: "foam-board", foam_plastic: true }),
);
const site = { zone: "5A", winter: { t_c: -10, rh: 80 }, indoor: { t_c: 21, rh: 40 } };
const L = (role: string, material: string): LayerInput => ({ role, material, thickness_mm: 10 });
function wall(extra: { poly?: boolean; xps?: "xps1" | "xps2" } = {}) {
  const layers = [
    L("water-resistive-barrier", "housewrap"),
    ...(extra.xps ? [L("insulation", extra.xps)] : []),
    L("sheathing", "osb"),
    L("insulation", "batt"),
    ...(extra.poly ? [L("vapour-retarder", "poly")] : []),
    L("interior-finish", "gypsum-painted"),
  ];
  return runSiteCheck({ kind: "above-grade-wall", layers }, site, lib).profiles.winter;
}

test("G1a: R_tot 22.92 (RSI 4.036) — docs/references.md §7.2 (D)", () => {
  const r = runSiteCheck(
    {
      kind: "above-grade-wall",
      layers: [L("w", "housewrap"), L("s", "osb"), L("insulation", "batt"), L("f", "gypsum-painted")],
    },
    site,
    lib,
  );
  expect(r.thermal.r_ip).toBeCloseTo(22.92, 2);
  expect(r.thermal.rsi).toBeCloseTo(4.036, 3);
});

test("G1a interface table: T, p_sat, straight-line p_v, RH — docs/references.md §7.2 (D)", () => {
  const p = wall();
  const [ext, wrbOsb, osbBatt, battGyp, inside] = p.interfaces;
  expect(inside.t_c).toBeCloseTo(20.08, 2);
  expect(inside.p_sat_pa).toBeCloseTo(2350.5, 0);
  expect(inside.p_v_linear_pa).toBeCloseTo(995.1, 0);
  expect(inside.rh).toBeCloseTo(42.3, 1);
  expect(battGyp.t_c).toBeCloseTo(19.47, 2);
  expect(battGyp.p_sat_pa).toBeCloseTo(2263.3, 0);
  expect(battGyp.p_v_linear_pa).toBeCloseTo(871.1, 0);
  expect(osbBatt.t_c).toBeCloseTo(-8.93, 2);
  expect(osbBatt.p_sat_pa).toBeCloseTo(285.7, 0); // over ice
  expect(osbBatt.p_v_linear_pa).toBeCloseTo(840.1, 0);
  expect((100 * osbBatt.p_v_linear_pa) / osbBatt.p_sat_pa).toBeCloseTo(294, 0);
  expect(wrbOsb.t_c).toBeCloseTo(-9.77, 2);
  expect(wrbOsb.p_sat_pa).toBeCloseTo(265.3, 0);
  expect(wrbOsb.p_v_linear_pa).toBeCloseTo(220.3, 0);
  expect((100 * wrbOsb.p_v_linear_pa) / wrbOsb.p_sat_pa).toBeCloseTo(83.1, 1);
  expect(ext.t_c).toBeGreaterThan(-10);
});

test("G1a: first condensing surface batt/OSB, Glaser rate 13.65 g/(m²·day) — docs/references.md §7.2 (D)", () => {
  const p = wall();
  expect(p.firstCondensingSurface?.interfaceIndex).toBe(2);
  expect(p.condensingPlanes).toHaveLength(1);
  expect(p.rate_g_m2_day).toBeCloseTo(13.65, 2);
  // On the hull the condensing plane sits at saturation.
  expect(p.interfaces[2].p_v_pa).toBeCloseTo(p.interfaces[2].p_sat_pa, 6);
  expect(p.margin_c).toBeLessThan(0);
});

test("G1b: with 6-mil poly inside no condensation; p_v 252.7 Pa vs p_sat 285.7, RH 88.5 % — docs/references.md §7.2 (D)", () => {
  const p = wall({ poly: true });
  expect(p.condensingPlanes).toHaveLength(0);
  expect(p.rate_g_m2_day).toBe(0);
  const osbBatt = p.interfaces[2];
  expect(osbBatt.p_v_pa).toBeCloseTo(252.7, 0);
  expect(osbBatt.p_sat_pa).toBeCloseTo(285.7, 0);
  expect(osbBatt.rh).toBeCloseTo(88.5, 1);
});

test.each([
  ["xps1", -3.57, 453.7, 10.08],
  ["xps2", 0.16, 618.4, 6.73],
] as const)(
  "G1c/G1d: with %s outside the OSB, condensing at batt/OSB at %s °C (p_sat %s), rate %s g/(m²·day) — docs/references.md §7.2 (D)",
  (xps, tc, psat, rate) => {
    const p = wall({ xps });
    const plane = p.firstCondensingSurface;
    expect(plane?.label).toBe("osb / batt");
    expect(plane?.t_c).toBeCloseTo(tc, 2);
    expect(p.interfaces[plane?.interfaceIndex ?? 0].p_sat_pa).toBeCloseTo(psat, 0);
    expect(p.rate_g_m2_day).toBeCloseTo(rate, 2);
  },
);

// JLC "Where does the dew drop" (docs/references.md §7.1, C): indoor 70 °F / 50 %, outdoor 32 °F; sheathing
// inner face at 32 + R_out/R_tot × 38 °F; indoor dew point ≈ 50 °F (psychrolib 50.53 °F, D).
function jlcWall(foamR: number) {
  const jlcLib = libraryOf(
    fixedMaterial("siding", 0.61, 40, { family: "cladding", vented_cladding: true }),
    fixedMaterial("foam", foamR, 1.1 * (5 / foamR), { family: "foam-board", foam_plastic: true }),
    fixedMaterial("sheathing", 1.22, 0.75, { family: "wood-panel", water_sensitive: true }),
    fixedMaterial("cavity", 9.87, 20, { family: "fibrous-insulation", water_sensitive: true }),
    fixedMaterial("gypsum", 0.45, 5, { family: "gypsum" }),
  );
  const layers = [
    L("cladding", "siding"),
    L("insulation", "foam"),
    L("sheathing", "sheathing"),
    L("insulation", "cavity"),
    L("interior-finish", "gypsum"),
  ];
  return runSiteCheck(
    { kind: "above-grade-wall", layers },
    { zone: "5A", winter: { t_c: 0, rh: 80 }, indoor: { t_c: ((70 - 32) * 5) / 9, rh: 50 } },
    jlcLib,
  );
}

test("JLC wall A (1 in foam, R-7 of R-18 outboard): sheathing at 46.78 °F, below the indoor dew point, flagged — JLC 'Where does the dew drop' (docs/references.md §7.1, C)", () => {
  const r = jlcWall(5);
  expect(r.thermal.r_ip).toBeCloseTo(18, 6);
  const sheathingInner = r.profiles.winter.interfaces[3];
  expect(Math.abs(sheathingInner.t_f - 46.78)).toBeLessThan(0.1);
  expect(r.profiles.winter.marginSurface).toBe("sheathing / cavity");
  expect(r.profiles.winter.margin_c).toBeLessThan(0);
  expect(r.flags.map((f) => f.id)).toContain("winter-condensing-surface");
});

test("JLC wall B (2 in foam, R-14 of R-25 outboard): sheathing at 53.28 °F, above the dew point, not flagged — JLC (docs/references.md §7.1, C)", () => {
  const r = jlcWall(12);
  expect(r.thermal.r_ip).toBeCloseTo(25, 6);
  const sheathingInner = r.profiles.winter.interfaces[3];
  expect(Math.abs(sheathingInner.t_f - 53.28)).toBeLessThan(0.1);
  expect(r.profiles.winter.margin_c).toBeGreaterThan(0);
  expect(r.profiles.winter.condensingPlanes).toHaveLength(0);
  expect(r.flags.map((f) => f.id)).not.toContain("winter-condensing-surface");
});

test("JLC indoor dew point 70 °F / 50 % ≈ 50 °F (chart; psychrolib 50.53 °F) — docs/references.md §7.1 (C) / §1.4 (D)", () => {
  const dp = jlcWall(5).profiles.winter.sourceDewPoint_c;
  expect((dp * 9) / 5 + 32).toBeCloseTo(50.53, 1);
});
