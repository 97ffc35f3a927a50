// `npm run content:import [folder]`: validates content/ and writes it to MariaDB in one transaction.
import { importAndReport } from "../app/catalogue/import-report.server.ts";
import { sequelize } from "../app/db/sequelize.server.ts";

const root = process.argv[2] ?? "content";
const interactive = process.stderr.isTTY;

try {
  const ok = await importAndReport(root, {
    onProgress(done, total, label) {
      if (!interactive) return;
      const width = 30;
      const filled = Math.round((done / total) * width);
      process.stderr.write(
        `\r  [${"#".repeat(filled)}${".".repeat(width - filled)}] ${done}/${total} ${label.padEnd(60).slice(0, 60)}`,
      );
      if (done === total) process.stderr.write("\n");
    },
  });
  if (!ok) process.exitCode = 1;
} finally {
  await sequelize.close();
}
