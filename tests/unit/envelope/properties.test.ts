import fc from "fast-check";
import { expect, test } from "vitest";
import { ASSEMBLY_KINDS, CLIMATE_ZONES, runSiteCheck, seriesPermeance } from "~/envelope";
import type { AssemblyInput, LayerInput, SiteCheckResult, SiteInput } from "~/envelope/types";
import { cToF, RSI_PER_RIP } from "~/envelope/units";
import { loadLibrary } from "./library";

const lib = loadLibrary();
const slugs = [...lib.keys()];

const layerArb: fc.Arbitrary<LayerInput> = fc
  .record({
    material: fc.constantFrom(...slugs),
    thickness_mm: fc.double({ min: 0.05, max: 400, noNaN: true }),
    framed: fc.boolean(),
    fraction: fc.double({ min: 0, max: 1, noNaN: true }),
    role: fc.constantFrom(
      "cladding",
      "sheathing",
      "insulation",
      "structure",
      "interior-finish",
      "vapour-retarder",
      "drainage-gap",
      "water-resistive-barrier",
    ),
  })
  .map(({ material, thickness_mm, framed, fraction, role }) => ({
    role,
    material,
    thickness_mm,
    ...(framed ? { framing: { material: "softwood-lumber", fraction } } : {}),
  }));

const assemblyArb: fc.Arbitrary<AssemblyInput> = fc.record({
  kind: fc.constantFrom(...ASSEMBLY_KINDS),
  layers: fc.array(layerArb, { minLength: 1, maxLength: 12 }),
});

const siteArb: fc.Arbitrary<SiteInput> = fc.record({
  zone: fc.constantFrom(...CLIMATE_ZONES),
  winter: fc.record({
    t_c: fc.double({ min: -45, max: 15, noNaN: true }),
    rh: fc.double({ min: 0, max: 100, noNaN: true }),
  }),
  summer: fc.record({
    t_c: fc.double({ min: 20, max: 45, noNaN: true }),
    rh: fc.double({ min: 0, max: 100, noNaN: true }),
  }),
  indoor: fc.record({
    t_c: fc.double({ min: 16, max: 26, noNaN: true }),
    rh: fc.double({ min: 0, max: 100, noNaN: true }),
  }),
  edition: fc.constantFrom("IECC/IRC 2021" as const, "IECC/IRC 2018" as const),
});

function allNumbers(value: unknown, out: number[] = []): number[] {
  if (typeof value === "number") out.push(value);
  else if (Array.isArray(value)) for (const v of value) allNumbers(v, out);
  else if (value && typeof value === "object") for (const v of Object.values(value)) allNumbers(v, out);
  return out;
}

test("property: no NaN or Infinity anywhere in the result, and it survives JSON", () => {
  fc.assert(
    fc.property(assemblyArb, siteArb, (a, s) => {
      const r = runSiteCheck(a, s, lib);
      for (const n of allNumbers(r)) expect(Number.isFinite(n)).toBe(true);
      const json = JSON.stringify(r);
      expect(JSON.stringify(JSON.parse(json))).toBe(json);
    }),
    { numRuns: 300 },
  );
});

test("property: total R equals the series sum of the counted layers plus films (nothing outboard of a ventilated cavity counts)", () => {
  fc.assert(
    fc.property(assemblyArb, (a) => {
      const t = runSiteCheck(a, { zone: "5A" }, lib).thermal;
      const sum = t.layers.reduce((s, l) => s + (l.counted ? l.rsi : 0), 0) + t.films.reduce((s, f) => s + f.rsi, 0);
      expect(t.rsi).toBeCloseTo(sum, 9);
      expect(t.u_si * t.rsi).toBeCloseTo(1, 12);
    }),
    { numRuns: 200 },
  );
});

