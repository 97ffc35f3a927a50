import { expect, test } from "vitest";
import { interiorRetarderClass, profileChartSeries, runSiteCheck } from "~/envelope";
import type { AssemblyInput, LayerInput, SiteInput } from "~/envelope/types";
import { loadLibrary } from "./library";

const lib = loadLibrary();
const layer = (role: string, material: string, thickness_mm: number, extra: Partial<LayerInput> = {}): LayerInput => ({
  role,
  material,
  thickness_mm,
  ...extra,
});
const batt140 = layer("insulation", "fibreglass-batt", 139.7, {
  framing: { material: "softwood-lumber", fraction: 0.23 },
});
const gyp = layer("interior-finish", "gypsum-board", 12.7);
const paint = layer("interior-finish", "latex-paint", 0.1);
const ids = (a: AssemblyInput, site: SiteInput = { zone: "5A" }) =>
  runSiteCheck(a, site, lib).flags.map((f) => `${f.id}:${f.severity}`);

test("summer inward drive behind brick condenses on interior poly: stop — common practice (inward drive)", () => {
  const a: AssemblyInput = {
    kind: "above-grade-wall",
    layers: [
      layer("cladding", "brick-veneer", 101.6),
      layer("water-resistive-barrier", "building-paper-grade-d", 0.5),
      layer("sheathing", "fibreboard-sheathing", 12.7),
      batt140,
      layer("vapour-retarder", "polyethylene-sheet-6mil", 0.15),
      gyp,
      paint,
    ],
  };
  const r = runSiteCheck(a, { zone: "5A", summer: { t_c: 30, rh: 70 } }, lib);
  expect(r.profiles.summer.description).toMatch(/brick veneer warmed by sun/);
  expect(r.profiles.summer.condensingPlanes.length).toBeGreaterThan(0);
  expect(r.flags.map((f) => `${f.id}:${f.severity}`)).toContain("summer-condensation-interior-sheet:stop");
  // A vented cavity behind the brick switches the case to humid outdoor air.
  const vented = runSiteCheck(
    { ...a, layers: [a.layers[0], layer("drainage-gap", "vented-air-space", 25), ...a.layers.slice(1)] },
    { zone: "5A" },
    lib,
  );
  expect(vented.profiles.summer.description).toMatch(/outdoor/);
});

test("every result carries the caution deferring to the local code and a licensed professional", () => {
  const r = runSiteCheck(
    {
      kind: "slab",
      layers: [
        layer("capillary-break", "crushed-stone", 100),
        layer("vapour-retarder", "polyethylene-sheet-10mil", 0.25),
        layer("structure", "cast-concrete", 100),
      ],
    },
    { zone: "4A" },
    lib,
  );
  expect(r.caution).toMatch(/local building official/);
  expect(r.caution).toMatch(/licensed design professional/);
  for (const f of r.flags) expect(f.source.length).toBeGreaterThan(0);
});

test("a 2×6 wall with kraft facing (Class II) still dries both ways at wet-cup humidity", () => {
  const open: AssemblyInput = {
    kind: "above-grade-wall",
    layers: [
      layer("cladding", "fibre-cement-lap-siding", 8),
      layer("water-resistive-barrier", "polymeric-housewrap", 0.2),
      layer("sheathing", "osb", 11.1),
      batt140,
      layer("vapour-retarder", "kraft-facing", 0.1),
      gyp,
      paint,
    ],
  };
  const r = runSiteCheck(open, { zone: "5A" }, lib);
  expect(r.vapour.interiorClass).toBe("II");
  expect(r.vapour.dryingDirections).toEqual(["inward", "outward"]);
});

