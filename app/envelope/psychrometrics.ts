// Saturation pressure by ASHRAE Handbook—Fundamentals 2017 ch.1 Eqs. 5 (ice) and 6 (water),
// the Hyland–Wexler formulation (coefficients: docs/references.md §1.1). Below the triple point
// (0.01 °C) the result is over ice, so a "dew point" there is a frost point: that is what
// matters for frost on the back of cold sheathing.
import { SiteCheckInputError } from "./errors";

const TRIPLE_POINT_C = 0.01;
const KELVIN = 273.15;

function lnSatIce(tK: number): number {
  return (
    -5.6745359e3 / tK +
    6.3925247 +
    -9.677843e-3 * tK +
    6.2215701e-7 * tK ** 2 +
    2.0747825e-9 * tK ** 3 +
    -9.484024e-13 * tK ** 4 +
    4.1635019 * Math.log(tK)
  );
}

function lnSatWater(tK: number): number {
  return (
    -5.8002206e3 / tK +
    1.3914993 +
    -4.8640239e-2 * tK +
    4.1764768e-5 * tK ** 2 +
    -1.4452093e-8 * tK ** 3 +
    6.5459673 * Math.log(tK)
  );
}

function dLnSat(tK: number, overIce: boolean): number {
  return overIce
    ? 5.6745359e3 / tK ** 2 -
        9.677843e-3 +
        2 * 6.2215701e-7 * tK +
        3 * 2.0747825e-9 * tK ** 2 -
        4 * 9.484024e-13 * tK ** 3 +
        4.1635019 / tK
    : 5.8002206e3 / tK ** 2 - 4.8640239e-2 + 2 * 4.1764768e-5 * tK - 3 * 1.4452093e-8 * tK ** 2 + 6.5459673 / tK;
}

/** Validity of Eqs. 5/6: −100…200 °C. */
export const PSYCHRO_MIN_C = -100;
export const PSYCHRO_MAX_C = 200;

function checkTemperature(tC: number, field: string): void {
  if (!Number.isFinite(tC) || tC < PSYCHRO_MIN_C || tC > PSYCHRO_MAX_C) {
    throw new SiteCheckInputError(field, `temperature ${tC} °C is outside −100…200 °C`);
  }
}

function checkRh(rh: number, field: string): void {
  if (!Number.isFinite(rh) || rh < 0 || rh > 100) {
    throw new SiteCheckInputError(field, `relative humidity ${rh} % must be between 0 and 100`);
  }
}

// A site checked again (a detail page, a pack, the content re-check) asks for the same interface
// temperatures again: remember recent answers (the function is pure; a full table starts again).
const MAX_REMEMBERED = 4096;
const remembered = new Map<number, number>();

/** Saturation vapour pressure, Pa (over ice below 0.01 °C). */
export function saturationPressure(tC: number): number {
  const known = remembered.get(tC);
  if (known !== undefined) return known;
  checkTemperature(tC, "temperature");
  const tK = tC + KELVIN;
  const p = Math.exp(tC < TRIPLE_POINT_C ? lnSatIce(tK) : lnSatWater(tK));
  if (remembered.size >= MAX_REMEMBERED) remembered.clear();
  remembered.set(tC, p);
  return p;
}

/** Vapour pressure, Pa, of air at tC and rh (percent, 0–100). */
export function vapourPressure(tC: number, rh: number): number {
  checkRh(rh, "rh");
  return (saturationPressure(tC) * rh) / 100;
}

/** Relative humidity (percent) of vapour pressure pv at tC; may exceed 100 where condensing. */
export function relativeHumidity(tC: number, pv: number): number {
  return (100 * pv) / saturationPressure(tC);
}

/** Temperature (°C) at which the saturation pressure equals pv: Newton on ln p, as PsychroLib
 * does, with the ice/water switch at the triple point. Frost point below 0.01 °C. */
export function dewPointFromVapourPressure(pv: number): number {
  if (!Number.isFinite(pv) || pv <= 0) {
    throw new SiteCheckInputError("vapourPressure", `vapour pressure ${pv} Pa must be above zero`);
  }
  const lnP = Math.log(pv);
  const lnTriple = lnSatWater(TRIPLE_POINT_C + KELVIN);
  const overIce = lnP < lnTriple;
  // Magnus start is within a degree; a few Newton steps reach 1e-9 K.
  const g = Math.log(pv / 610.94);
  let tC = (243.04 * g) / (17.625 - g);
  for (let i = 0; i < 50; i++) {
    const tK = tC + KELVIN;
    const f = (overIce ? lnSatIce(tK) : lnSatWater(tK)) - lnP;
    const step = f / dLnSat(tK, overIce);
    tC -= step;
    if (Math.abs(step) < 1e-9) break;
  }
  return tC;
}

/** Dew point (frost point below 0.01 °C) of air at tC and rh percent; clamped to ≤ tC. */
export function dewPoint(tC: number, rh: number): number {
  checkRh(rh, "rh");
  if (rh === 0) {
    throw new SiteCheckInputError("rh", "relative humidity 0 % has no dew point");
  }
  return Math.min(tC, dewPointFromVapourPressure(vapourPressure(tC, rh)));
}
