// `npm run content:import [folder]`: validates content/ and writes it to MariaDB in one transaction.
import { formatProblem } from "../app/content/content-error.ts";
import { ImportRejected, importContent } from "../app/catalogue/import.server.ts";
import { db } from "../app/db/sequelize.server.ts";

const root = process.argv[2] ?? "content";
const interactive = process.stderr.isTTY;

try {
  const summary = await importContent(root, {
    onProgress(done, total, label) {
      if (!interactive) return;
      const width = 30;
      const filled = Math.round((done / total) * width);
      process.stderr.write(`\r  [${"#".repeat(filled)}${".".repeat(width - filled)}] ${done}/${total} ${label.padEnd(60).slice(0, 60)}`);
      if (done === total) process.stderr.write("\n");
    },
  });
  const { materials, sets, details } = summary;
  console.log(
    `imported in ${summary.ms} ms: materials ${materials.created} new, ${materials.updated} updated, ${materials.unchanged} unchanged; ` +
      `sets ${sets.created} new, ${sets.updated} updated, ${sets.unchanged} unchanged; details ${details.created} new, ${details.revised} revised, ${details.unchanged} unchanged`,
  );
  for (const kept of details.kept) console.log(`  kept ${kept.slug}: ${kept.reason}`);
} catch (error) {
  if (error instanceof ImportRejected) {
    console.error(error.message);
    for (const problem of error.problems) console.error(`  ${formatProblem(problem)}`);
    process.exitCode = 1;
  } else {
    throw error;
  }
} finally {
  await db().close();
}
