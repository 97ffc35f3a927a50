// Every trade rule, in the order their flags are listed. A rule is a small named object in its own
// file (./types.ts); tests/unit/envelope/rules/<id>.test.ts holds the case that fires and the case
// that must not.
import type { Flag } from "../types";
import { basementClassIInterior } from "./basement-class-i-interior";
import { belowGradeMembraneNoDrainage } from "./below-grade-membrane-no-drainage";
import { belowGradeNoDampproofing } from "./below-grade-no-dampproofing";
import { belowGradeSummerCondensation } from "./below-grade-summer-condensation";
import { belowGradeUpperWallCondensation } from "./below-grade-upper-wall-condensation";
import { belowGradeWaterSensitiveInsulation } from "./below-grade-water-sensitive-insulation";
import { bothSidesClosed } from "./both-sides-closed";
import { crawlspaceNoClassIGroundCover } from "./crawlspace-no-class-i-ground-cover";
import { doubleVapourBarrier } from "./double-vapour-barrier";
import { exteriorFoamTooThinForClassIII } from "./exterior-foam-too-thin-for-class-iii";
import { exteriorFoamUnprotected } from "./exterior-foam-unprotected";
import { foamAgainstWrbNoGap } from "./foam-against-wrb-no-gap";
import { foamCrawlspaceNoIgnitionBarrier } from "./foam-crawlspace-no-ignition-barrier";
import { foamFloorNotCovered } from "./foam-floor-not-covered";
import { foamNoThermalBarrier } from "./foam-no-thermal-barrier";
import { foamRimJoistExposed } from "./foam-rim-joist-exposed";
import { hotHumidExteriorFoamUnder10pct } from "./hot-humid-exterior-foam-under-10pct";
import { insufficientR } from "./insufficient-r";
import { interiorRetarderNotPermitted } from "./interior-retarder-not-permitted";
import { openCellRoofNoRetarder } from "./open-cell-roof-no-retarder";
import { solventAdhesiveOnPolystyrene } from "./solvent-adhesive-on-polystyrene";
import { sprayFoamCuringOdour } from "./spray-foam-curing-odour";
import { stuccoOverFoamUndrained } from "./stucco-over-foam-undrained";
import { summerCondensationInteriorSheet } from "./summer-condensation-interior-sheet";
import { summerInwardCondensation } from "./summer-inward-condensation";
import { winterCondensingSurface } from "./winter-condensing-surface";
import type { Rule, RuleContext } from "./types";
import { interiorSurfaceMould } from "./interior-surface-mould";
import { seasonalAccumulation } from "./seasonal-accumulation";
import { seasonalPeak } from "./seasonal-peak";

export const RULES: readonly Rule[] = [
  doubleVapourBarrier,
  bothSidesClosed,
  stuccoOverFoamUndrained,
  foamAgainstWrbNoGap,
  solventAdhesiveOnPolystyrene,
  foamNoThermalBarrier,
  foamCrawlspaceNoIgnitionBarrier,
  foamRimJoistExposed,
  foamFloorNotCovered,
  sprayFoamCuringOdour,
  belowGradeWaterSensitiveInsulation,
  belowGradeNoDampproofing,
  exteriorFoamUnprotected,
  belowGradeMembraneNoDrainage,
  basementClassIInterior,
  winterCondensingSurface,
  belowGradeUpperWallCondensation,
  summerCondensationInteriorSheet,
  summerInwardCondensation,
  belowGradeSummerCondensation,
  exteriorFoamTooThinForClassIII,
  interiorRetarderNotPermitted,
  insufficientR,
  hotHumidExteriorFoamUnder10pct,
  crawlspaceNoClassIGroundCover,
  openCellRoofNoRetarder,
  seasonalAccumulation,
  seasonalPeak,
  interiorSurfaceMould,
];

export function evaluateRules(ctx: RuleContext): Flag[] {
  const flags: Flag[] = [];
  for (const rule of RULES) {
    if (!rule.applies(ctx)) continue;
    const out = rule.check(ctx);
    if (out === null) continue;
    if (Array.isArray(out)) flags.push(...(out as readonly Flag[]));
    else flags.push(out as Flag);
  }
  return flags;
}

export { isReservoirCladding } from "./helpers";
export type { Rule, RuleContext } from "./types";

export { SITE_CHECK_CAUTION as LOCAL_CODE_CAUTION } from "~/vocabulary/caution";
