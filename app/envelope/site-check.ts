// The one entry point: resolves the site and the layers, then runs thermal, vapour, profile,
// code and rule checks and returns a plain-JSON result.
import { analyseAssembly } from "./assembly-cache";
import { resolveSite } from "./climate";
import { resolveClimateYear } from "./climate-year";
import { codeRows } from "./code-tables";
import { lowerName, ventedCavityIndex, type ResolvedAssembly } from "./layers";
import type { MaterialLibrary } from "./material-schema";
import { seasonalBalance } from "./monthly-balance";
import { nbcRows } from "./nbc";
import { computeProfile, type CaseConditions } from "./profile";
import { saturationPressure } from "./psychrometrics";
import { evaluateRules, isReservoirCladding, LOCAL_CODE_CAUTION } from "./rules";
import { filmsFor, isBelowGrade } from "./thermal";
import type { AssemblyInput, ResolvedSite, SiteCheckResult, SiteInput } from "./types";

/** A roof deck open to a clear night sky radiates below the air temperature: the sol-air
 * correction εΔR/h_o for horizontal surfaces is 7 °F (3.9 K), 0 for vertical ones (ASHRAE HoF ch.18
 * sol-air temperature, from memory). Applied to roofs in the winter case. */
export const NIGHT_SKY_DEPRESSION_K = 3.9;
const NIGHT_SKY_NOTE = `Night-sky radiation: the roof surface is taken ${NIGHT_SKY_DEPRESSION_K} K below the outdoor air (sol-air correction for a horizontal surface under a clear sky, ASHRAE Handbook—Fundamentals ch.18, from memory); the outdoor vapour pressure is the air's.`;

/** Frost depth is where the soil reaches 0 °C: the soil face just below grade in the upper-wall case. */
export const FROST_DEPTH_SOIL_T_C = 0;
const BELOW_GRADE_WALLS = new Set(["basement-wall", "crawlspace-wall"]);

function indoorWinter(site: ResolvedSite) {
  return {
    t_c: site.indoor.t_c,
    rh: site.indoor.rh,
    p_v_pa: (saturationPressure(site.indoor.t_c) * site.indoor.rh) / 100,
  };
}

export function winterCase(a: ResolvedAssembly, site: ResolvedSite): CaseConditions {
  const indoor = indoorWinter(site);
  if (isBelowGrade(a.kind)) {
    // Soil air is saturated; its face sits at the ground temperature.
    return {
      name: "winter",
      description: `Winter: indoor ${site.indoor.t_c} °C / ${site.indoor.rh} % against soil at ${site.ground_t_c} °C, saturated`,
      exterior: { t_c: site.ground_t_c, rh: 100, p_v_pa: saturationPressure(site.ground_t_c), label: "soil" },
      interior: indoor,
      fixedSurface: true,
      vapourStart: 0,
      source: "interior",
    };
  }
  const vent = ventedCavityIndex(a);
  const p_v_pa = (saturationPressure(site.winter.t_c) * site.winter.rh) / 100;
  const sky = a.kind === "roof" && vent < 0;
  const t_c = sky ? site.winter.t_c - NIGHT_SKY_DEPRESSION_K : site.winter.t_c;
  return {
    name: "winter",
    description: `Winter design: indoor ${site.indoor.t_c} °C / ${site.indoor.rh} %, outdoor ${site.winter.t_c} °C / ${site.winter.rh} %${sky ? `, roof surface under a clear night sky (${t_c.toFixed(1)} °C sol-air)` : ""}`,
    exterior: {
      t_c,
      rh: (100 * p_v_pa) / saturationPressure(t_c),
      p_v_pa,
      label: sky ? "outdoor air under a clear night sky" : "outdoor air",
    },
    interior: indoor,
    fixedSurface: false,
    vapourStart: vent + 1,
    thermalStart: vent + 1,
    source: "interior",
    notes: sky ? [NIGHT_SKY_NOTE] : [],
  };
}

/** The top of a basement or crawl-space wall: the band above grade faces outdoor air (with the
 * outdoor film), and just below grade the soil is at frost depth (0 °C, saturated). Interior-
 * insulated walls fail there first, where the deep-ground case can never see it. */
export function upperWallCases(
  a: ResolvedAssembly,
  site: ResolvedSite,
): { aboveGrade: CaseConditions; frostDepth: CaseConditions } | null {
  if (!BELOW_GRADE_WALLS.has(a.kind)) return null;
  const indoor = indoorWinter(site);
  const indoorText = `indoor ${site.indoor.t_c} °C / ${site.indoor.rh} %`;
  const outdoorFilm = filmsFor("above-grade-wall", "winter").exterior;
  // Drainage mats and boards stop at grade: above it the next layer meets the outdoor air.
  let aboveGradeStart = 0;
  while (aboveGradeStart < a.layers.length - 1 && a.layers[aboveGradeStart].input.role === "drainage-gap")
    aboveGradeStart++;
  return {
    aboveGrade: {
      name: "winter",
      description: `Winter, wall above grade: ${indoorText}, outdoor ${site.winter.t_c} °C / ${site.winter.rh} %`,
      exterior: {
        t_c: site.winter.t_c,
        rh: site.winter.rh,
        p_v_pa: (saturationPressure(site.winter.t_c) * site.winter.rh) / 100,
        label: "outdoor air above grade",
      },
      interior: indoor,
      fixedSurface: false,
      vapourStart: aboveGradeStart,
      thermalStart: aboveGradeStart,
      exteriorFilmRsi: outdoorFilm?.rsi ?? 0,
      source: "interior",
    },
    frostDepth: {
      name: "winter",
      description: `Winter, wall just below grade: ${indoorText} against soil at frost depth (${FROST_DEPTH_SOIL_T_C} °C), saturated`,
      exterior: {
        t_c: FROST_DEPTH_SOIL_T_C,
        rh: 100,
        p_v_pa: saturationPressure(FROST_DEPTH_SOIL_T_C),
        label: "soil at frost depth",
      },
      interior: indoor,
      fixedSurface: true,
      vapourStart: 0,
      source: "interior",
    },
  };
}