test("a variable-permeance retarder opens in the summer case where 6-mil poly collects water — common practice; curve docs/references.md §5.2 (M — from memory)", () => {
  const wallWith = (retarder: string): AssemblyInput => ({
    kind: "above-grade-wall",
    layers: [
      layer("cladding", "brick-veneer", 101.6),
      layer("water-resistive-barrier", "building-paper-grade-d", 0.5),
      layer("sheathing", "fibreboard-sheathing", 12.7),
      batt140,
      layer("vapour-retarder", retarder, 0.15),
      gyp,
      paint,
    ],
  });
  const site = { zone: "5A", summer: { t_c: 30, rh: 70 } };
  const poly = runSiteCheck(wallWith("polyethylene-sheet-6mil"), site, lib).profiles.summer;
  const variable = runSiteCheck(wallWith("variable-permeance-retarder"), site, lib).profiles.summer;
  const vrIndex = 4;
  expect(variable.vapourLayers[vrIndex].case_perm_ng).toBeGreaterThan(variable.vapourLayers[vrIndex].perm_ng);
  expect(variable.rate_g_m2_day).toBeLessThan(poly.rate_g_m2_day);
  expect(interiorRetarderClass(wallWith("variable-permeance-retarder"), lib)).toBe("II");
});

test("profileChartSeries gives one point per interface with the local dew point", () => {
  const r = runSiteCheck(
    { kind: "above-grade-wall", layers: [layer("sheathing", "osb", 11.1), batt140, gyp] },
    { zone: "6A" },
    lib,
  );
  const series = profileChartSeries(r.profiles.winter);
  expect(series).toHaveLength(4);
  for (const p of series) expect(p.dew_point_c).toBeLessThanOrEqual(p.t_c + 1e-9);
  expect(series.map((p) => p.position_mm)).toEqual([0, 11.1, 150.8, 163.5]);
});

test("a vented cavity takes the cladding out of the winter profile: its interfaces sit at the cavity condition", () => {
  const a: AssemblyInput = {
    kind: "above-grade-wall",
    layers: [
      layer("cladding", "wood-bevel-siding", 12.7),
      layer("drainage-gap", "vented-air-space", 19),
      layer("water-resistive-barrier", "polymeric-housewrap", 0.2),
      layer("sheathing", "osb", 11.1),
      batt140,
      gyp,
      paint,
    ],
  };
  const w = runSiteCheck(a, { zone: "6A" }, lib).profiles.winter;
  expect(w.boundaryIndex).toBe(2);
  expect(w.interfaces[0].t_c).toBeCloseTo(w.interfaces[2].t_c, 9);
  expect(w.condensingPlanes.every((p) => p.interfaceIndex >= 2)).toBe(true);
});

test("a vented attic is outdoors for drying: the ceiling below it is not 'closed on both sides'", () => {
  const attic: AssemblyInput = {
    kind: "roof",
    layers: [
      layer("roofing", "asphalt-shingles", 6),
      layer("underlayment", "synthetic-roof-underlayment", 0.5),
      layer("sheathing", "osb", 11.1),
      layer("drainage-gap", "vented-air-space", 600),
      layer("insulation", "loose-fill-cellulose", 380),
      layer("insulation", "loose-fill-cellulose", 89, { framing: { material: "softwood-lumber", fraction: 0.1 } }),
      gyp,
      layer("vapour-retarder", "vapour-retarder-primer", 0.1),
    ],
  };
  const r = runSiteCheck(attic, { zone: "6A" }, lib);
  expect(r.vapour.bothSidesClosed).toBe(false);
  expect(r.vapour.dryingDirections).toContain("outward");
});

test("exterior-insulated basement wall: dampproofing and concrete are not the interior retarder; a slab's retarder is its ground sheet", () => {
  const wall: AssemblyInput = {
    kind: "basement-wall",
    layers: [
      layer("insulation", "drainage-board-mineral-wool", 100),
      layer("soil-side-protection", "bituminous-dampproofing", 1.5),
      layer("structure", "cast-concrete", 200),
      layer("interior-finish", "latex-paint", 0.1),
    ],
  };
  expect(interiorRetarderClass(wall, lib)).toBe("III");
  expect(ids(wall).some((f) => f.startsWith("basement-class-i-interior"))).toBe(false);
  const slab: AssemblyInput = {
    kind: "slab",
    layers: [
      layer("capillary-break", "crushed-stone", 100),
      layer("insulation", "xps-board", 50.8),
      layer("vapour-retarder", "polyethylene-sheet-10mil", 0.25),
      layer("structure", "cast-concrete", 100),
    ],
  };
  expect(interiorRetarderClass(slab, lib)).toBe("I");
});
