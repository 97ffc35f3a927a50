import { expect, test } from "vitest";
import { runSiteCheck } from "~/envelope";
import type { Material } from "~/envelope/material-schema";
import type { LayerInput } from "~/envelope/types";
import { permeanceAtRh } from "~/envelope/vapour";
import { fixedMaterial, libraryOf } from "./library";

// The docs/references.md §7.2 wall (D), which condenses at the OSB in winter, with a humidity-dependent
// retarder inboard of the batt: 1 perm at 25 % mean RH, 20 perm at 75 % (a variable-permeance
// membrane's shape, docs/references.md §5.2, M).
const vr: Material = {
  ...fixedMaterial("vr", 0, 1),
  vapour: {
    permeance_ng: 57.2,
    curve: [
      [25, 57.2],
      [75, 1144],
    ],
    source: "fixture, D",
  },
};
const lib = libraryOf(
  fixedMaterial("housewrap", 0, 50),
  fixedMaterial("osb", 0.62, 1.0, { family: "wood-panel", water_sensitive: true }),
  fixedMaterial("batt", 21, 20, { family: "fibrous-insulation", water_sensitive: true }),
  vr,
  fixedMaterial("gypsum-painted", 0.45, 5.0, { family: "gypsum" }),
);
const L = (role: string, material: string): LayerInput => ({ role, material, thickness_mm: 10 });
const layers = [
  L("water-resistive-barrier", "housewrap"),
  L("sheathing", "osb"),
  L("insulation", "batt"),
  L("vapour-retarder", "vr"),
  L("interior-finish", "gypsum-painted"),
];
const site = { zone: "5A", winter: { t_c: -10, rh: 80 }, indoor: { t_c: 21, rh: 50 } };

const meanRh = (a: number, b: number) => (Math.min(100, a) + Math.min(100, b)) / 2;

test("the retarder's permeance is the one at the mean RH of its faces on the condensation-corrected profile (fixed point, 0.5 %)", () => {
  const w = runSiteCheck({ kind: "above-grade-wall", layers }, site, lib).profiles.winter;
  expect(w.condensingPlanes.length).toBeGreaterThan(0);
  const [outer, inner] = [w.interfaces[3], w.interfaces[4]];
  const atCorrected = permeanceAtRh(vr, 10, meanRh(outer.rh, inner.rh));
  expect(Math.abs(w.vapourLayers[3].case_perm_ng - atCorrected) / atCorrected).toBeLessThan(0.005);
  // On the straight (uncondensed) line the same layer would read a different permeance: the
  // correction matters here.
  const atLinear = permeanceAtRh(
    vr,
    10,
    meanRh((100 * outer.p_v_linear_pa) / outer.p_sat_pa, (100 * inner.p_v_linear_pa) / inner.p_sat_pa),
  );
  expect(Math.abs(atLinear - atCorrected) / atCorrected).toBeGreaterThan(0.02);
});

test("the condensation rate is consistent with the permeances reported (Glaser flows, docs/references.md §7.2 method)", () => {
  const w = runSiteCheck({ kind: "above-grade-wall", layers }, site, lib).profiles.winter;
  // Inflow from the inside to the OSB plane through batt, retarder, gypsum in series at the case permeances.
  const z = [2, 3, 4].reduce((s, i) => s + 1 / (w.vapourLayers[i].case_perm_ng * 1e-12), 0);
  const inflow = (w.interior.p_v_pa - w.interfaces[2].p_sat_pa) / z;
  const zOut = [0, 1].reduce((s, i) => s + 1 / (w.vapourLayers[i].case_perm_ng * 1e-12), 0);
  const outflow = (w.interfaces[2].p_sat_pa - w.exterior.p_v_pa) / zOut;
  expect(w.rate_g_m2_day).toBeCloseTo((inflow - outflow) * 1000 * 86400, 3);
});
