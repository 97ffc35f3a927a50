import { describe, expect, test } from "vitest";
import { runSiteCheck } from "~/envelope";
import { resolveSite } from "~/envelope/climate";
import type { SiteCheckInputError } from "~/envelope/errors";
import {
  NBC_EFFECTIVE_RSI,
  NBC_ZONES,
  NBC_VAPOUR_BARRIER_NG,
  NBC_ZONE_BANDS,
  outboardRatioAt,
  PROVINCE_REFERENCE,
} from "~/envelope/nbc-tables";
import type { LayerInput } from "~/envelope/types";
import { fixedRsiMaterial, libraryOf } from "./library";

describe("NBC 2020 table rows (docs/references.md §6.3)", () => {
  test.each([
    [3000, 0.2],
    [4999, 0.2],
    [5000, 0.3],
    [5999, 0.3],
    [6000, 0.35],
    [7500, 0.4],
    [8000, 0.5],
    [9999, 0.55],
    [10000, 0.6],
    [11999, 0.65],
    [12000, 0.75],
    [15000, 0.75],
  ])("Table 9.25.5.2: %s HDD → ratio %s (HDD bands C2, ratios from memory)", (hdd, ratio) => {
    expect(outboardRatioAt(hdd)).toBe(ratio);
  });

  const byZone = (row: Readonly<Record<string, number>>) => NBC_ZONES.map((z) => row[z]);
  test("Table 9.36.2.6.-A, without HRV, effective RSI by zone 4/5/6/7A/7B/8 (C2, copy of the BC Building Code table)", () => {
    expect(byZone(NBC_EFFECTIVE_RSI.wall.byZone)).toEqual([2.78, 3.08, 3.08, 3.08, 3.85, 3.85]);
    expect(byZone(NBC_EFFECTIVE_RSI["attic-ceiling"].byZone)).toEqual([6.91, 8.67, 8.67, 10.43, 10.43, 10.43]);
    expect(byZone(NBC_EFFECTIVE_RSI["cathedral-roof"].byZone)).toEqual([4.67, 4.67, 4.67, 5.02, 5.02, 5.02]);
    expect(byZone(NBC_EFFECTIVE_RSI["floor-over-unheated"].byZone)).toEqual([4.67, 4.67, 4.67, 5.02, 5.02, 5.02]);
    expect(NBC_EFFECTIVE_RSI["foundation-wall"]).toMatchObject({ table: "Table 9.36.2.8.-A", status: "M" });
  });

  test("zones by HDD below 18 °C, Table 9.36.2.6.-A heading (C2); vapour barrier 60 ng/(Pa·s·m²), 9.25.4.2 (C2)", () => {
    expect(NBC_ZONES).toEqual(["4", "5", "6", "7A", "7B", "8"]);
    expect(NBC_ZONE_BANDS["4"].to).toBe(2999);
    expect(NBC_ZONE_BANDS["7A"]).toMatchObject({ from: 5000, to: 5999 });
    expect(NBC_ZONE_BANDS["8"].to).toBeNull();
    expect(NBC_VAPOUR_BARRIER_NG).toBe(60);
  });
});

// Fixture wall with stated RSI and permeance (ng/(Pa·s·m²)), outside → inside:
// foil-faced board RSI 0.88, 2.9 ng (low permeance); fill RSI 3.34; polyethylene 3.4 ng; gypsum RSI 0.08.
const lib = libraryOf(
  fixedRsiMaterial("foil-board", 0.88, { family: "foam-board", vapour: { permeance_ng: 2.9, source: "fixture, D" } }),
  fixedRsiMaterial("thin-fill", 2.0, {
    family: "fibrous-insulation",
    vapour: { permeance_ng: 2000, source: "fixture, D" },
  }),
  fixedRsiMaterial("fill", 3.34, {
    family: "fibrous-insulation",
    vapour: { permeance_ng: 2000, source: "fixture, D" },
  }),
  fixedRsiMaterial("poly", 0, { family: "sheet-retarder", vapour: { permeance_ng: 3.4, source: "fixture, D" } }),
  fixedRsiMaterial("gyp", 0.08, { family: "gypsum", vapour: { permeance_ng: 2000, source: "fixture, D" } }),
  fixedRsiMaterial("panel", 0.1, { family: "wood-panel", vapour: { permeance_ng: 40, source: "fixture, D" } }),
  fixedRsiMaterial("vent", 0.15, { family: "air-space", vapour: { permeance_ng: 100000, source: "fixture, D" } }),
);
const L = (role: string, material: string): LayerInput => ({ role, material, thickness_mm: 10 });
const wall = (...layers: LayerInput[]) => ({ kind: "above-grade-wall" as const, layers });
const standard = wall(
  L("insulation", "foil-board"),
  L("insulation", "fill"),
  L("vapour-retarder", "poly"),
  L("interior-finish", "gyp"),
);
const rowsFor = (w: ReturnType<typeof wall>, site: object) => runSiteCheck(w, site, lib).code;

