// Indoor design humidity as a function of the outdoor temperature (and, for some methods, the
// occupancy). One named published method is the default; the others are offered by id so the page
// and the API can let the user choose. Indoor temperature is not taken from the methods: it is the
// site's heating set point (cooling set point when outdoors is warmer), so only the humidity varies.
//
// Breakpoints (all from memory: verify against the printed standards before relying on them):
// - ASHRAE Standard 160-2016 §4.3.1.1, simplified method: 40 % RH when the outdoor (24-hour running
//   mean) temperature is at or below −10 °C, 70 % at or above 20 °C, linear between.
//   docs/references.md §7.2 notes 25 % at −10 °C (also from memory); the two memories disagree and
//   40 % is kept because it is the wetter, safer design condition until the printed text settles it.
// - EN 15026:2007 Annex C (Figure C.1), normal occupancy: 30 % at or below −10 °C, 60 % at or above
//   20 °C, linear between; high occupancy: 40 % → 70 % over the same range.
// - ISO 13788:2012 Annex A, internal humidity classes: indoor vapour pressure excess Δp over outdoors
//   of 270 / 540 / 810 / 1080 / 1350 Pa (classes 1–5) at or below 0 °C outdoors, falling linearly to
//   0 at 20 °C; the standard multiplies the class value by a safety factor of 1.10 for design.
import { SiteCheckInputError } from "./errors";
import { saturationPressure } from "./psychrometrics";

export const INDOOR_METHODS = [
  "ashrae-160-simplified",
  "en-15026-normal",
  "en-15026-high",
  "iso-13788-class-1",
  "iso-13788-class-2",
  "iso-13788-class-3",
  "iso-13788-class-4",
  "iso-13788-class-5",
] as const;
export type IndoorMethodId = (typeof INDOOR_METHODS)[number];

/** The default errs on the wet side: 40 % at cold design days, well above what dry houses see. */
export const DEFAULT_INDOOR_METHOD: IndoorMethodId = "ashrae-160-simplified";

export interface IndoorMethodInfo {
  id: IndoorMethodId;
  label: string;
  source: string;
}

const FROM_MEMORY = "breakpoints from memory, verify against the printed standard";

export const INDOOR_METHOD_INFO: Readonly<Record<IndoorMethodId, IndoorMethodInfo>> = {
  "ashrae-160-simplified": {
    id: "ashrae-160-simplified",
    label: "ASHRAE 160 simplified method (40 % at −10 °C → 70 % at 20 °C)",
    source: `ASHRAE Standard 160-2016 §4.3.1.1; ${FROM_MEMORY}`,
  },
  "en-15026-normal": {
    id: "en-15026-normal",
    label: "EN 15026 normal occupancy (30 % at −10 °C → 60 % at 20 °C)",
    source: `EN 15026:2007 Annex C; ${FROM_MEMORY}`,
  },
  "en-15026-high": {
    id: "en-15026-high",
    label: "EN 15026 high occupancy (40 % at −10 °C → 70 % at 20 °C)",
    source: `EN 15026:2007 Annex C; ${FROM_MEMORY}`,
  },
  "iso-13788-class-1": {
    id: "iso-13788-class-1",
    label: "ISO 13788 humidity class 1 (unoccupied, dry storage)",
    source: `ISO 13788:2012 Annex A; ${FROM_MEMORY}`,
  },
  "iso-13788-class-2": {
    id: "iso-13788-class-2",
    label: "ISO 13788 humidity class 2 (offices, shops)",
    source: `ISO 13788:2012 Annex A; ${FROM_MEMORY}`,
  },
  "iso-13788-class-3": {
    id: "iso-13788-class-3",
    label: "ISO 13788 humidity class 3 (dwellings with low occupancy)",
    source: `ISO 13788:2012 Annex A; ${FROM_MEMORY}`,
  },
  "iso-13788-class-4": {
    id: "iso-13788-class-4",
    label: "ISO 13788 humidity class 4 (dwellings with high occupancy, sports halls, kitchens)",
    source: `ISO 13788:2012 Annex A; ${FROM_MEMORY}`,
  },
  "iso-13788-class-5": {
    id: "iso-13788-class-5",
    label: "ISO 13788 humidity class 5 (special buildings: laundries, pools)",
    source: `ISO 13788:2012 Annex A; ${FROM_MEMORY}`,
  },
};

