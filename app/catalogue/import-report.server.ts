import { formatProblem } from "~/content/content-error";
import { ImportRejected, importContent, type ImportOptions, type ImportSummary } from "./import.server";

/** The lines the import commands print: one summary line, then any files the database kept newer. */
export function importSummaryLines(summary: ImportSummary): string[] {
  const { materials, sets, details } = summary;
  return [
    `imported in ${summary.ms} ms: materials ${materials.created} new, ${materials.updated} updated, ${materials.unchanged} unchanged; ` +
      `sets ${sets.created} new, ${sets.updated} updated, ${sets.unchanged} unchanged; details ${details.created} new, ${details.revised} revised, ${details.unchanged} unchanged`,
    ...details.kept.map((kept) => `  kept ${kept.slug}: ${kept.reason}`),
  ];
}

/**
 * Imports a content folder for a command-line script: prints the summary, or every problem with its
 * file, line and field when the import is rejected (nothing written). Returns whether it succeeded.
 */
export async function importAndReport(root: string, options: ImportOptions = {}): Promise<boolean> {
  try {
    for (const line of importSummaryLines(await importContent(root, options))) console.log(line);
    return true;
  } catch (error) {
    if (!(error instanceof ImportRejected)) throw error;
    console.error(error.message);
    for (const problem of error.problems) console.error(`  ${formatProblem(problem)}`);
    return false;
  }
}
