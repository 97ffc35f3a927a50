import { createRequire } from "node:module";
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { runSiteCheck } from "~/envelope";
import { resolveSite } from "~/envelope/climate";
import { MONTH_NAMES } from "~/envelope/climate-year";
import { resolveAssembly } from "~/envelope/layers";
import { computeProfile } from "~/envelope/profile";
import { winterCase } from "~/envelope/site-check";
import type { MaterialFamily } from "~/envelope/material-schema";
import type { ClimateYear, LayerInput, MonthInput } from "~/envelope/types";
import { fixedRsiMaterial, libraryOf, loadLibrary } from "./library";

interface PsychroLib {
  SetUnitSystem(u: unknown): void;
  SI: unknown;
  GetSatVapPres(t: number): number;
}
const psychrolib = createRequire(import.meta.url)("psychrolib") as PsychroLib;
psychrolib.SetUnitSystem(psychrolib.SI);

/** A fixture layer with a stated RSI and permeance (ng/(s·m²·Pa)). */
const layerMaterial = (slug: string, rsi: number, perm: number, family: MaterialFamily = "membrane") =>
  fixedRsiMaterial(slug, rsi, { family, vapour: { permeance_ng: perm, source: "fixture, D" } });

const twoLayer = libraryOf(
  layerMaterial("outer-board", 0.5, 10),
  layerMaterial("fill", 3.0, 500, "fibrous-insulation"),
);
const twoLayerWall = {
  kind: "above-grade-wall" as const,
  layers: [
    { role: "sheathing", material: "outer-board", thickness_mm: 10 },
    { role: "insulation", material: "fill", thickness_mm: 100 },
  ],
};

const year = (months: MonthInput[]) => ({ months });
/** The 12-month balance of a full site check (runSiteCheck runs it unless told not to). */
function seasonalOf(...args: Parameters<typeof runSiteCheck>) {
  const s = runSiteCheck(...args).seasonal;
  if (!s) throw new Error("the full check returned no seasonal balance");
  return s;
}
const cold = { t_c: -5, rh: 80 };
const mild = { t_c: 15, rh: 70 };

