// Interior Class I sheet with a vapour-closed exterior where summer vapour drives inward.
import { doubleBarrier, humidOrMarine, inwardDrive, classIInteriorBarred, nameOf } from "./helpers";
import { flagOf, type Rule } from "./types";

export const doubleVapourBarrier: Rule = {
  id: "interior-sheet-with-closed-exterior",
  severity: "stop",
  source:
    "IRC 2021 Table R702.7(2) (Class I interior not permitted in zones 1–4 except marine 4), M; common practice (inward drive in humid and marine climates)",
  applies: (ctx) => humidOrMarine(ctx.site) && doubleBarrier(ctx.assembly) !== null,
  check(ctx) {
    if (!inwardDrive(ctx)) return null;
    const pair = doubleBarrier(ctx.assembly);
    if (!pair) return null;
    const barred = classIInteriorBarred(ctx.site);
    return flagOf(
      this,
      barred ? "stop" : "caution",
      "Vapour barrier on both sides where summer vapour drives inward",
      `The ${nameOf(pair.interior)} inside and the ${nameOf(pair.exterior)} outside leave the framing no way to dry, and in zone ${ctx.site.zone} summer vapour drives inward onto the interior sheet. Leave out the interior sheet: use a variable-permeance retarder, or a paint-grade Class III retarder (latex paint) where the code allows it (IRC Table R702.7(2), and R702.7(3) for enough continuous insulation outside).${barred ? "" : " The code permits a Class I interior here; the risk is summer condensation and a wall that cannot dry."}`,
    );
  },
};
