// Energy-code insulation rows that the assembly does not meet (one flag per failed row; the flag
// id carries the row's id).
import type { CodeRow, Flag } from "../types";
import { flagOf, type Rule } from "./types";

const VAPOUR_ROWS = new Set(["irc-r702-7-3", "irc-r702-7-class"]);
const isInsulationRow = (r: CodeRow): boolean => !VAPOUR_ROWS.has(r.id);

function insufficientRFlag(rule: Pick<Rule, "id" | "source">, row: CodeRow): Flag {
  return {
    ...flagOf(
      rule,
      "caution",
      "Less insulation than the code row",
      `${row.label}: requires ${row.required}; provided ${row.provided}. Use the performance path or add insulation.`,
      `${row.label}, C`,
    ),
    id: `${rule.id}-${row.id}`,
  };
}

export const insufficientR: Rule = {
  id: "insufficient-r",
  severity: "caution",
  source: "IECC 2021/2018 Table R402.1.3, C",
  applies: (ctx) => ctx.codeRows.some((r) => isInsulationRow(r) && !r.pass),
  check(ctx) {
    return ctx.codeRows.filter((r) => isInsulationRow(r) && !r.pass).map((r) => insufficientRFlag(this, r));
  },
};
