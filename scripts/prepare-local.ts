// One process for everything `npm start` does to the database before serving (each tsx start costs
// seconds on a busy machine): migrate, import content/, create the demo logins, and find or create
// the plan and set prices in the payments service.
import { importAndReport } from "../app/catalogue/import-report.server.ts";
import { DEMO_PASSWORD, demoAccountsAllowed, ensureDemoAccounts } from "../app/auth/demo-accounts.server.ts";
import { sequelize } from "../app/db/sequelize.server.ts";
import { syncPaymentsCatalogue } from "../app/payments/catalogue.server.ts";
import { createMigrator } from "../db/migrator.ts";

async function withRetries<T>(task: () => Promise<T>, attempts = 40, delayMs = 250): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await task();
    } catch (error) {
      if (attempt >= attempts || !/ECONNREFUSED|connection/i.test(String(error))) throw error;
      await new Promise((resolve) => setTimeout(resolve, delayMs));
    }
  }
}

try {
  const applied = await createMigrator(sequelize).up();
  console.log(applied.length ? `migrated: ${applied.map((m) => m.name).join(", ")}` : "schema up to date");

  if (!(await importAndReport("content"))) throw new Error("content/ was rejected; nothing was imported");

  if (demoAccountsAllowed(process.env.APP_URL ?? "http://127.0.0.1:3000", process.env.DEMO_ACCOUNTS)) {
    const created = await ensureDemoAccounts();
    console.log(
      created.length
        ? `demo logins created (password "${DEMO_PASSWORD}"): ${created.join(", ")}`
        : "demo logins present",
    );
  }

  const prices = await withRetries(() => syncPaymentsCatalogue());
  console.log(`payments catalogue: ${prices.length} prices, ${prices.filter((p) => p.created).length} created`);
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
} finally {
  await sequelize.close();
}
