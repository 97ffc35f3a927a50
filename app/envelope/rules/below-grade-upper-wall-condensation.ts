// The top of a basement or crawl-space wall: above grade it faces outdoor air, just below grade
// frost-depth soil. Interior-insulated walls collect indoor vapour there first.
import type { ProfileCase } from "../types";
import { formatTemperature } from "../units";
import { SCREENING_RATE_G_M2_DAY, structureIndex } from "./helpers";
import { flagOf, type Rule } from "./types";

const worst = (cases: readonly ProfileCase[]): ProfileCase =>
  cases.reduce((w, c) => (c.rate_g_m2_day > w.rate_g_m2_day ? c : w));

export const belowGradeUpperWallCondensation: Rule = {
  id: "below-grade-upper-wall-condensation",
  severity: "caution",
  source:
    "steady-state dew-point method (ASHRAE HoF ch.25/27), M; common practice (interior-insulated basements wet at the top of the wall)",
  applies: (ctx) => ctx.upperWall !== null,
  check(ctx) {
    const upper = ctx.upperWall;
    if (!upper) return null;
    // Outboard of the structure the soil side is wet anyway; what matters is indoor vapour reaching
    // the inner face of the concrete or the framing inboard of it.
    const structure = structureIndex(ctx.assembly);
    const inboard = (c: ProfileCase) => c.condensingPlanes.filter((p) => p.interfaceIndex > structure);
    const cases = [upper.aboveGrade, upper.frostDepth].filter((c) => inboard(c).length > 0);
    if (cases.length === 0) return null;
    const c = worst(cases);
    const plane = inboard(c)[inboard(c).length - 1];
    // Wetting matters where it reaches wood or fibrous insulation; on the back of foam against
    // concrete, neither takes harm from a little water and it dries in spring (common practice).
    const layers = ctx.assembly.layers;
    const sensitive = [layers[plane.interfaceIndex - 1], layers[plane.interfaceIndex]].some(
      (l) => l !== undefined && (l.material.water_sensitive || (l.framing?.material.water_sensitive ?? false)),
    );
    return flagOf(
      this,
      sensitive && c.rate_g_m2_day >= SCREENING_RATE_G_M2_DAY ? "caution" : "note",
      "Indoor vapour condenses at the top of the foundation wall",
      `${c.description}: the ${plane?.label} reaches ${formatTemperature(plane?.t_c ?? 0, "si")}, below the indoor dew point (${formatTemperature(c.sourceDewPoint_c, "si")}), collecting ${c.rate_g_m2_day.toFixed(1)} g/(m²·day) on the design day. The deep-ground case does not show this. ${sensitive ? "Put the insulation's vapour-resistant face (taped foam) against the concrete, or keep it warm with exterior insulation, and keep indoor winter humidity down." : "Neither face there is water-sensitive and the wetting dries in spring; keep the foam joints taped and indoor winter humidity moderate."}`,
    );
  },
};
