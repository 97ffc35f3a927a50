// Creates or finds the plan and set prices in the payments service by lookup_key. Safe to run on every
// start (scripts/start.sh calls it after the content import, while the stand-in may still be starting).
import { syncPaymentsCatalogue } from "../app/payments/catalogue.server.ts";
import { db } from "../app/db/sequelize.server.ts";

async function withRetries<T>(task: () => Promise<T>, attempts = 40, delayMs = 250): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await task();
    } catch (error) {
      const refused = error instanceof Error && /ECONNREFUSED|connection/i.test(`${error.message} ${String((error as { code?: string }).code ?? "")}`);
      if (!refused || attempt >= attempts) throw error;
      await new Promise((resolve) => setTimeout(resolve, delayMs));
    }
  }
}

try {
  const results = await withRetries(() => syncPaymentsCatalogue());
  const created = results.filter((r) => r.created).length;
  console.log(`payments catalogue: ${results.length} prices, ${created} created`);
} catch (error) {
  console.error("payments catalogue sync failed:", error instanceof Error ? error.message : error);
  process.exitCode = 1;
} finally {
  await db().close();
}
