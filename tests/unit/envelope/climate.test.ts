import { expect, test } from "vitest";
import {
  CLIMATE_ZONES,
  moistureRegimeFromNormals,
  nbcZoneFromHdd,
  resolveSite,
  zoneNumberFromDegreeDays,
} from "~/envelope";

// IECC 2021 / ASHRAE 169-2013 thermal criteria (docs/references.md §6.3, C2 via NTNU BuildME table citing DOE guide)
test.each([
  [0, 6001, 0],
  [0, 6000, 1],
  [0, 5001, 1],
  [0, 5000, 2],
  [0, 3501, 2],
  [2000, 3500, 3],
  [2001, 2000, 4],
  [3000, 1500, 4],
  [3001, 1000, 5],
  [4000, 800, 5],
  [4001, 600, 6],
  [5000, 500, 6],
  [5001, 300, 7],
  [7000, 100, 7],
  [7001, 50, 8],
])(
  "HDD18 %s, CDD10 %s → zone %s — ASHRAE 169-2013 / IECC 2021 thresholds (docs/references.md §6.3, C2)",
  (hdd, cdd, zone) => {
    expect(zoneNumberFromDegreeDays(hdd, cdd)).toBe(zone);
  },
);

test("IP bases: HDD65 7200 → zone 5, 7201 → zone 6 (docs/references.md §6.3, C2)", () => {
  expect(resolveSite({ hdd65: 7200, cdd50: 1000, moisture: "A" }).zone).toBe("5A");
  expect(resolveSite({ hdd65: 7201, cdd50: 1000, moisture: "A" }).zone).toBe("6A");
  expect(resolveSite({ hdd65: 13000, cdd50: 100 }).zone).toBe("8");
});

// Canada NBC Table 9.36.2.6.-A (BC Building Code copy, docs/references.md §6.3, C2)
test.each([
  [2999, "4"],
  [3000, "5"],
  [4999, "6"],
  [5000, "7A"],
  [6999, "7B"],
  [7000, "8"],
])("NBC 9.36 zone for HDD %s is %s — BC Building Code Table 9.36.2.6.-A (docs/references.md §6.3, C2)", (hdd, zone) => {
  expect(nbcZoneFromHdd(hdd)).toBe(zone);
});

// Moisture regimes (ASHRAE 169 / IECC R301.3, docs/references.md §6.3, M — from memory)
test("dry when P_cm < 2·(T + 7); marine when all four marine criteria hold — ASHRAE 169 (docs/references.md §6.3, M — from memory)", () => {
  const base = {
    annual_mean_c: 10,
    coldest_month_mean_c: 0,
    warmest_month_mean_c: 25,
    months_above_10c: 6,
    wettest_cold_month_mm: 60,
    driest_warm_month_mm: 40,
  };
  expect(moistureRegimeFromNormals({ ...base, annual_precip_mm: 330 })).toBe("B"); // 33 cm < 34
  expect(moistureRegimeFromNormals({ ...base, annual_precip_mm: 350 })).toBe("A");
  expect(
    moistureRegimeFromNormals({
      ...base,
      annual_precip_mm: 1000,
      warmest_month_mean_c: 18,
      coldest_month_mean_c: 5,
      wettest_cold_month_mm: 150,
      driest_warm_month_mm: 20,
    }),
  ).toBe("C");
});

test("zone list runs 0A…8 with marine only in 3–5", () => {
  expect(CLIMATE_ZONES[0]).toBe("0A");
  expect(CLIMATE_ZONES[CLIMATE_ZONES.length - 1]).toBe("8");
  expect(CLIMATE_ZONES.filter((z) => z.endsWith("C"))).toEqual(["3C", "4C", "5C"]);
});

test("resolveSite fills defaults and says which ones", () => {
  const s = resolveSite({ zone: "5A" });
  expect(s.zoneSource).toBe("given");
  expect(s.indoor).toMatchObject({ t_c: 21, rh: 40, summer_t_c: 24, summer_rh: 50, method: "ashrae-160-simplified" });
  expect(s.defaulted).toContain("indoor.rh");
  expect(s.defaulted).toContain("winter.t_c");
  expect(s.summer.cladding_t_c).toBe(s.summer.t_c + 15);
  expect(resolveSite({ zone: 6, moisture: "B" }).zone).toBe("6B");
  expect(
    resolveSite({
      hdd18: 4500,
      cdd10: 500,
      normals: {
        annual_mean_c: 5,
        annual_precip_mm: 900,
        coldest_month_mean_c: -8,
        warmest_month_mean_c: 21,
        months_above_10c: 5,
        wettest_cold_month_mm: 80,
        driest_warm_month_mm: 60,
      },
    }).zone,
  ).toBe("6A");
});

test("default winter indoor RH follows the ASHRAE 160 simplified method (40 % at ≤ −10 °C, 70 % at ≥ 20 °C; ASHRAE 160-2016 §4.3.1.1, from memory) and says so", () => {
  const cold = resolveSite({ zone: "6A", winter: { t_c: -23 } });
  expect(cold.indoor.rh).toBe(40);
  expect(cold.indoor.basis).toBe("indoor 21 °C / 40 % RH, by the ASHRAE 160 simplified method at −23 °C outdoors");
  expect(resolveSite({ zone: "2A", winter: { t_c: 5 } }).indoor.rh).toBeCloseTo(55, 9);
  const given = resolveSite({ zone: "5A", indoor: { rh: 35 } });
  expect(given.indoor).toMatchObject({ rh: 35, method: "given" });
  expect(given.indoor.basis).toBe("indoor 21 °C / 35 % RH, as entered");
  expect(given.defaulted).not.toContain("indoor.rh");
});
