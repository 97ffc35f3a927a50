// `npx tsx scripts/demo-accounts.ts`: creates the demo logins (idempotently). Refuses to run against a
// non-loopback APP_URL unless DEMO_ACCOUNTS=1, so a known password never reaches a real site.
import { DEMO_PASSWORD, demoAccountsAllowed, ensureDemoAccounts } from "../app/auth/demo-accounts.server.ts";
import { sequelize } from "../app/db/sequelize.server.ts";

const appUrl = process.env.APP_URL ?? "http://127.0.0.1:3000";
if (!demoAccountsAllowed(appUrl, process.env.DEMO_ACCOUNTS)) {
  console.error(
    `demo accounts: refusing to create known-password logins for ${appUrl} (set DEMO_ACCOUNTS=1 to override)`,
  );
  process.exit(1);
}
try {
  const created = await ensureDemoAccounts();
  console.log(
    created.length
      ? `demo accounts created: ${created.join(", ")}; password "${DEMO_PASSWORD}"`
      : "demo accounts already present",
  );
} finally {
  await sequelize.close();
}