/** The choices a form or the API can offer, default first. */
export function indoorMethodChoices(): IndoorMethodInfo[] {
  return [
    INDOOR_METHOD_INFO[DEFAULT_INDOOR_METHOD],
    ...INDOOR_METHODS.filter((m) => m !== DEFAULT_INDOOR_METHOD).map((m) => INDOOR_METHOD_INFO[m]),
  ];
}

export function isIndoorMethod(value: unknown): value is IndoorMethodId {
  return typeof value === "string" && (INDOOR_METHODS as readonly string[]).includes(value);
}

export function checkIndoorMethod(value: unknown, field = "indoor.method"): IndoorMethodId {
  if (!isIndoorMethod(value)) {
    throw new SiteCheckInputError(
      field,
      `unknown indoor humidity method "${String(value)}"; use one of ${INDOOR_METHODS.join(", ")}`,
    );
  }
  return value;
}

/** Linear ramp between two outdoor temperatures, held flat outside them. */
function ramp(outdoorC: number, t0: number, v0: number, t1: number, v1: number): number {
  if (outdoorC <= t0) return v0;
  if (outdoorC >= t1) return v1;
  return v0 + ((outdoorC - t0) * (v1 - v0)) / (t1 - t0);
}

const ISO_CLASS_DP_PA = [270, 540, 810, 1080, 1350] as const;
/** ISO 13788 design safety factor on the class excess. */
const ISO_SAFETY_FACTOR = 1.1;

export interface IndoorState {
  t_c: number;
  rh: number;
  p_v_pa: number;
}

/** Indoor air temperature for a given outdoor temperature: heated to the heating set point, cooled
 * to the cooling set point, free-floating with outdoors between them. */
export function indoorTemperature(outdoorC: number, heating_t_c: number, cooling_t_c: number): number {
  return Math.min(Math.max(outdoorC, heating_t_c), Math.max(heating_t_c, cooling_t_c));
}

/** Indoor design RH (percent) and vapour pressure by a method, at an outdoor state. */
export function indoorHumidity(
  method: IndoorMethodId,
  outdoor: { t_c: number; rh: number },
  indoor_t_c: number,
): IndoorState {
  const pSatIn = saturationPressure(indoor_t_c);
  let rh: number;
  switch (method) {
    case "ashrae-160-simplified":
    case "en-15026-high":
      rh = ramp(outdoor.t_c, -10, 40, 20, 70);
      break;
    case "en-15026-normal":
      rh = ramp(outdoor.t_c, -10, 30, 20, 60);
      break;
    default: {
      const cls = Number(method.slice(-1)) - 1;
      const excess = ISO_SAFETY_FACTOR * ramp(outdoor.t_c, 0, ISO_CLASS_DP_PA[cls], 20, 0);
      const pOut = (saturationPressure(outdoor.t_c) * outdoor.rh) / 100;
      rh = (100 * (pOut + excess)) / pSatIn;
    }
  }
  rh = Math.min(100, Math.max(0, rh));
  return { t_c: indoor_t_c, rh, p_v_pa: (pSatIn * rh) / 100 };
}

const fmt = (v: number): string => (Math.round(v * 10) / 10).toString().replace("-", "−");

/** The sentence a page, the API and the PDF show for the indoor condition a case used (SI). */
export function indoorBasis(
  method: IndoorMethodId | "given",
  indoor: { t_c: number; rh: number },
  outdoorC: number,
): string {
  const at = `indoor ${fmt(indoor.t_c)} °C / ${fmt(indoor.rh)} % RH`;
  if (method === "given") return `${at}, as entered`;
  const info = INDOOR_METHOD_INFO[method];
  return `${at}, by the ${info.label.replace(/ \(.*\)$/, "")} at ${fmt(outdoorC)} °C outdoors`;
}