describe("two-layer wall, hand-derived accumulation (D: derived here, p_sat from psychrolib, ASHRAE HoF 2017 ch.1 eqs 5/6)", () => {
  // Layers, outside → inside: board RSI 0.5, 10 ng/(s·m²·Pa) (Z_out = 1e11 m²·s·Pa/kg); fill RSI 3.0,
  // 500 ng (Z_in = 2e9). Films: outside R-0.17 = RSI 0.02994, inside R-0.68 = RSI 0.11976 (the engine's
  // wall films), no vapour resistance. R_T = 3.64969; the board/fill interface sits at the fraction
  // (0.02994 + 0.5)/3.64969 = 0.14520 of the indoor–outdoor difference.
  // Indoor 20 °C / 50 % all year (p_i = 1169.40 Pa). Year: January and February at −5 °C / 80 %, the
  // other ten months at 15 °C / 70 %.
  // Cold month: T_c = −5 + 25·0.14520 = −1.370 °C, p_sat,c = 545.64 Pa (ice), p_e = 0.8·401.76 = 321.41 Pa.
  //   g_c = (p_i − p_sat,c)/Z_in − (p_sat,c − p_e)/Z_out = 3.1222e-7 − 2.242e-9 kg/(m²·s) = 26.753 g/(m²·day)
  //   → January (31 d) 829.34 g/m², February (28 d) 749.08 g/m²: 1578.41 g/m² at the end of February.
  // Mild month: T_c = 15 + 5·0.14520 = 15.726 °C, p_sat,c = 1786.85 Pa, p_e = 0.7·1705.45 = 1193.81 Pa; the
  //   wet interface is held at p_sat,c and loses (p_sat,c − p_i)/Z_in + (p_sat,c − p_e)/Z_out
  //   = 27.186 g/(m²·day) → March 842.76 g/m² (735.65 left); April (30 d) could lose 815.58: dry in April.
  const site = { zone: "5A", indoor: { t_c: 20, rh: 50 } };
  const lib = twoLayer;
  const r = seasonalOf(twoLayerWall, { ...site, year: year([cold, cold, ...Array(10).fill(mild)]) }, lib);
  const sat = (t: number) => psychrolib.GetSatVapPres(t);
  const f = (0.17 / 5.678263 + 0.5) / (0.17 / 5.678263 + 0.68 / 5.678263 + 3.5);
  const pI = 0.5 * sat(20);
  const coldRate = (() => {
    const p = sat(-5 + 25 * f);
    return ((pI - p) / 2e9 - (p - 0.8 * sat(-5)) / 1e11) * 86400 * 1000;
  })();
  const dryRate = (() => {
    const p = sat(15 + 5 * f);
    return ((p - pI) / 2e9 + (p - 0.7 * sat(15)) / 1e11) * 86400 * 1000;
  })();

  test("the hand figures themselves", () => {
    expect(coldRate).toBeCloseTo(26.753, 3);
    expect(dryRate).toBeCloseTo(27.186, 3);
  });
  test("starts in January, condenses 829.3 then 749.1 g/m², peaks at 1578.4 g/m² in February", () => {
    expect(r.startMonth).toBe(1);
    expect(r.months[0].condensed_g_m2).toBeCloseTo(31 * coldRate, 1);
    expect(r.months[0].condensed_g_m2).toBeCloseTo(829.34, 1);
    expect(r.months[1].accumulated_g_m2).toBeCloseTo(1578.41, 1);
    expect(r.peak_g_m2).toBeCloseTo(1578.41, 1);
    expect(r.peakMonth).toBe(2);
    expect(r.criticalInterface?.interfaceIndex).toBe(1);
  });
  test("evaporates 842.8 g/m² in March and the rest in April: dries within the year", () => {
    expect(r.months[2].evaporated_g_m2).toBeCloseTo(31 * dryRate, 1);
    expect(r.months[2].accumulated_g_m2).toBeCloseTo(735.65, 1);
    expect(r.months[3].evaporated_g_m2).toBeCloseTo(735.65, 1);
    expect(r.months[3].accumulated_g_m2).toBe(0);
    expect(r.driesOutMonth).toBe(4);
    expect(r.verdict).toBe("dries-within-year");
    expect(r.endOfYear_g_m2).toBe(0);
    expect(r.months[2].interfaces[0].rate_g_m2_day).toBeCloseTo(-dryRate, 2);
  });
  test("the same wall with three cold months too many accumulates year on year", () => {
    const wet = seasonalOf(twoLayerWall, { ...site, year: year([...Array(11).fill(cold), mild]) }, lib);
    expect(wet.verdict).toBe("accumulates");
    expect(wet.startMonth).toBe(1);
    // 334 cold days condense, December (31 d) dries 842.8 g/m²: 334·26.753 − 842.76 is held.
    expect(wet.endOfYear_g_m2).toBeCloseTo(334 * coldRate - 31 * dryRate, 0);
    expect(wet.driesOutMonth).toBeNull();
  });
});

test("the design day alone, on request, carries no seasonal balance", () => {
  expect(runSiteCheck(twoLayerWall, { zone: "5A" }, twoLayer, { seasonal: false }).seasonal).toBeNull();
});

test("no condensing month: verdict no-condensation, nothing held, positive margins", () => {
  const r = seasonalOf(
    twoLayerWall,
    { zone: "5A", indoor: { t_c: 20, rh: 20 }, year: year(Array(12).fill(mild)) },
    twoLayer,
  );
  expect(r.verdict).toBe("no-condensation");
  expect(r.startMonth).toBeNull();
  expect(r.peak_g_m2).toBe(0);
  expect(r.months.every((m) => m.accumulated_g_m2 === 0 && m.margin_c > 0)).toBe(true);
});