test("property: temperatures are monotonic through the stack in steady state (both cases)", () => {
  fc.assert(
    fc.property(assemblyArb, siteArb, (a, s) => {
      const r: SiteCheckResult = runSiteCheck(a, s, lib);
      for (const p of [r.profiles.winter, r.profiles.summer]) {
        const dir = Math.sign(p.interior.t_c - p.exterior.t_c);
        const ts = p.interfaces.map((i) => i.t_c);
        for (let k = 1; k < ts.length; k++) expect(dir * (ts[k] - ts[k - 1])).toBeGreaterThanOrEqual(-1e-9);
        // and bounded by the two boundary temperatures
        const lo = Math.min(p.interior.t_c, p.exterior.t_c) - 1e-9;
        const hi = Math.max(p.interior.t_c, p.exterior.t_c) + 1e-9;
        for (const t of ts) expect(t >= lo && t <= hi).toBe(true);
      }
    }),
    { numRuns: 200 },
  );
});

test("property: SI and inch-pound figures agree", () => {
  fc.assert(
    fc.property(assemblyArb, (a) => {
      const r = runSiteCheck(a, { zone: "4C" }, lib);
      expect(r.thermal.r_ip * RSI_PER_RIP).toBeCloseTo(r.thermal.rsi, 10);
      expect(r.thermal.u_ip / RSI_PER_RIP).toBeCloseTo(r.thermal.u_si, 10);
      for (const l of r.thermal.layers) expect(l.r_ip * RSI_PER_RIP).toBeCloseTo(l.rsi, 10);
      for (const i of r.profiles.winter.interfaces) expect(i.t_f).toBeCloseTo(cToF(i.t_c), 10);
      for (const v of r.vapour.layers) expect(v.perm_us * 57.2135).toBeCloseTo(v.perm_ng, 8);
    }),
    { numRuns: 150 },
  );
});

test("property: permeance series law — resistances add, the stack is tighter than its tightest layer", () => {
  fc.assert(
    fc.property(fc.array(fc.double({ min: 0.5, max: 20000, noNaN: true }), { minLength: 1, maxLength: 12 }), (ws) => {
      const w = seriesPermeance(ws);
      expect(1 / w).toBeCloseTo(
        ws.reduce((s, x) => s + 1 / x, 0),
        9,
      );
      expect(w).toBeLessThanOrEqual(Math.min(...ws) * (1 + 1e-12));
    }),
  );
});

test("property: without condensation the straight-line vapour flow is the same through every layer", () => {
  fc.assert(
    fc.property(
      assemblyArb.filter((a) => a.kind === "above-grade-wall"),
      (a) => {
        const p = runSiteCheck(a, { zone: "5A" }, lib).profiles.winter;
        // Layers outboard of the boundary (a ventilated cavity) carry no vapour resistance in the case.
        const flows = p.vapourLayers
          .filter((_, i) => i >= p.boundaryIndex)
          .map((v) => (p.interfaces[v.index + 1].p_v_linear_pa - p.interfaces[v.index].p_v_linear_pa) * v.case_perm_ng);
        // Relative 1e-6: a 0.05 mm layer's pressure drop is a tiny difference of ~1000 Pa values, so
        // floating-point cancellation alone reaches ~1e-7.
        for (const f of flows) expect(Math.abs(f - flows[0])).toBeLessThanOrEqual(1e-6 * Math.abs(flows[0]) + 1e-9);
      },
    ),
    { numRuns: 150 },
  );
});

test("property: the Glaser profile never exceeds saturation and never exceeds the straight line", () => {
  fc.assert(
    fc.property(assemblyArb, siteArb, (a, s) => {
      const r = runSiteCheck(a, s, lib);
      for (const p of [r.profiles.winter, r.profiles.summer]) {
        for (const i of p.interfaces) {
          expect(i.p_v_pa).toBeLessThanOrEqual(i.p_v_linear_pa * (1 + 1e-9) + 1e-9);
          if (!i.condensing) continue;
          expect(i.p_v_pa).toBeCloseTo(i.p_sat_pa, 6);
        }
        expect(p.rate_g_m2_day).toBeGreaterThanOrEqual(0);
      }
    }),
    { numRuns: 200 },
  );
});
