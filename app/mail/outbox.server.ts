import { readdir, readFile } from "node:fs/promises";
import { join } from "node:path";
import { env } from "~/config/env.server";
import type { CaughtMessage } from "../../dev/mail-catcher/server";

export type { CaughtMessage };

/** The outbox page exists in development, or in a local production build that names its outbox explicitly. */
export function outboxIsAvailable(): boolean {
  return env().NODE_ENV !== "production" || Boolean(process.env.MAIL_OUTBOX_DIR);
}

/** Messages caught by dev/mail-catcher, newest first. */
export async function listCaughtMail(limit = 100, outboxDir = env().MAIL_OUTBOX_DIR): Promise<CaughtMessage[]> {
  let names: string[];
  try {
    names = (await readdir(outboxDir)).filter((name) => name.endsWith(".json"));
  } catch {
    return []; // no catcher has run yet
  }
  names.sort().reverse();
  const messages = await Promise.all(
    names
      .slice(0, limit)
      .map(async (name) => JSON.parse(await readFile(join(outboxDir, name), "utf8")) as CaughtMessage),
  );
  return messages;
}