/** Summer inward drive: sun-warmed wet cladding where the cladding stores rain and sits tight to
 * the wall (a vented gap behind it breaks the drive), otherwise humid outdoor air; below grade,
 * saturated soil. */
export function summerCase(a: ResolvedAssembly, site: ResolvedSite): CaseConditions {
  const indoor = {
    t_c: site.indoor.summer_t_c,
    rh: site.indoor.summer_rh,
    p_v_pa: (saturationPressure(site.indoor.summer_t_c) * site.indoor.summer_rh) / 100,
  };
  const indoorText = `indoor ${site.indoor.summer_t_c} °C / ${site.indoor.summer_rh} %`;
  if (isBelowGrade(a.kind)) {
    return {
      name: "summer",
      description: `Summer: saturated soil at ${site.ground_t_c} °C against ${indoorText}`,
      exterior: { t_c: site.ground_t_c, rh: 100, p_v_pa: saturationPressure(site.ground_t_c), label: "soil" },
      interior: indoor,
      fixedSurface: true,
      vapourStart: 0,
      source: "exterior",
    };
  }
  const cladIdx = a.layers.findIndex(isReservoirCladding);
  const vent = ventedCavityIndex(a);
  const ventedBehind = cladIdx >= 0 && vent > cladIdx;
  // Needs something inboard of the cladding for the drive to reach.
  if (cladIdx >= 0 && cladIdx < a.layers.length - 1 && !ventedBehind && a.kind !== "floor") {
    const t = site.summer.cladding_t_c;
    return {
      name: "summer",
      description: `Summer inward drive: rain-wet ${lowerName(a.layers[cladIdx].material)} warmed by sun to ${t} °C, ${indoorText}`,
      exterior: { t_c: t, rh: 100, p_v_pa: saturationPressure(t), label: "sun-warmed wet cladding" },
      interior: indoor,
      fixedSurface: true,
      vapourStart: cladIdx + 1,
      saturatedSource: true,
      source: "exterior",
    };
  }
  return {
    name: "summer",
    description: `Summer inward drive: outdoor ${site.summer.t_c} °C / ${site.summer.rh} %, ${indoorText}`,
    exterior: {
      t_c: site.summer.t_c,
      rh: site.summer.rh,
      p_v_pa: (saturationPressure(site.summer.t_c) * site.summer.rh) / 100,
      label: "outdoor air",
    },
    interior: indoor,
    fixedSurface: false,
    vapourStart: vent + 1,
    thermalStart: vent + 1,
    source: "exterior",
  };
}

/** seasonal: false skips the 12-month balance (bulk screening, the design-day benchmark). */
export interface SiteCheckOptions {
  seasonal?: boolean;
}

export function runSiteCheck(
  assembly: AssemblyInput,
  site: SiteInput,
  materials: MaterialLibrary,
  options: SiteCheckOptions = {},
): SiteCheckResult {
  const resolvedSite = resolveSite(site);
  const { assembly: a, thermal, vapour } = analyseAssembly(assembly, materials);
  const winter = computeProfile(a, winterCase(a, resolvedSite));
  const summer = computeProfile(a, summerCase(a, resolvedSite));
  const upper = upperWallCases(a, resolvedSite);
  const upperWall = upper
    ? { aboveGrade: computeProfile(a, upper.aboveGrade), frostDepth: computeProfile(a, upper.frostDepth) }
    : null;
  const rows = codeRows(a, resolvedSite, vapour.interiorClass);
  const seasonal =
    options.seasonal === false ? null : seasonalBalance(a, resolvedSite, resolveClimateYear(site.year, resolvedSite));
  const flags = evaluateRules({
    assembly: a,
    site: resolvedSite,
    vapour,
    winter,
    summer,
    upperWall,
    codeRows: rows,
    seasonal,
  });
  return {
    site: resolvedSite,
    thermal,
    profiles: { winter, summer, upperWall },
    vapour,
    // Canadian sites are compared with the NBC; the IRC/IECC rows still feed the rules above.
    code: resolvedSite.canada
      ? { edition: resolvedSite.canada.edition, rows: nbcRows(a, resolvedSite.canada, thermal) }
      : { edition: resolvedSite.edition, rows },
    flags,
    caution: LOCAL_CODE_CAUTION,
    seasonal,
  };
}
