import { expect, test } from "vitest";
import { runSiteCheck } from "~/envelope";
import { conductivityAt } from "~/envelope/layers";
import type { Material } from "~/envelope/material-schema";
import { fixedMaterial, libraryOf, loadLibrary } from "./library";

// A board whose conductivity rises as it gets colder: k = 0.0275 − 0.000125·T_mean W/(m·K)
// (0.030 at −20 °C, 0.025 at 20 °C); rated 0.025.
const board: Material = {
  ...fixedMaterial("cold-board", 0, 1, { family: "foam-board", foam_plastic: true }),
  thermal: {
    conductivity_w_mk: 0.025,
    source: "fixture, D",
    by_mean_temperature: {
      points: [
        [-20, 0.03],
        [20, 0.025],
      ],
      source: "fixture, D",
    },
  },
};
const lib = libraryOf(board);

test("a cold-sensitive board is taken at its own mean temperature, iterated: inner face 17.56 °C (hand derivation)", () => {
  // Outside −20 °C, inside 20 °C, films RSI 0.02994 and 0.11975, 50 mm of board.
  // Fixed point: T_m = −20 + 40 (R_e + R_b/2) / (R_e + R_b + R_i) and R_b = 0.050 / k(T_m), solved by
  // substitution: R_b = 1.8106, T_m = −0.92 °C; inner face −20 + 40 (R_e + R_b) / R_tot = 17.556 °C.
  // At the rated k (R_b = 2.0) it would be 17.772 °C.
  const w = runSiteCheck(
    { kind: "above-grade-wall", layers: [{ role: "insulation", material: "cold-board", thickness_mm: 50 }] },
    { zone: "6A", winter: { t_c: -20, rh: 80 }, indoor: { t_c: 20, rh: 30 } },
    lib,
  ).profiles.winter;
  expect(w.interfaces[1].t_c).toBeCloseTo(17.556, 2);
  expect(w.interfaces[0].t_c).toBeCloseTo(-19.389, 2);
  expect(w.notes.join(" ")).toMatch(/mean temperature of -0\.9 °C/);
});

test("foil-faced polyiso in the library carries its cold-weather curve: about R-4.3 per inch at 15 °F mean (from memory, M)", () => {
  const polyiso = loadLibrary().get("polyiso-foil-faced") as Material;
  const rPerInchAt = (t: number) => 0.0254 / conductivityAt(polyiso, t) / 0.17611;
  expect(rPerInchAt(24)).toBeCloseTo(6.0, 1);
  expect(rPerInchAt(-9.4)).toBeCloseTo(4.3, 1);
  expect(rPerInchAt(-30)).toBeCloseTo(4.3, 1); // flat beyond the last published point
});
