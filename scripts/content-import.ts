// `npm run content:import [folder]`: validates content/ and writes it to MariaDB in one transaction.
import { importSummaryLines, rejectionLines } from "../app/catalogue/import-report.ts";
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
  for (const line of importSummaryLines(summary)) console.log(line);
} catch (error) {
  if (error instanceof ImportRejected) {
    console.error(error.message);
    for (const line of rejectionLines(error.problems)) console.error(line);
    process.exitCode = 1;
  } else {
    throw error;
  }
} finally {
  await db().close();
}