describe("interior-surface mould check, ISO 13788:2012 §5 (Rsi 0.25, Rse 0.04, 80 % critical surface RH; docs/references.md §7.2 notes, M)", () => {
  // f_Rsi = (R_T − Rsi)/R_T with R_T = 0.25 + 0.5 + 3.0 + 0.04 = 3.79 → 0.93404 (hand-derived, D).
  // January: indoor 20 °C / 50 % (1169.40 Pa); the surface may reach 1169.40/0.8 = 1461.75 Pa, whose dew
  // point is 12.628 °C (psychrolib GetTDewPointFromVapPres); f_Rsi,min = (12.628 − (−5))/25 = 0.7051.
  const r = seasonalOf(
    twoLayerWall,
    { zone: "5A", indoor: { t_c: 20, rh: 50 }, year: year([cold, cold, ...Array(10).fill(mild)]) },
    twoLayer,
  );
  test("temperature factor of the plane wall and the month that asks most", () => {
    expect(r.surface.fRsi).toBeCloseTo(3.54 / 3.79, 5);
    expect(r.surface.fRsiMax).toBeCloseTo(0.7051, 3);
    expect(r.surface.criticalMonth).toBe(1);
    expect(r.surface.pass).toBe(true);
  });
  test("a thin uninsulated layer in a humid room fails", () => {
    const lib = libraryOf(layerMaterial("thin", 0.05, 10));
    const bad = seasonalOf(
      { kind: "above-grade-wall", layers: [{ role: "structure", material: "thin", thickness_mm: 10 }] },
      { zone: "5A", indoor: { t_c: 20, rh: 60 }, year: year(Array(12).fill(cold)) },
      lib,
    );
    expect(bad.surface.fRsi).toBeCloseTo(0.09 / 0.34, 5);
    expect(bad.surface.pass).toBe(false);
  });
});

test("months carry the indoor conditions actually used, by the site's indoor method (ASHRAE 160 simplified default)", () => {
  const r = seasonalOf(
    twoLayerWall,
    { zone: "5A", year: year([{ t_c: -12, rh: 80 }, { t_c: 5, rh: 70 }, ...Array(10).fill({ t_c: 25, rh: 60 })]) },
    twoLayer,
  );
  expect(r.indoorMethod).toBe("ashrae-160-simplified");
  expect(r.months[0].indoor).toMatchObject({ t_c: 21, rh: 40 });
  expect(r.months[1].indoor.rh).toBeCloseTo(55, 9);
  // Warmer than the cooling set point (24 °C default): indoors is cooled to 24 °C.
  expect(r.months[2].indoor).toMatchObject({ t_c: 24, rh: 70 });
  expect(r.months.map((m) => m.name)).toEqual([...MONTH_NAMES]);
});

describe("properties (fast-check)", () => {
  const lib = libraryOf(
    layerMaterial("a", 0.1, 40),
    layerMaterial("b", 0.6, 800, "wood-panel"),
    layerMaterial("c", 2.5, 2000, "fibrous-insulation"),
    layerMaterial("d", 0.08, 300, "gypsum"),
    layerMaterial("e", 0, 3),
  );
  const layerArb = fc
    .constantFrom("a", "b", "c", "d", "e")
    .map((material): LayerInput => ({ role: "insulation", material, thickness_mm: 10 }));
  const wallArb = fc
    .array(layerArb, { minLength: 2, maxLength: 6 })
    .map((layers) => ({ kind: "above-grade-wall" as const, layers }));
  const monthArb = fc.record({
    t_c: fc.double({ min: -30, max: 30, noNaN: true }),
    rh: fc.double({ min: 20, max: 100, noNaN: true }),
  });
  const indoorArb = fc.record({
    t_c: fc.double({ min: 18, max: 24, noNaN: true }),
    rh: fc.double({ min: 20, max: 70, noNaN: true }),
  });

  // Heating season: outdoors colder than indoors, so the indoor temperature is the set point the
  // design-day case uses.
  const heatingMonthArb = fc.record({
    t_c: fc.double({ min: -30, max: 15, noNaN: true }),
    rh: fc.double({ min: 20, max: 100, noNaN: true }),
  });
  test("a constant heating-season climate condenses every month at the design-day winter rate (the design-day Glaser result)", () => {
    fc.assert(
      fc.property(wallArb, heatingMonthArb, indoorArb, (wall, m, indoor) => {
        const input = { zone: "5A", winter: m, indoor: { ...indoor, summer_t_c: 30 }, year: year(Array(12).fill(m)) };
        const r = { seasonal: seasonalOf(wall, input, lib) };
        const design = computeProfile(
          resolveAssembly(wall, lib),
          winterCase(resolveAssembly(wall, lib), resolveSite(input)),
        ).rate_g_m2_day;
        for (const month of r.seasonal.months) {
          expect(month.condensed_g_m2 / month.days).toBeCloseTo(design, 6);
          expect(month.evaporated_g_m2).toBe(0);
        }
        expect(r.seasonal.verdict).toBe(design > 1e-6 ? "accumulates" : "no-condensation");
      }),
      { numRuns: 150 },
    );
  });

  test("water held is never negative, and condensed minus evaporated equals what is held", () => {
    fc.assert(
      fc.property(wallArb, fc.array(monthArb, { minLength: 12, maxLength: 12 }), indoorArb, (wall, months, indoor) => {
        const r = seasonalOf(wall, { zone: "5A", indoor, year: year(months) }, lib);
        if (r.startMonth === null) return;
        let balance = 0;
        for (let step = 0; step < 12; step++) {
          const m = r.months[(r.startMonth - 1 + step) % 12];
          expect(m.accumulated_g_m2).toBeGreaterThanOrEqual(0);
          for (const i of m.interfaces) expect(i.accumulated_g_m2).toBeGreaterThanOrEqual(0);
          expect(m.condensed_g_m2).toBeGreaterThanOrEqual(0);
          expect(m.evaporated_g_m2).toBeGreaterThanOrEqual(0);
          balance += m.condensed_g_m2 - m.evaporated_g_m2;
          expect(m.accumulated_g_m2).toBeCloseTo(balance, 6);
        }
        expect(r.endOfYear_g_m2).toBeCloseTo(balance, 6);
      }),
      { numRuns: 200 },
    );
  });
});

