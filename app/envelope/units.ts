// The one place where inch-pound and SI meet. Storage and computation are SI;
// these helpers convert for display and for IP inputs.

/** 1 h·ft²·°F/Btu in m²·K/W (from 1 ft = 0.3048 m, Btu_IT = 1055.05585 J; docs/references.md §2). */
export const RSI_PER_RIP = 0.17611;
/** 1 US perm (grain/(h·ft²·inHg), inHg at 32 °F) in ng/(s·m²·Pa) (docs/references.md §2). */
export const NG_PER_PERM = 57.2135;
export const MM_PER_IN = 25.4;
const PA_PER_PSI = 6894.757293168;

export const rsiToRip = (rsi: number): number => rsi / RSI_PER_RIP;
export const ripToRsi = (rip: number): number => rip * RSI_PER_RIP;
/** U in W/(m²·K) → Btu/(h·ft²·°F). */
export const usiToUip = (u: number): number => u * RSI_PER_RIP;
export const uipToUsi = (u: number): number => u / RSI_PER_RIP;
export const ngToPerm = (ng: number): number => ng / NG_PER_PERM;
export const permToNg = (perm: number): number => perm * NG_PER_PERM;
export const cToF = (c: number): number => (c * 9) / 5 + 32;
export const fToC = (f: number): number => ((f - 32) * 5) / 9;
/** Temperature differences (no 32 °F offset). */
export const deltaCToF = (dc: number): number => (dc * 9) / 5;
export const mmToIn = (mm: number): number => mm / MM_PER_IN;
export const inToMm = (inch: number): number => inch * MM_PER_IN;
export const paToPsi = (pa: number): number => pa / PA_PER_PSI;
/** Degree-days: base 18 °C ↔ base 65 °F, base 10 °C ↔ base 50 °F differ only by the 1.8 scale. */
export const degreeDaysCToF = (dd: number): number => dd * 1.8;
export const degreeDaysFToC = (dd: number): number => dd / 1.8;
/** Vapour flow kg/(m²·s) → g/(m²·day). */
export const kgPerSToGPerDay = (kgPerS: number): number => kgPerS * 1000 * 86400;

import type { UnitSystem } from "~/vocabulary/units";

export type { UnitSystem };

function fixed(value: number, digits: number): string {
  // −0.0 reads as a sign error on a drawing; show 0.
  const s = value.toFixed(digits);
  // Only a string that starts "-0" can be one (most labels are built without the pattern test).
  return s.startsWith("-0") && /^-0(\.0+)?$/.test(s) ? s.slice(1) : s;
}

/** "R-21.0" or "RSI 3.70". */
export function formatR(rsi: number, system: UnitSystem, digits = system === "ip" ? 1 : 2): string {
  return system === "ip" ? `R-${fixed(rsiToRip(rsi), digits)}` : `RSI ${fixed(rsi, digits)}`;
}

/** "U-0.058" (Btu/h·ft²·°F) or "U 0.33 W/m²K". */
export function formatU(uSi: number, system: UnitSystem): string {
  return system === "ip" ? `U-${fixed(usiToUip(uSi), 3)}` : `U ${fixed(uSi, 3)} W/m²K`;
}

export function formatTemperature(tC: number, system: UnitSystem, digits = 1): string {
  return system === "ip" ? `${fixed(cToF(tC), digits)} °F` : `${fixed(tC, digits)} °C`;
}

export function formatTemperatureDifference(dC: number, system: UnitSystem, digits = 1): string {
  return system === "ip" ? `${fixed(deltaCToF(dC), digits)} °F` : `${fixed(dC, digits)} K`;
}

export function formatThickness(mm: number, system: UnitSystem): string {
  return system === "ip" ? `${fixed(mmToIn(mm), 2)} in` : `${fixed(mm, 1)} mm`;
}

export function formatPermeance(ng: number, system: UnitSystem): string {
  const perm = ngToPerm(ng);
  if (system === "ip") return `${fixed(perm, perm < 1 ? 3 : 1)} perm`;
  return `${fixed(ng, ng < 10 ? 2 : 0)} ng/(s·m²·Pa)`;
}

export function formatRate(gPerM2Day: number, system: UnitSystem): string {
  // 1 g/m² = 0.00020482 lb/ft²; grains per ft² read better for small rates.
  return system === "ip"
    ? `${fixed(gPerM2Day * 15.4323584 * 0.09290304, 1)} gr/(ft²·day)`
    : `${fixed(gPerM2Day, 2)} g/(m²·day)`;
}
