import { expect, test } from "vitest";
import { runSiteCheck } from "~/envelope";
import type { LayerInput } from "~/envelope/types";
import { fixedMaterial, libraryOf } from "./library";

// A well-ventilated cavity: layers outboard of it are disregarded and the cavity face takes a
// still-air film (ASHRAE HoF ch.27, overall resistance of walls with ventilated air spaces, from memory).
const lib = libraryOf(
  fixedMaterial("siding", 1, 50, { family: "cladding" }),
  fixedMaterial("cavity", 1, 1000, { family: "air-space" }),
  fixedMaterial("housewrap", 0, 50),
  fixedMaterial("osb", 0.62, 1.0, { family: "wood-panel", water_sensitive: true }),
  fixedMaterial("batt", 21, 20, { family: "fibrous-insulation", water_sensitive: true }),
  fixedMaterial("gypsum-painted", 0.45, 5.0, { family: "gypsum" }),
);
const L = (role: string, material: string): LayerInput => ({ role, material, thickness_mm: 10 });
const layers = [
  L("cladding", "siding"),
  L("drainage-gap", "cavity"),
  L("water-resistive-barrier", "housewrap"),
  L("sheathing", "osb"),
  L("insulation", "batt"),
  L("interior-finish", "gypsum-painted"),
];

test("rainscreen wall R: siding and cavity do not count, still-air film R-0.68 — R-23.43 (hand derivation)", () => {
  // 0.68 (still air in the cavity) + 0 + 0.62 + 21 + 0.45 + 0.68 (inside) = 23.43; counting the siding,
  // the cavity and the 0.17 outdoor film would give 24.92.
  const t = runSiteCheck({ kind: "above-grade-wall", layers }, { zone: "5A" }, lib).thermal;
  expect(t.r_ip).toBeCloseTo(23.43, 2);
  expect(t.layers.map((l) => l.counted)).toEqual([false, false, true, true, true, true]);
  expect(t.films[0].label).toMatch(/still-air/);
});

test("the same wall without a ventilated cavity counts the siding and the outdoor film: R-23.92 (hand derivation)", () => {
  // 0.17 + 1 + 0 + 0.62 + 21 + 0.45 + 0.68 = 23.92
  const t = runSiteCheck(
    { kind: "above-grade-wall", layers: layers.filter((l) => l.material !== "cavity") },
    { zone: "5A" },
    lib,
  ).thermal;
  expect(t.r_ip).toBeCloseTo(23.92, 2);
});
