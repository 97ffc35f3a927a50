import { mkdtempSync, readdirSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll } from "vitest";
import { startMailCatcher, type CaughtMessage, type MailCatcher } from "../../dev/mail-catcher/server";

/**
 * Runs dev/mail-catcher on a free port for this test file and points the app's SMTP settings at it.
 * Call before useMigratedDatabase(), which is the first thing to read the (cached) environment.
 */
export function useMailCatcher(): { outbox: () => CaughtMessage[] } {
  let catcher: MailCatcher | undefined;
  const outboxDir = mkdtempSync(join(process.env.TEST_SCRATCH_DIR ?? tmpdir(), "outbox-"));
  beforeAll(async () => {
    catcher = await startMailCatcher({ port: 0, outboxDir });
    process.env.SMTP_HOST = "127.0.0.1";
    process.env.SMTP_PORT = String(catcher.port);
    process.env.MAIL_OUTBOX_DIR = outboxDir;
  });
  afterAll(async () => {
    const { closeMailer } = await import("~/mail/mailer.server");
    closeMailer();
    await catcher?.close();
  });
  return { outbox: () => readOutbox(outboxDir) };
}

export function readOutbox(outboxDir: string): CaughtMessage[] {
  return readdirSync(outboxDir)
    .filter((name) => name.endsWith(".json"))
    .sort()
    .map((name) => JSON.parse(readFileSync(join(outboxDir, name), "utf8")) as CaughtMessage);
}

/** The first link to this app path found in a caught message's text. */
export function linkIn(message: CaughtMessage, path: string): string {
  const match = message.text.match(new RegExp(`https?://\\S+${path}/[A-Za-z0-9_-]+`));
  if (!match) throw new Error(`no ${path} link in “${message.subject}”`);
  return match[0];
}
