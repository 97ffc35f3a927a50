import { expect, test } from "vitest";
import { assemblyRValue, runSiteCheck } from "~/envelope";
import { analyseThermal } from "~/envelope/thermal";
import { resolveAssembly } from "~/envelope/layers";
import type { AssemblyInput } from "~/envelope/types";
import { fixedMaterial, fixedRsiMaterial, libraryOf, loadLibrary } from "./library";

// Çengel, Heat and Mass Transfer, "The R-value of a wood frame wall" (docs/references.md §4.1): inputs C, results D.
function cengelWall(insulationRsi: number) {
  const lib = libraryOf(
    fixedRsiMaterial("siding", 0.14),
    fixedRsiMaterial("fibreboard", 0.23),
    fixedRsiMaterial("glass-fibre", insulationRsi, { family: "fibrous-insulation" }),
    fixedRsiMaterial("stud", 0.63, { family: "lumber" }),
    fixedRsiMaterial("gypsum", 0.079, { family: "gypsum" }),
  );
  const assembly: AssemblyInput = {
    kind: "above-grade-wall",
    layers: [
      { role: "cladding", material: "siding", thickness_mm: 13 },
      { role: "sheathing", material: "fibreboard", thickness_mm: 13 },
      { role: "insulation", material: "glass-fibre", thickness_mm: 90, framing: { material: "stud", fraction: 0.25 } },
      { role: "interior-finish", material: "gypsum", thickness_mm: 13 },
    ],
  };
  return analyseThermal(resolveAssembly(assembly, lib));
}

test.each([
  [2.45, 2.225, 0.4494, 2.022, 0.4947],
  [2.52, 2.253, 0.4439, 2.039, 0.4904],
])(
  "Çengel wood-frame wall, insulation RSI %s: parallel path R %s / U %s, isothermal planes R %s / U %s — Çengel (docs/references.md §4.1, inputs C, results D)",
  (ins, rpp, upp, riso, uiso) => {
    const t = cengelWall(ins);
    // Films here are the IP 0.17/0.68 (RSI 0.0299/0.1198) versus the example's 0.03/0.12: 0.0003 apart.
    expect(t.parallelPath?.rsi).toBeCloseTo(rpp, 2);
    expect(t.parallelPath?.u_si).toBeCloseTo(upp, 3);
    expect(t.rsi).toBeCloseTo(riso, 2);
    expect(t.u_si).toBeCloseTo(uiso, 3);
  },
);

test("Çengel textbook answer U ≈ 0.449 W/m²K, R ≈ 2.23 with RSI 2.45 insulation (docs/references.md §4.1, M — from memory)", () => {
  expect(cengelWall(2.45).parallelPath?.u_si).toBeCloseTo(0.449, 2);
});

// docs/references.md §4.2 IP check walls (D): films 0.68/0.17, gypsum 0.45, OSB 0.62, vinyl 0.61, studs 1.25/in, framing 25 %.
function ipWall(cavityR: number, depthIn: number, ciR = 0) {
  const lib = loadLibrary();
  const extra = libraryOf(
    fixedMaterial("cavity", cavityR, 20, { family: "fibrous-insulation" }),
    fixedMaterial("ci", ciR || 0.0001, 1.1, { family: "foam-board" }),
    fixedMaterial("gyp", 0.45, 37),
    fixedMaterial("osb7", 0.62, 0.75),
    fixedMaterial("vinyl", 0.61, 40),
  );
  const all = new Map([...lib, ...extra]);
  const layers = [
    { role: "cladding", material: "vinyl", thickness_mm: 1 },
    ...(ciR ? [{ role: "insulation", material: "ci", thickness_mm: 25.4 }] : []),
    { role: "sheathing", material: "osb7", thickness_mm: 11.1 },
    {
      role: "insulation",
      material: "cavity",
      thickness_mm: depthIn * 25.4,
      framing: { material: "softwood-lumber", fraction: 0.25 },
    },
    { role: "interior-finish", material: "gyp", thickness_mm: 12.7 },
  ];
  return analyseThermal(resolveAssembly({ kind: "above-grade-wall", layers }, all));
}

test.each([
  [13, 3.5, 0, 0.0845, 11.83],
  [21, 5.5, 0, 0.05846, 17.11],
  [21, 5.5, 5, 0.04364, 22.91],
])(
  "IP check wall R-%s cavity (%s in studs) + R-%s ci: parallel-path U %s, R-%s — docs/references.md §4.2 (D)",
  (cav, depth, ci, u, r) => {
    const t = ipWall(cav, depth, ci);
    expect(t.parallelPath?.u_ip).toBeCloseTo(u, 4);
    expect(t.parallelPath?.r_ip).toBeCloseTo(r, 1);
  },
);

test("WSEC R-21 intermediate framing wall lands near U-0.057 — WAC 51-11-0530 Table 5-1 / WSEC R402.1.2 (C, ±0.003 plausibility per docs/references.md §4.2)", () => {
  const lib = loadLibrary();
  const all = new Map([
    ...lib,
    ...libraryOf(
      fixedMaterial("cav21", 21, 20, { family: "fibrous-insulation" }),
      fixedMaterial("stud1", 5.5, 1, { family: "lumber" }),
      fixedMaterial("hdr", 5.5, 1, { family: "lumber" }),
    ),
  ]);
  // Studs 0.18 and headers 0.04 of area are both solid wood at ≈1.0/in: framing 0.22.
  const t = analyseThermal(
    resolveAssembly(
      {
        kind: "above-grade-wall",
        layers: [
          { role: "cladding", material: "wood-bevel-siding", thickness_mm: 12.7 },
          { role: "sheathing", material: "plywood", thickness_mm: 12.7 },
          {
            role: "insulation",
            material: "cav21",
            thickness_mm: 139.7,
            framing: { material: "stud1", fraction: 0.22 },
          },
          { role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 },
        ],
      },
      all,
    ),
  );
  expect(Math.abs((t.parallelPath?.u_ip ?? 0) - 0.057)).toBeLessThan(0.003);
});

test("air films: inside vertical R-0.68, outside R-0.17, heat-flow-up ceiling R-0.61 — WAC 51-11-0526 (C)", () => {
  const lib = loadLibrary();
  const wall = assemblyRValue(
    { kind: "above-grade-wall", layers: [{ role: "sheathing", material: "polymeric-housewrap", thickness_mm: 0.2 }] },
    lib,
  );
  expect(wall.r_ip).toBeCloseTo(0.85, 6);
  const roof = assemblyRValue(
    { kind: "roof", layers: [{ role: "roofing", material: "polymeric-housewrap", thickness_mm: 0.2 }] },
    lib,
  );
  expect(roof.r_ip).toBeCloseTo(0.61 + 0.17, 6);
});

test("below grade: no exterior film; the soil face is held at the ground temperature", () => {
  const lib = loadLibrary();
  const r = runSiteCheck(
    {
      kind: "basement-wall",
      layers: [
        { role: "structure", material: "cast-concrete", thickness_mm: 200 },
        { role: "insulation", material: "xps-board", thickness_mm: 50.8 },
        { role: "thermal-barrier", material: "gypsum-board", thickness_mm: 12.7 },
      ],
    },
    { zone: "5A", ground_t_c: 8 },
    lib,
  );
  expect(r.thermal.films.map((f) => f.side)).toEqual(["interior"]);
  expect(r.profiles.winter.interfaces[0].t_c).toBe(8);
  expect(r.thermal.method).toMatch(/no exterior film/);
});