describe("a Canadian site is compared with NBC 2020", () => {
  test("the result names the code, the NBC zone, and asks for SI first", () => {
    const r = runSiteCheck(standard, { country: "CA", hdd18: 4500 }, lib);
    expect(r.code.edition).toBe("NBC 2020");
    expect(r.site.country).toBe("CA");
    expect(r.site.preferredUnits).toBe("SI");
    expect(r.site.canada).toMatchObject({ nbcZone: "6", hdd18: 4500, hddSource: "given", edition: "NBC 2020" });
    expect(runSiteCheck(standard, { zone: "5A" }, lib).site).toMatchObject({
      country: "US",
      preferredUnits: "IP",
      canada: null,
    });
  });

  test("9.25.5.2: outboard 0.88 / inboard 3.42 = 0.257 passes at 4500 HDD (0.20) and fails at 5500 HDD (0.30)", () => {
    const at = (hdd18: number) => rowsFor(standard, { country: "CA", hdd18 }).rows.find((r) => r.id === "nbc-9-25-5-2");
    expect(at(4500)).toMatchObject({
      pass: true,
      required: "outboard : inboard thermal resistance ≥ 0.20",
      provided: "0.26",
    });
    expect(at(5500)).toMatchObject({ pass: false, required: "outboard : inboard thermal resistance ≥ 0.30" });
    expect(at(5500)?.label).toContain("Table 9.25.5.2");
  });

  test("9.25.5.2 does not read a low-permeance layer outboard of a ventilated cavity, nor wood-based sheathing", () => {
    const vented = wall(
      L("insulation", "foil-board"),
      L("drainage-gap", "vent"),
      L("insulation", "fill"),
      L("vapour-retarder", "poly"),
      L("interior-finish", "gyp"),
    );
    expect(rowsFor(vented, { country: "CA", hdd18: 9000 }).rows.map((r) => r.id)).not.toContain("nbc-9-25-5-2");
    const panel = wall(
      L("sheathing", "panel"),
      L("insulation", "fill"),
      L("vapour-retarder", "poly"),
      L("interior-finish", "gyp"),
    );
    expect(rowsFor(panel, { country: "CA", hdd18: 9000 }).rows.map((r) => r.id)).not.toContain("nbc-9-25-5-2");
  });

  test("9.25.4: polyethylene inboard of the insulation is a vapour barrier; painted gypsum alone is not", () => {
    const vb = (w: ReturnType<typeof wall>) => rowsFor(w, { province: "ON" }).rows.find((r) => r.id === "nbc-9-25-4");
    expect(vb(standard)?.pass).toBe(true);
    expect(vb(wall(L("insulation", "foil-board"), L("insulation", "fill"), L("interior-finish", "gyp")))?.pass).toBe(
      false,
    );
  });

  test("9.36.2.6: effective RSI with films, 4.43 passes the zone 8 wall row (3.85); 3.11 passes 7A (3.08) and fails 7B (3.85)", () => {
    const eff = (w: ReturnType<typeof wall>, nbcZone: string) =>
      rowsFor(w, { nbcZone }).rows.find((r) => r.id === "nbc-9-36-2-6");
    expect(eff(standard, "8")?.pass).toBe(true);
    const thin = wall(
      L("insulation", "foil-board"),
      L("insulation", "thin-fill"),
      L("vapour-retarder", "poly"),
      L("interior-finish", "gyp"),
    );
    expect(eff(thin, "7A")).toMatchObject({
      pass: true,
      required: "effective RSI ≥ 3.08",
      provided: "effective RSI 3.11",
    });
    expect(eff(thin, "7B")).toMatchObject({ pass: false, required: "effective RSI ≥ 3.85" });
    expect(eff(thin, "7B")?.label).toContain("Table 9.36.2.6.-A");
  });
});

describe("Canadian site by province, NBC zone or HDD", () => {
  test("a province alone takes its reference place's HDD (NBC Appendix C, from memory) and says so", () => {
    const s = resolveSite({ province: "MB" });
    expect(s.canada).toMatchObject({
      province: "MB",
      hdd18: PROVINCE_REFERENCE.MB.hdd18,
      hddSource: "province",
      place: "Winnipeg",
      nbcZone: "7A",
    });
    expect(s.hdd18).toBe(5670);
    expect(s.zone).toBe("7");
    expect(s.notes.join(" ")).toContain("Winnipeg");
  });
  test("an NBC zone alone takes the cold end of its band; zone 8 without HDD reads the strictest 9.25.5.2 row", () => {
    expect(resolveSite({ nbcZone: "6", moisture: "A" }).canada).toMatchObject({ hdd18: 4999, hddSource: "nbc-zone" });
    const row = rowsFor(standard, { nbcZone: "8" }).rows.find((r) => r.id === "nbc-9-25-5-2");
    expect(row?.required).toContain("0.75");
    expect(row?.label).toContain("enter the HDD");
  });
  test("bad Canadian input is a field error", () => {
    const fieldOf = (site: object) => {
      try {
        resolveSite(site);
        return null;
      } catch (e) {
        return (e as SiteCheckInputError).field;
      }
    };
    expect(fieldOf({ province: "XX" })).toBe("province");
    expect(fieldOf({ nbcZone: "9" })).toBe("nbcZone");
    expect(fieldOf({ country: "CA" })).toBe("hdd18");
    expect(fieldOf({ country: "US", province: "ON" })).toBe("country");
  });
});
