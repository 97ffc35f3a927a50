import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { expect, test } from "vitest";
import { parse } from "yaml";
import { materialSchema } from "~/envelope/material-schema";
import { materialRsi } from "~/envelope/layers";
import { dryCupPermeance, permeanceAtRh, retarderClass } from "~/envelope/vapour";
import { ngToPerm, rsiToRip } from "~/envelope/units";
import { loadLibrary } from "./library";

const lib = loadLibrary();
const m = (slug: string) => {
  const found = lib.get(slug);
  if (!found) throw new Error(`missing ${slug}`);
  return found;
};
const rIp = (slug: string, mm: number): number => rsiToRip(materialRsi(m(slug), mm));
const perm = (slug: string, mm: number): number => ngToPerm(dryCupPermeance(m(slug), mm));

test("every slug listed in docs/content-format.md has a valid material file, and no extras", () => {
  const doc = readFileSync(join(process.cwd(), "docs", "content-format.md"), "utf8");
  const section = doc.slice(doc.indexOf("Material slugs the demo"), doc.indexOf("## Details"));
  const listed = [...section.matchAll(/`([a-z0-9-]+)`/g)].map((x) => x[1]).sort();
  expect([...lib.keys()].sort()).toEqual(listed);
  for (const f of readdirSync(join(process.cwd(), "content", "materials"))) {
    const parsed = materialSchema.parse(parse(readFileSync(join(process.cwd(), "content", "materials", f), "utf8")));
    expect(`${parsed.slug}.yaml`).toBe(f);
  }
});

test("the schema refuses a value without a status, and both conductivity and rsi_fixed", () => {
  const base = parse(readFileSync(join(process.cwd(), "content", "materials", "xps-board.yaml"), "utf8")) as Record<
    string,
    Record<string, unknown>
  >;
  expect(materialSchema.safeParse({ ...base, thermal: { conductivity_w_mk: 0.03, source: "a page" } }).success).toBe(
    false,
  );
  expect(
    materialSchema.safeParse({ ...base, thermal: { conductivity_w_mk: 0.03, rsi_fixed: 0, source: "x, M" } }).success,
  ).toBe(false);
  expect(materialSchema.safeParse(base).success).toBe(true);
});

// Material R-values (docs/references.md §3)
test.each([
  ["xps-board", 25.4, 5.0, "PLTW chart 'extruded polystyrene 5.0/in' (docs/references.md §3, C2)"],
  ["gypsum-board", 12.7, 0.45, "buildex table from 1997 ASHRAE HoF ch.24 (docs/references.md §3, C2)"],
  ["plywood", 12.7, 0.62, "buildex ASHRAE 1997 row (docs/references.md §3, C2)"],
  ["osb", 11.1, 0.62, "ASHRAE 2009+ OSB 7/16 in (docs/references.md §3, M — from memory)"],
  ["fibreboard-sheathing", 12.7, 1.32, "buildex ASHRAE 1997 (docs/references.md §3, C2)"],
  ["softwood-lumber", 88.9, 4.38, "'3½ in stud 4.38' (docs/references.md §3, C2)"],
  ["softwood-lumber", 139.7, 6.88, "'2×6 6.88' (docs/references.md §3, C2)"],
  ["brick-veneer", 101.6, 0.44, "'4 in face brick 0.44' worked answer (docs/references.md §3, C2)"],
  ["cast-concrete", 203.2, 0.64, "PLTW concrete 0.08/in (docs/references.md §3, C2)"],
  ["vinyl-siding", 1, 0.61, "PLTW hollow-backed siding (docs/references.md §3, C2)"],
  ["asphalt-shingles", 1, 0.44, "PLTW asphalt shingles (docs/references.md §3, C2)"],
  ["building-paper-grade-d", 1, 0.06, "PLTW building paper (docs/references.md §3, C2)"],
  ["fibreglass-batt", 139.7, 21, "R-21 batt at 5.5 in, nominal label (docs/references.md §3, M — from memory)"],
  ["hollow-cmu", 193.7, 1.11, "PLTW 8 in hollow CMU 0.97–1.11 (docs/references.md §3, C2)"],
])("%s at %s mm is R-%s — %s", (slug, mm, r) => {
  expect(rIp(slug, mm)).toBeCloseTo(r, 1);
});

