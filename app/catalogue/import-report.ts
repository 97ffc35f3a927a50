import { formatProblem } from "~/content/content-error";
import type { ImportSummary } from "./import.server";

/** The lines the import commands print: one summary line, then any files the database kept newer. */
export function importSummaryLines(summary: ImportSummary): string[] {
  const { materials, sets, details } = summary;
  return [
    `imported in ${summary.ms} ms: materials ${materials.created} new, ${materials.updated} updated, ${materials.unchanged} unchanged; ` +
      `sets ${sets.created} new, ${sets.updated} updated, ${sets.unchanged} unchanged; details ${details.created} new, ${details.revised} revised, ${details.unchanged} unchanged`,
    ...details.kept.map((kept) => `  kept ${kept.slug}: ${kept.reason}`),
  ];
}

/** Every problem of a rejected import, one per line with file, line and field. */
export function rejectionLines(problems: readonly Parameters<typeof formatProblem>[0][]): string[] {
  return problems.map((problem) => `  ${formatProblem(problem)}`);
}
