import { expect, test } from "vitest";
import { runSiteCheck } from "~/envelope";
import { iecczoneKey, iecczoneRow, r70273Threshold } from "~/envelope/code-tables";
import type { AssemblyInput, CodeEdition } from "~/envelope/types";
import { loadLibrary } from "./library";

const lib = loadLibrary();
const E21: CodeEdition = "IECC/IRC 2021";
const E18: CodeEdition = "IECC/IRC 2018";

// IECC 2021 Table R402.1.3 via DOE/PNNL BASC (docs/references.md §6.1, C)
test.each([
  ["0-1", 30, ["13", "0+10ci"], 13],
  ["2", 49, ["13", "0+10ci"], 13],
  ["3", 49, ["20", "13+5ci", "0+15ci"], 19],
  ["4", 60, ["30", "20+5ci", "13+10ci", "0+20ci"], 19],
  ["5", 60, ["30", "20+5ci", "13+10ci", "0+20ci"], 30],
  ["7-8", 60, ["30", "20+5ci", "13+10ci", "0+20ci"], 38],
])(
  "IECC 2021 zone %s: ceiling R-%s, wall %j, floor R-%s — DOE/PNNL BASC table (docs/references.md §6.1, C)",
  (key, ceiling, wall, floor) => {
    const row = iecczoneRow(E21, key);
    expect(row.ceiling).toBe(ceiling);
    expect(row.wall).toEqual(wall);
    expect(row.floor).toBe(floor);
  },
);

// IECC 2012–2018 (docs/references.md §6.1, C)
test.each([
  ["2", 38, ["13"], [4, 6]],
  ["4", 49, ["20", "13+5"], [8, 13]],
  ["6", 49, ["20+5", "13+10"], [15, 20]],
  ["7-8", 49, ["20+5", "13+10"], [19, 21]],
])(
  "IECC 2018 zone %s: ceiling R-%s, wall %j, mass %j — DOE/PNNL BASC table (docs/references.md §6.1, C)",
  (key, ceiling, wall, mass) => {
    const row = iecczoneRow(E18, key);
    expect(row.ceiling).toBe(ceiling);
    expect(row.wall).toEqual(wall);
    expect(row.mass).toEqual(mass);
  },
);

test("marine 4 reads with zone 5 — IECC table column '5 & marine 4' (docs/references.md §6.1, C)", () => {
  expect(iecczoneKey({ zoneNumber: 4, moisture: "C" })).toBe("5");
  expect(iecczoneKey({ zoneNumber: 4, moisture: "A" })).toBe("4");
});

// IRC 2021 Table R702.7(3) (docs/references.md §6.2, C2 + M)
test.each([
  ["4C", 2.5, 3.75],
  ["5", 5, 7.5],
  ["6", 7.5, 11.25],
  ["7", 10, 15],
  ["8", 12.5, 20],
])(
  "IRC 2021 Table R702.7(3) zone %s: ci ≥ R-%s on 2×4, R-%s on 2×6 — third-party code notes checked against 2021 IBC 1404.3 (docs/references.md §6.2, C2)",
  (zone, w4, w6) => {
    expect(r70273Threshold(E21, zone, "2x4")).toBe(w4);
    expect(r70273Threshold(E21, zone, "2x6")).toBe(w6);
  },
);

test("IRC 2018 Table R702.7.1 combined 7 and 8 at R-10 / R-15 (docs/references.md §6.2, M — from memory)", () => {
  expect(r70273Threshold(E18, "8", "2x4")).toBe(10);
  expect(r70273Threshold(E18, "8", "2x6")).toBe(15);
});

function wall2x6(
  ciMm: number,
  interior: "latex" | "primer" = "latex",
  cladding = "fibre-cement-lap-siding",
): AssemblyInput {
  return {
    kind: "above-grade-wall",
    layers: [
      { role: "cladding", material: cladding, thickness_mm: 8 },
      { role: "water-resistive-barrier", material: "polymeric-housewrap", thickness_mm: 0.2 },
      ...(ciMm > 0 ? [{ role: "insulation", material: "xps-board", thickness_mm: ciMm }] : []),
      { role: "sheathing", material: "osb", thickness_mm: 11.1 },
      {
        role: "insulation",
        material: "fibreglass-batt",
        thickness_mm: 139.7,
        framing: { material: "softwood-lumber", fraction: 0.23 },
      },
      { role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 },
      {
        role: "interior-finish",
        material: interior === "latex" ? "latex-paint" : "vapour-retarder-primer",
        thickness_mm: 0.1,
      },
    ],
  };
}

test("2×6 R-21 + R-5 ci passes IECC 2021 zone 5 insulation (20+5ci) but not IRC R702.7(3) (needs R-7.5) — docs/references.md §6.2 test idea (C2)", () => {
  const r = runSiteCheck(wall2x6(25.4), { zone: "5A" }, lib);
  const wallRow = r.code.rows.find((x) => x.id === "iecc-wall");
  const ventRow = r.code.rows.find((x) => x.id === "irc-r702-7-3");
  expect(r.code.edition).toBe("IECC/IRC 2021");
  expect(wallRow?.pass).toBe(true);
  expect(wallRow?.note).toMatch(/20 cavity \+ R-5 continuous/);
  expect(ventRow?.pass).toBe(false);
  expect(ventRow?.required).toMatch(/R-7\.5/);
  expect(r.flags.find((f) => f.id === "exterior-foam-too-thin-for-class-iii")?.severity).toBe("stop");
});

