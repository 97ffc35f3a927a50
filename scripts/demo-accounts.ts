// `npx tsx scripts/demo-accounts.ts`: creates the demo logins (idempotently: existing accounts are left as they are).
// The editors and reviewers carry the invented names used as authors and reviewers in content/details.
// Refuses to run against a non-loopback APP_URL unless DEMO_ACCOUNTS=1, so a known password never reaches a real site.
import { hashPassword } from "../app/auth/password.server.ts";
import type { StaffRole } from "../app/auth/roles.ts";
import { db } from "../app/db/sequelize.server.ts";
import { User, models } from "../app/models/index.ts";

export const DEMO_PASSWORD = "dryside-demo-password";

const DEMO_ACCOUNTS: { email: string; displayName: string; role: StaffRole }[] = [
  { email: "orla@dryside.invalid", displayName: "Orla Penhallow", role: "admin" },
  { email: "idris@dryside.invalid", displayName: "Idris Varrow", role: "reviewer" },
  { email: "tamsin@dryside.invalid", displayName: "Tamsin Grebe", role: "reviewer" },
  { email: "wren@dryside.invalid", displayName: "Wren Castellane", role: "editor" },
  { email: "member@dryside.invalid", displayName: "Juno Ashgrove", role: "member" },
];

const appUrl = new URL(process.env.APP_URL ?? "http://127.0.0.1:3000");
if (!["127.0.0.1", "localhost", "[::1]"].includes(appUrl.hostname) && process.env.DEMO_ACCOUNTS !== "1") {
  console.error(`demo accounts: refusing to create known-password logins for ${appUrl.origin} (set DEMO_ACCOUNTS=1 to override)`);
  process.exit(1);
}

try {
  models();
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const created: string[] = [];
  for (const account of DEMO_ACCOUNTS) {
    const [, isNew] = await User.findOrCreate({
      where: { email: account.email },
      defaults: { ...account, passwordHash, emailVerifiedAt: new Date() },
    });
    if (isNew) created.push(`${account.email} (${account.role})`);
  }
  console.log(created.length ? `demo accounts created: ${created.join(", ")}; password "${DEMO_PASSWORD}"` : "demo accounts already present");
} finally {
  await db().close();
}
