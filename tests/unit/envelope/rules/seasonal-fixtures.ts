// The two-layer wall of the hand-derived monthly balance (tests/unit/envelope/monthly-balance.test.ts):
// an outer board RSI 0.5 at 10 ng/(s·m²·Pa) over a fill RSI 3.0 at 500 ng, indoor 20 °C / 50 % all year.
import { runSiteCheck } from "~/envelope";
import type { MaterialFamily } from "~/envelope/material-schema";
import type { Flag, MonthInput } from "~/envelope/types";
import { fixedRsiMaterial, libraryOf } from "../library";

const layerMaterial = (slug: string, rsi: number, perm: number, family: MaterialFamily = "membrane") =>
  fixedRsiMaterial(slug, rsi, { family, vapour: { permeance_ng: perm, source: "fixture, D" } });

export const cold: MonthInput = { t_c: -5, rh: 80 };
export const mild: MonthInput = { t_c: 15, rh: 70 };

/** The flag with this id for the two-layer wall (fill RSI as given) over the year of months. */
export function seasonalFlag(id: string, months: MonthInput[], fillRsi = 3.0, indoorRh = 50): Flag | undefined {
  const lib = libraryOf(
    layerMaterial("outer-board", 0.5, 10),
    layerMaterial("fill", fillRsi, 500, "fibrous-insulation"),
  );
  const wall = {
    kind: "above-grade-wall" as const,
    layers: [
      { role: "sheathing", material: "outer-board", thickness_mm: 10 },
      { role: "insulation", material: "fill", thickness_mm: 100 },
    ],
  };
  const result = runSiteCheck(wall, { zone: "5A", indoor: { t_c: 20, rh: indoorRh }, year: { months } }, lib);
  return result.flags.find((f) => f.id === id);
}