test("the same wall with a Class II interior (vapour-retarder primer) is not governed by R702.7(3) — IRC 2021 R702.7 (docs/references.md §6.2, C2)", () => {
  const r = runSiteCheck(wall2x6(25.4, "primer"), { zone: "5A" }, lib);
  expect(r.vapour.interiorClass).toBe("II");
  expect(r.code.rows.find((x) => x.id === "irc-r702-7-3")?.pass).toBe(true);
});

test("R-7.5 of ci (1.5 in XPS) satisfies R702.7(3) zone 5 on 2×6 (docs/references.md §6.2, C2)", () => {
  const r = runSiteCheck(wall2x6(38.1), { zone: "5A" }, lib);
  expect(r.code.rows.find((x) => x.id === "irc-r702-7-3")?.pass).toBe(true);
});

test("vented cladding over OSB permits Class III in zone 5 but not in zone 6 — IRC 2021 Table R702.7(3) (docs/references.md §6.2, C2)", () => {
  const z5 = runSiteCheck(wall2x6(0, "latex", "vinyl-siding"), { zone: "5A" }, lib);
  expect(z5.code.rows.find((x) => x.id === "irc-r702-7-3")?.pass).toBe(true);
  const z6 = runSiteCheck(wall2x6(0, "latex", "vinyl-siding"), { zone: "6A" }, lib);
  expect(z6.code.rows.find((x) => x.id === "irc-r702-7-3")?.pass).toBe(false);
});

test("2×6 R-21 alone fails IECC 2021 zone 5 (needs 30, 20+5ci, 13+10ci or 0+20ci) and passes 2018 zone 5 (20) — DOE/PNNL tables (docs/references.md §6.1, C)", () => {
  const r21 = runSiteCheck(wall2x6(0), { zone: "5A" }, lib);
  expect(r21.code.rows.find((x) => x.id === "iecc-wall")?.pass).toBe(false);
  expect(r21.flags.some((f) => f.id === "insufficient-r-iecc-wall")).toBe(true);
  const r18 = runSiteCheck(wall2x6(0), { zone: "5A", edition: "IECC/IRC 2018" }, lib);
  expect(r18.code.edition).toBe("IECC/IRC 2018");
  expect(r18.code.rows.find((x) => x.id === "iecc-wall")?.pass).toBe(true);
});

test("basement wall zone 5: R-10 ci fails, R-15 ci passes (15ci or 19 or 13+5ci) — IECC 2021 (docs/references.md §6.1, C)", () => {
  const bw = (mm: number): AssemblyInput => ({
    kind: "basement-wall",
    layers: [
      { role: "structure", material: "cast-concrete", thickness_mm: 200 },
      { role: "insulation", material: "xps-board", thickness_mm: mm },
      { role: "thermal-barrier", material: "gypsum-board", thickness_mm: 12.7 },
    ],
  });
  expect(runSiteCheck(bw(50.8), { zone: "5A" }, lib).code.rows[0].pass).toBe(false);
  expect(runSiteCheck(bw(76.2), { zone: "5A" }, lib).code.rows[0].pass).toBe(true);
});

test("Class I interior is not permitted in zone 3 — IRC 2021 Table R702.7(2) (docs/references.md §6.2, M — from memory)", () => {
  const a = wall2x6(0);
  const withPoly: AssemblyInput = {
    ...a,
    layers: [
      ...a.layers.slice(0, 4),
      { role: "vapour-retarder", material: "polyethylene-sheet-6mil", thickness_mm: 0.15 },
      ...a.layers.slice(4),
    ],
  };
  const r = runSiteCheck(withPoly, { zone: "3A" }, lib);
  expect(r.code.rows.find((x) => x.id === "irc-r702-7-class")?.pass).toBe(false);
});

test("unvented roof, board above the deck over batts: R-20 needed in zone 5, R-5 in zone 1A — IRC 2021 Table R806.5 (zone 1A C via DOE/PNNL BASC; zone 5 M — from memory)", () => {
  const roof = (boardMm: number): AssemblyInput => ({
    kind: "roof",
    layers: [
      { role: "roofing", material: "asphalt-shingles", thickness_mm: 6 },
      { role: "underlayment", material: "synthetic-roof-underlayment", thickness_mm: 0.5 },
      { role: "sheathing", material: "osb", thickness_mm: 11.1 },
      { role: "insulation", material: "polyiso-foil-faced", thickness_mm: boardMm },
      { role: "structure", material: "plywood", thickness_mm: 15.9 },
      {
        role: "insulation",
        material: "fibreglass-batt",
        thickness_mm: 235,
        framing: { material: "softwood-lumber", fraction: 0.1 },
      },
      { role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 },
    ],
  });
  const row = (mm: number, zone: string) =>
    runSiteCheck(roof(mm), { zone }, lib).code.rows.find((x) => x.id === "irc-r806-5");
  expect(row(76.2, "5A")?.required).toBe("R-20");
  expect(row(76.2, "5A")?.pass).toBe(false); // 3 in polyiso ≈ R-18
  expect(row(88.9, "5A")?.pass).toBe(true); // 3.5 in ≈ R-21
  expect(row(25.4, "1A")?.pass).toBe(true);
});
