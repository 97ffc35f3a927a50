// Shared reading of the summer case: where inward drive condenses, and whether that is on an
// interior sheet (used by the three summer rules).
import { isBelowGrade } from "../thermal";
import type { CondensationPlane } from "../types";
import { formatTemperature } from "../units";
import { innermostInsulation, isSheetRetarder } from "./helpers";
import type { RuleContext } from "./types";

export type SummerKind = "below-grade-outward" | "interior-sheet" | "inward";

export function summerCondensation(
  ctx: RuleContext,
): { kind: SummerKind; plane: CondensationPlane | null; where: string; rate: string } | null {
  const { assembly: a, summer } = ctx;
  if (summer.condensingPlanes.length === 0) return null;
  const inner = innermostInsulation(a);
  const layers = a.layers;
  const sheetPlane = summer.condensingPlanes.find((pl) =>
    [layers[pl.interfaceIndex], layers[pl.interfaceIndex - 1]].some(
      (l) => l !== undefined && l.index > inner && isSheetRetarder(a, l),
    ),
  );
  const plane = sheetPlane ?? summer.condensingPlanes[0];
  const kind: SummerKind =
    isBelowGrade(a.kind) && summer.interior.p_v_pa > summer.exterior.p_v_pa
      ? "below-grade-outward"
      : sheetPlane
        ? "interior-sheet"
        : "inward";
  return {
    kind,
    plane,
    where: `${plane.label} reaches ${formatTemperature(plane.t_c, "si")}`,
    rate: `${summer.rate_g_m2_day.toFixed(1)} g/(m²·day)`,
  };
}
