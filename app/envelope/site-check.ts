// The one entry point: resolves the site and the layers, then runs thermal, vapour, profile,
// code and rule checks and returns a plain-JSON result.
import { resolveSite } from "./climate";
import { resolveClimateYear } from "./climate-year";
import { codeRows } from "./code-tables";
import { resolveAssembly, type ResolvedAssembly } from "./layers";
import type { MaterialLibrary } from "./material-schema";
import { seasonalBalance } from "./monthly-balance";
import { nbcRows } from "./nbc";
import { computeProfile, type CaseConditions } from "./profile";
import { saturationPressure } from "./psychrometrics";
import { evaluateRules, isReservoirCladding, LOCAL_CODE_CAUTION } from "./rules";
import { analyseThermal, isBelowGrade } from "./thermal";
import type { AssemblyInput, ResolvedSite, SiteCheckResult, SiteInput } from "./types";
import { analyseVapour } from "./vapour";

/** Innermost ventilated cavity (a vented air space used as a drainage gap), or −1. */
function ventedCavityIndex(a: ResolvedAssembly): number {
  let idx = -1;
  for (const l of a.layers) if (l.material.family === "air-space" && l.input.role === "drainage-gap") idx = l.index;
  // A cavity with nothing inboard of it leaves no stack to analyse: ignore it.
  return idx < a.layers.length - 1 ? idx : -1;
}

export function winterCase(a: ResolvedAssembly, site: ResolvedSite): CaseConditions {
  const indoor = { t_c: site.indoor.t_c, rh: site.indoor.rh, p_v_pa: (saturationPressure(site.indoor.t_c) * site.indoor.rh) / 100 };
  if (isBelowGrade(a.kind)) {
    // Soil air is saturated; its face sits at the ground temperature.
    return {
      name: "winter", description: `Winter: indoor ${site.indoor.t_c} °C / ${site.indoor.rh} % against soil at ${site.ground_t_c} °C, saturated`,
      exterior: { t_c: site.ground_t_c, rh: 100, p_v_pa: saturationPressure(site.ground_t_c), label: "soil" },
      interior: indoor, fixedSurface: true, vapourStart: 0, source: "interior",
    };
  }
  return {
    name: "winter", description: `Winter design: indoor ${site.indoor.t_c} °C / ${site.indoor.rh} %, outdoor ${site.winter.t_c} °C / ${site.winter.rh} %`,
    exterior: { t_c: site.winter.t_c, rh: site.winter.rh, p_v_pa: (saturationPressure(site.winter.t_c) * site.winter.rh) / 100, label: "outdoor air" },
    interior: indoor, fixedSurface: false, vapourStart: ventedCavityIndex(a) + 1, thermalStart: ventedCavityIndex(a) + 1, source: "interior",
  };
}

/** Summer inward drive: sun-warmed wet cladding where the cladding stores rain and sits tight to
 * the wall (a vented gap behind it breaks the drive), otherwise humid outdoor air; below grade,
 * saturated soil. */
export function summerCase(a: ResolvedAssembly, site: ResolvedSite): CaseConditions {
  const indoor = { t_c: site.indoor.summer_t_c, rh: site.indoor.summer_rh, p_v_pa: (saturationPressure(site.indoor.summer_t_c) * site.indoor.summer_rh) / 100 };
  const indoorText = `indoor ${site.indoor.summer_t_c} °C / ${site.indoor.summer_rh} %`;
  if (isBelowGrade(a.kind)) {
    return {
      name: "summer", description: `Summer: saturated soil at ${site.ground_t_c} °C against ${indoorText}`,
      exterior: { t_c: site.ground_t_c, rh: 100, p_v_pa: saturationPressure(site.ground_t_c), label: "soil" },
      interior: indoor, fixedSurface: true, vapourStart: 0, source: "exterior",
    };
  }
  const cladIdx = a.layers.findIndex(isReservoirCladding);
  const vent = ventedCavityIndex(a);
  const ventedBehind = cladIdx >= 0 && vent > cladIdx;
  // Needs something inboard of the cladding for the drive to reach.
  if (cladIdx >= 0 && cladIdx < a.layers.length - 1 && !ventedBehind && a.kind !== "floor") {
    const t = site.summer.cladding_t_c;
    return {
      name: "summer", description: `Summer inward drive: rain-wet ${a.layers[cladIdx].material.name.toLowerCase()} warmed by sun to ${t} °C, ${indoorText}`,
      exterior: { t_c: t, rh: 100, p_v_pa: saturationPressure(t), label: "sun-warmed wet cladding" },
      interior: indoor, fixedSurface: true, vapourStart: cladIdx + 1, saturatedSource: true, source: "exterior",
    };
  }
  return {
    name: "summer", description: `Summer inward drive: outdoor ${site.summer.t_c} °C / ${site.summer.rh} %, ${indoorText}`,
    exterior: { t_c: site.summer.t_c, rh: site.summer.rh, p_v_pa: (saturationPressure(site.summer.t_c) * site.summer.rh) / 100, label: "outdoor air" },
    interior: indoor, fixedSurface: false, vapourStart: vent + 1, thermalStart: vent + 1, source: "exterior",
  };
}

export function runSiteCheck(assembly: AssemblyInput, site: SiteInput, materials: MaterialLibrary): SiteCheckResult {
  const resolvedSite = resolveSite(site);
  const a = resolveAssembly(assembly, materials);
  const thermal = analyseThermal(a);
  const vapour = analyseVapour(a);
  const winter = computeProfile(a, winterCase(a, resolvedSite));
  const summer = computeProfile(a, summerCase(a, resolvedSite));
  const rows = codeRows(a, resolvedSite, vapour.interiorClass);
  const flags = evaluateRules({ assembly: a, site: resolvedSite, vapour, winter, summer, codeRows: rows });
  return {
    site: resolvedSite,
    thermal,
    profiles: { winter, summer },
    vapour,
    // Canadian sites are compared with the NBC; the IRC/IECC rows still feed the rules above.
    code: resolvedSite.canada ? { edition: resolvedSite.canada.edition, rows: nbcRows(a, resolvedSite.canada, thermal) } : { edition: resolvedSite.edition, rows },
    flags,
    caution: LOCAL_CODE_CAUTION,
    seasonal: seasonalBalance(a, resolvedSite, resolveClimateYear(site.year, resolvedSite)),
  };
}
