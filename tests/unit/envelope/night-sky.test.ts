import { expect, test } from "vitest";
import { runSiteCheck } from "~/envelope";
import type { LayerInput } from "~/envelope/types";
import { fixedMaterial, libraryOf } from "./library";

// Sol-air correction for a horizontal surface at night: εΔR/h_o = 7 °F = 3.9 K below the air
// (ASHRAE Handbook—Fundamentals ch.18, sol-air temperature; from memory).
const lib = libraryOf(
  fixedMaterial("membrane-roof", 0, 0.05, { family: "roofing" }),
  fixedMaterial("board", 10, 1, { family: "foam-board", foam_plastic: true }),
  fixedMaterial("deck", 0.8, 1, { family: "wood-panel", water_sensitive: true }),
  fixedMaterial("gypsum-painted", 0.45, 5.0, { family: "gypsum" }),
  fixedMaterial("attic", 0, 1000, { family: "air-space" }),
);
const L = (role: string, material: string): LayerInput => ({ role, material, thickness_mm: 10 });
const roof = [
  L("roofing", "membrane-roof"),
  L("insulation", "board"),
  L("sheathing", "deck"),
  L("interior-finish", "gypsum-painted"),
];
const site = { zone: "6A", winter: { t_c: -20, rh: 80 }, indoor: { t_c: 20, rh: 30 } };

test("a roof in the winter case sees the sky: exterior at −23.9 °C, surface −23.28 °C (hand derivation), and says so", () => {
  // Films out, R-0.61 in (heat up): R_tot = 0.17 + 0 + 10 + 0.8 + 0.45 + 0.61 = 12.03;
  // surface = −23.9 + 43.9 × 0.17 / 12.03 = −23.280 °C; deck outer face −23.9 + 43.9 × 10.17 / 12.03 = 13.213 °C.
  const w = runSiteCheck({ kind: "roof", layers: roof }, site, lib).profiles.winter;
  expect(w.exterior.t_c).toBeCloseTo(-23.9, 6);
  expect(w.interfaces[0].t_c).toBeCloseTo(-23.28, 2);
  expect(w.interfaces[2].t_c).toBeCloseTo(13.213, 2);
  expect(w.notes.join(" ")).toMatch(/Night-sky radiation/);
  expect(w.description).toMatch(/clear night sky/);
  // The outdoor vapour pressure stays the air's: 80 % at −20 °C.
  expect(w.exterior.p_v_pa).toBeCloseTo(0.8 * 103.26, 0); // p_sat(−20 °C, ice) = 103.26 Pa (ASHRAE HoF 2017 ch.1 Table 3)
});

test("walls and vented attics do not get the sky correction", () => {
  const wall = runSiteCheck({ kind: "above-grade-wall", layers: roof }, site, lib).profiles.winter;
  expect(wall.exterior.t_c).toBe(-20);
  const attic = runSiteCheck(
    {
      kind: "roof",
      layers: [
        L("roofing", "membrane-roof"),
        L("sheathing", "deck"),
        L("drainage-gap", "attic"),
        L("insulation", "board"),
        L("interior-finish", "gypsum-painted"),
      ],
    },
    site,
    lib,
  ).profiles.winter;
  expect(attic.exterior.t_c).toBe(-20);
  expect(attic.notes).toEqual([]);
});
