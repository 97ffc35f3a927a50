// IRC R702.7 class rows: the interior retarder class the zone does not permit.
import { flagOf, type Rule } from "./types";

export const interiorRetarderNotPermitted: Rule = {
  id: "interior-retarder-not-permitted",
  severity: "stop",
  source: "IRC 2021 R702.7, Table R702.7(2), C/M",
  applies: (ctx) => ctx.codeRows.some((r) => r.id === "irc-r702-7-class"),
  check(ctx) {
    const row = ctx.codeRows.find((r) => r.id === "irc-r702-7-class" && !r.pass);
    if (!row) return null;
    return flagOf(
      this,
      "stop",
      "Interior vapour retarder class not permitted here",
      `${row.label}: ${row.required}; provided ${row.provided}. ${row.note}`,
      `${row.label}, C/M`,
    );
  },
};
