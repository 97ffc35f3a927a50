// Winter: a surface inside the assembly below the indoor dew point. A design day overstates the
// season, so small rates, and assemblies that meet IRC R702.7 (set on seasonal conditions), are notes.
import { isBelowGrade } from "../thermal";
import { formatTemperature } from "../units";
import { SCREENING_RATE_G_M2_DAY } from "./helpers";
import { flagOf, type Rule, type RuleContext } from "./types";

function meetsSeasonalCodeRows(ctx: RuleContext): boolean {
  const { assembly: a, site } = ctx;
  const failingVapourRow = ctx.codeRows.some((r) => r.id.startsWith("irc-r") && !r.pass);
  const passingCiRow = ctx.codeRows.some((r) => (r.id === "irc-r702-7-3" || r.id === "irc-r806-5") && r.pass);
  const classIIIPermittedWithoutCi =
    a.kind === "above-grade-wall" && (site.zoneNumber <= 3 || (site.zoneNumber === 4 && site.moisture !== "C"));
  return !failingVapourRow && (passingCiRow || classIIIPermittedWithoutCi);
}

export const winterCondensingSurface: Rule = {
  id: "winter-condensing-surface",
  severity: "caution",
  source:
    "steady-state dew-point method (ASHRAE HoF ch.25/27), M; docs/references.md §7.1 (JLC) and §8 (first condensing surface), C/C2",
  applies: (ctx) => !isBelowGrade(ctx.assembly.kind),
  check(ctx) {
    const winter = ctx.winter;
    const condensing = winter.condensingPlanes.length > 0;
    if (!condensing && winter.margin_c >= 0) return null;
    const codeOk = meetsSeasonalCodeRows(ctx);
    const serious = condensing && !codeOk && winter.rate_g_m2_day >= SCREENING_RATE_G_M2_DAY;
    const surface = winter.firstCondensingSurface;
    return flagOf(
      this,
      serious ? "caution" : "note",
      condensing ? "Winter condensation inside the assembly" : "Sheathing below the indoor dew point",
      condensing
        ? `At the winter design condition the ${surface?.label} is at ${formatTemperature(surface?.t_c ?? 0, "ip")} / ${formatTemperature(surface?.t_c ?? 0, "si")} through the clear cavity, below the indoor dew point (${formatTemperature(winter.sourceDewPoint_c, "si")}), and the diffusion calculation collects ${winter.rate_g_m2_day.toFixed(1)} g/(m²·day) there on that day. ${codeOk ? "The assembly meets the code's vapour-retarder and continuous-insulation rows, whose limits rest on seasonal conditions; a design day overstates the seasonal total." : "Warm that surface with exterior insulation, or add a tighter interior retarder; a design day overstates the seasonal total, so a hygrothermal analysis can settle it."}`
        : `The ${winter.marginSurface} is ${(-winter.margin_c).toFixed(1)} K below the indoor dew point at the winter design condition; the interior retarder keeps diffusion below saturation, so this depends on that retarder and on air-tightness.`,
    );
  },
};
