import { hashPassword } from "./password.server";
import type { StaffRole } from "~/vocabulary/roles";
import { User } from "~/models/index.server";

// Demo logins for local development. The editors and reviewers carry the invented names used as
// authors and reviewers in content/details.
export const DEMO_PASSWORD = "dryside-demo-password";

export const DEMO_ACCOUNTS: { email: string; displayName: string; role: StaffRole }[] = [
  { email: "orla@dryside.invalid", displayName: "Orla Penhallow", role: "admin" },
  { email: "idris@dryside.invalid", displayName: "Idris Varrow", role: "reviewer" },
  { email: "tamsin@dryside.invalid", displayName: "Tamsin Grebe", role: "reviewer" },
  { email: "wren@dryside.invalid", displayName: "Wren Castellane", role: "editor" },
  { email: "member@dryside.invalid", displayName: "Juno Ashgrove", role: "member" },
];

/** A known password must never reach a real site: only loopback unless DEMO_ACCOUNTS=1. */
export function demoAccountsAllowed(appUrl: string, override: string | undefined): boolean {
  return ["127.0.0.1", "localhost", "[::1]"].includes(new URL(appUrl).hostname) || override === "1";
}

/** Creates the demo logins that are missing; existing accounts are left as they are. */
export async function ensureDemoAccounts(): Promise<string[]> {
  const existing = new Set(
    (await User.findAll({ attributes: ["email"], where: { email: DEMO_ACCOUNTS.map((a) => a.email) } })).map(
      (u) => u.email,
    ),
  );
  const missing = DEMO_ACCOUNTS.filter((account) => !existing.has(account.email));
  if (missing.length === 0) return [];
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  for (const account of missing) await User.create({ ...account, passwordHash, emailVerifiedAt: new Date() });
  return missing.map((account) => `${account.email} (${account.role})`);
}
