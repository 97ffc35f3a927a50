import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { inject, vi } from "vitest";

export interface CaughtMail {
  to: string[];
  subject: string;
  text: string;
}

/** Polls the mail catcher's outbox (files written by dev/mail-catcher) until a matching message arrives. */
export async function waitForMail(to: string, subject: RegExp = /./, timeoutMs = 15000): Promise<CaughtMail> {
  const dir = inject("outboxDir");
  return vi.waitFor(
    () => {
      const found = readdirSync(dir)
        .filter((name) => name.endsWith(".json"))
        .map((name) => JSON.parse(readFileSync(join(dir, name), "utf8")) as CaughtMail)
        .find((message) => message.to.includes(to) && subject.test(message.subject));
      if (!found) throw new Error(`no mail to ${to} matching ${subject} within ${timeoutMs} ms`);
      return found;
    },
    { timeout: timeoutMs, interval: 100 },
  );
}