test("wood bevel siding 1/2 in is RSI 0.14 — Çengel example layer (docs/references.md §4.1, C)", () => {
  expect(materialRsi(m("wood-bevel-siding"), 12.7)).toBeCloseTo(0.143, 2);
});

// Permeance and class (docs/references.md §5)
test.each([
  ["xps-board", 25.4, 1.1, "III", "BSC Guide to Insulating Sheathing, 1.1 perm at 1 in (C2)"],
  ["xps-board", 50.8, 0.55, "II", "BSC Guide to Insulating Sheathing, 2 in XPS is Class II at 0.55 perm (C2)"],
  [
    "polyethylene-sheet-6mil",
    0.15,
    0.06,
    "I",
    "IRC 2021 Table R702.7(1): sheet polyethylene is Class I (C); 0.06 perm ASHRAE (M — from memory)",
  ],
  [
    "polyethylene-sheet-10mil",
    0.25,
    0.03,
    "I",
    "ASHRAE HoF ch.26 Table 2 10 mil (M — from memory); Class I by R702.7(1) (C)",
  ],
  ["kraft-facing", 0.1, 0.4, "II", "IRC 2021 Table R702.7(1): kraft-faced batts are Class II (C)"],
  ["latex-paint", 0.1, 5, "III", "IRC 2021 Table R702.7(1): latex paint is Class III (C); 5 perm builder page (C2)"],
  ["polyiso-foil-faced", 50, 0.05, "I", "BSC Info-312, foil-faced polyiso ≤ 0.05 perm at any thickness (C2)"],
  [
    "vapour-retarder-primer",
    0.1,
    0.6,
    "II",
    "IRC 2021 Table R702.7(1): vapour-retarder paint Class II (C); 0.6 perm (M — from memory)",
  ],
  [
    "cast-concrete",
    203.2,
    0.4,
    "II",
    "ASHRAE HoF ch.26 Table 2, 8 in concrete ≈ 0.4 perm (docs/references.md §5.2, M — from memory)",
  ],
  [
    "fibreglass-batt",
    139.7,
    21.1,
    "permeable",
    "116 perm-in → ≈ 21 perm at 5.5 in (docs/references.md §5.2, M — from memory)",
  ],
  ["polymeric-housewrap", 0.2, 35, "permeable", "housewrap 35 perm builder page (docs/references.md §5.2, C2)"],
])("%s at %s mm: %s perm, Class %s — %s", (slug, mm, p, cls) => {
  expect(perm(slug, mm)).toBeCloseTo(p, 1);
  expect(retarderClass(dryCupPermeance(m(slug), mm))).toBe(cls);
});

test("class boundaries are the IRC R702.7(1) definitions: 0.1 / 1.0 / 10 perm inclusive — IRC 2021 Table R702.7(1) via DOE/PNNL BASC (C)", () => {
  const ng = (p: number) => p * 57.2135;
  expect(retarderClass(ng(0.1))).toBe("I");
  expect(retarderClass(ng(0.1001))).toBe("II");
  expect(retarderClass(ng(1.0))).toBe("II");
  expect(retarderClass(ng(1.0001))).toBe("III");
  expect(retarderClass(ng(10))).toBe("III");
  expect(retarderClass(ng(10.001))).toBe("permeable");
});

test("plywood opens with humidity: ≈1 perm at 50 % RH, ≈10 perm at 90 % RH — APA data via performancepanels.com (docs/references.md §5.2, C2)", () => {
  expect(ngToPerm(permeanceAtRh(m("plywood"), 12.7, 50))).toBeCloseTo(1, 2);
  expect(ngToPerm(permeanceAtRh(m("plywood"), 12.7, 90))).toBeCloseTo(10, 1);
});

test("variable-permeance retarder is Class II dry and above 10 perm humid (docs/references.md §5.2, M — from memory)", () => {
  const v = m("variable-permeance-retarder");
  expect(retarderClass(dryCupPermeance(v, 0.2))).toBe("II");
  expect(ngToPerm(permeanceAtRh(v, 0.2, 85))).toBeGreaterThan(10);
});
