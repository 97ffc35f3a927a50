// IRC Table R702.7(3): a Class III interior needs enough continuous insulation outside.
import { flagOf, type Rule } from "./types";

export const exteriorFoamTooThinForClassIII: Rule = {
  id: "exterior-foam-too-thin-for-class-iii",
  severity: "stop",
  source: "IRC 2021 Table R702.7(3), C2/M",
  applies: (ctx) => ctx.codeRows.some((r) => r.id === "irc-r702-7-3"),
  check(ctx) {
    const row = ctx.codeRows.find((r) => r.id === "irc-r702-7-3" && !r.pass);
    if (!row) return null;
    return flagOf(
      this,
      "stop",
      "Exterior insulation too thin for a Class III interior",
      `${row.label}: requires ${row.required}; provided ${row.provided}. ${row.note}`,
      `${row.label}, C2/M`,
    );
  },
};
