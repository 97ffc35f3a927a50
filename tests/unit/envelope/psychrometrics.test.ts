import { createRequire } from "node:module";
import { expect, test } from "vitest";
import {
  dewPoint,
  dewPointFromVapourPressure,
  relativeHumidity,
  saturationPressure,
  vapourPressure,
} from "~/envelope/psychrometrics";
import { cToF, fToC, paToPsi } from "~/envelope/units";

interface PsychroLib {
  SetUnitSystem(u: unknown): void;
  SI: unknown;
  GetSatVapPres(t: number): number;
  GetTDewPointFromRelHum(t: number, rh: number): number;
}
const psychrolib = createRequire(import.meta.url)("psychrolib") as PsychroLib;
psychrolib.SetUnitSystem(psychrolib.SI);

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

// docs/references.md §1.3, Hyland–Wexler column: ASHRAE HoF 2017 ch.1 eqs 5/6 via psychrolib@1.1.1 GetSatVapPres, status D
test.each([
  [-40, 12.845],
  [-30, 38.016],
  [-20, 103.26],
  [-10, 259.903],
  [-5, 401.764],
  [0, 611.154],
  [0.01, 611.657],
  [5, 872.487],
  [10, 1227.995],
  [15, 1705.448],
  [20, 2338.804],
  [25, 3169.216],
  [30, 4246.03],
  [40, 7383.46],
])("p_sat(%s °C) = %s Pa — ASHRAE HoF 2017 ch.1 eqs 5/6 table via psychrolib (docs/references.md §1.3, D)", (t, p) => {
  expect(saturationPressure(t)).toBeCloseTo(p, 2);
});

// Independent reference: psychrolib@1.1.1 run live (ASHRAE HoF 2017 ch.1 eqs 5/6), 1e-6 relative (docs/references.md §1.3 tolerance)
test.each([-60, -25, -0.5, 0.005, 0.02, 3, 17.3, 35, 60, 90])(
  "p_sat(%s °C) matches psychrolib GetSatVapPres — ASHRAE HoF 2017 ch.1 eqs 5/6 via psychrolib",
  (t) => {
    expect(rel(saturationPressure(t), psychrolib.GetSatVapPres(t))).toBeLessThan(1e-6);
  },
);

// CRC Handbook of Chemistry and Physics 1992-93, vapour pressure of water (docs/references.md §1.3, C), 0.1 %
test.each([
  [5, 872.6],
  [10, 1228.1],
  [15, 1705.6],
  [20, 2338.8],
  [25, 3169.0],
  [30, 4245.5],
  [40, 7381.4],
])("p_sat(%s °C) within 0.1 %% of CRC Handbook 1992-93 table %s Pa (docs/references.md §1.3, C)", (t, p) => {
  expect(rel(saturationPressure(t), p)).toBeLessThan(0.001);
});

test("at 0.01 °C the water branch gives the triple-point pressure 611.657 Pa — textbook triple point (docs/references.md §1.3, C)", () => {
  expect(saturationPressure(0.01)).toBeCloseTo(611.657, 2);
  // Below the triple point the result is over ice: 611.154 Pa at 0 °C (psychrolib, D) vs CRC over water 611.29 (C)
  expect(saturationPressure(0)).toBeLessThan(611.29);
});

// Magnus form, Alduchov & Eskridge 1996 eq.21 water (C) / eq.23 ice (M): within 0.3 % / 0.2 % (docs/references.md §1.2–1.3)
const magnusWater = (t: number): number => 610.94 * Math.exp((17.625 * t) / (t + 243.04));
const magnusIce = (t: number): number => 611.21 * Math.exp((22.587 * t) / (t + 273.86));
test.each([1, 10, 20, 30, 40])("p_sat(%s °C) within 0.3 %% of Magnus (Alduchov & Eskridge 1996 eq.21, C)", (t) => {
  expect(rel(saturationPressure(t), magnusWater(t))).toBeLessThan(0.003);
});
test.each([-40, -20, -5])(
  "p_sat(%s °C, ice) within 0.2 %% of Magnus ice (Alduchov & Eskridge 1996 eq.23, M — from memory)",
  (t) => {
    expect(rel(saturationPressure(t), magnusIce(t))).toBeLessThan(0.002);
  },
);

// Murphy & Koop 2005 eq.7 over ice (C, atmlab source comment): < 0.01 %
test.each([-40, -20, -10])(
  "p_sat(%s °C, ice) agrees with Murphy & Koop 2005 eq.7 (docs/references.md §1.3, C)",
  (t) => {
    const T = t + 273.15;
    const mk = Math.exp(9.550426 - 5723.265 / T + 3.53068 * Math.log(T) - 0.00728332 * T);
    expect(rel(saturationPressure(t), mk)).toBeLessThan(1e-4);
  },
);

// Dew points: psychrolib GetTDewPointFromRelHum (docs/references.md §1.4, D); tolerance 0.01 K
test.each([
  [20, 50, 9.272],
  [20, 60, 12.007],
  [21, 35, 4.97],
  [21, 40, 6.899],
  [21, 50, 10.191],
  [22, 30, 3.645],
  [30, 80, 26.169],
  [10, 50, 0.063],
  [0, 80, -2.683],
  [-10, 80, -12.49],
])(
  "dew point of %s °C / %s %% is %s °C — psychrolib GetTDewPointFromRelHum (docs/references.md §1.4, D)",
  (t, rh, td) => {
    expect(dewPoint(t, rh)).toBeCloseTo(td, 2);
  },
);

test("25 °C / 80 % has dew point 21.3094 °C — PsychroLib header worked example (docs/references.md §1.4, C)", () => {
  expect(dewPoint(25, 80)).toBeCloseTo(21.3094, 3);
  expect(dewPoint(25, 80)).toBeCloseTo(psychrolib.GetTDewPointFromRelHum(25, 0.8), 3); // psychrolib live
});

// IP dew points (docs/references.md §1.4 via psychrolib, D)
test.each([
  [70, 50, 50.53],
  [70, 40, 44.6],
  [70, 35, 41.12],
  [68, 50, 48.69],
])("dew point of %s °F / %s %% is %s °F — psychrolib IP (docs/references.md §1.4, D)", (tf, rh, tdf) => {
  expect(cToF(dewPoint(fToC(tf), rh))).toBeCloseTo(tdf, 1);
});

// IP saturation pressures, psychrolib IP (docs/references.md §1.4, D)
test.each([
  [32, 0.08864],
  [70, 0.363277],
  [0, 0.018502],
])("p_sat(%s °F) = %s psi — psychrolib IP (docs/references.md §1.4, D)", (tf, psi) => {
  expect(rel(paToPsi(saturationPressure(fToC(tf))), psi)).toBeLessThan(2e-5);
});

// Vapour pressures of the §1.4 table (D)
test.each([
  [20, 50, 1169.4],
  [21, 40, 995.07],
  [25, 80, 2535.37],
  [-10, 80, 207.92],
])("p_v(%s °C, %s %%) = %s Pa — docs/references.md §1.4 (D)", (t, rh, p) => {
  expect(vapourPressure(t, rh)).toBeCloseTo(p, 0);
});

test("dew point inverts saturation pressure across the triple point", () => {
  for (const t of [-50, -10, -0.1, 0.02, 5, 30]) {
    expect(dewPointFromVapourPressure(saturationPressure(t))).toBeCloseTo(t, 6);
    expect(relativeHumidity(t, saturationPressure(t))).toBeCloseTo(100, 9);
  }
});
