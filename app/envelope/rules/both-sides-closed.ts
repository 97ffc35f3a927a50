// Core closed to drying on both sides (when the double barrier is not already reported).
import { isBelowGrade } from "../thermal";
import { doubleBarrierReported } from "./helpers";
import { flagOf, type Rule } from "./types";

export const bothSidesClosed: Rule = {
  id: "both-sides-closed",
  severity: "caution",
  source: "common practice",
  applies: (ctx) => ctx.vapour.bothSidesClosed && !isBelowGrade(ctx.assembly.kind),
  check(ctx) {
    if (doubleBarrierReported(ctx)) return null;
    return flagOf(
      this,
      "caution",
      "Closed to drying on both sides",
      `${ctx.vapour.explanation} Wood and fibrous layers caught between two closed sides cannot dry if they get wet during construction or from a leak. Open one side, or make sure nothing between them is moisture-sensitive.`,
    );
  },
};