describe("variable-permeance retarder at each month's humidity (real library)", () => {
  const lib = loadLibrary();
  const wall = (retarder: string): { kind: "above-grade-wall"; layers: LayerInput[] } => ({
    kind: "above-grade-wall",
    layers: [
      { role: "cladding", material: "fibre-cement-lap-siding", thickness_mm: 8 },
      { role: "water-resistive-barrier", material: "polymeric-housewrap", thickness_mm: 0.2 },
      { role: "sheathing", material: "osb", thickness_mm: 11 },
      {
        role: "insulation",
        material: "fibreglass-batt",
        thickness_mm: 140,
        framing: { material: "softwood-lumber", fraction: 0.23 },
      },
      { role: "vapour-retarder", material: retarder, thickness_mm: 0.2 },
      { role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 },
    ],
  });
  const site = { zone: "6A", hdd18: 4500, cdd10: 900 };
  test("it holds less winter water than no retarder, and the months record what was used", () => {
    const open = seasonalOf(wall("latex-paint"), site, lib);
    const variable = seasonalOf(wall("variable-permeance-retarder"), site, lib);
    expect(open.peak_g_m2).toBeGreaterThan(0);
    expect(variable.peak_g_m2).toBeLessThan(open.peak_g_m2);
    expect(variable.climate.source).toBe("generated");
  });
});

test("a typed year and a CSV year give the same balance", () => {
  const months = [cold, cold, ...Array(10).fill(mild)] as MonthInput[];
  const csv = ["month,temperature_c,rh_percent", ...months.map((m, i) => `${i + 1},${m.t_c},${m.rh}`)].join("\n");
  const site = { zone: "5A", indoor: { t_c: 20, rh: 50 } };
  const typed = seasonalOf(twoLayerWall, { ...site, year: { months } }, twoLayer);
  const fromCsv = seasonalOf(twoLayerWall, { ...site, year: { csv } }, twoLayer);
  expect(fromCsv.climate.source).toBe("csv");
  expect(typed.climate.source).toBe("typed");
  expect(fromCsv.months).toEqual(typed.months);
});

test("below grade: the soil face is saturated at the ground temperature all year", () => {
  const lib = loadLibrary();
  const wall = {
    kind: "basement-wall" as const,
    layers: [
      { role: "structure", material: "cast-concrete", thickness_mm: 200 },
      {
        role: "insulation",
        material: "fibreglass-batt",
        thickness_mm: 89,
        framing: { material: "softwood-lumber", fraction: 0.15 },
      },
      { role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 },
    ],
  };
  const r = seasonalOf(wall, { zone: "6A", hdd18: 4500, cdd10: 900 }, lib);
  const y: ClimateYear = r.climate;
  expect(y.months).toHaveLength(12);
  for (const m of r.months) expect(m.outdoor).toMatchObject({ rh: 100 });
});
