// A local stand-in for an SMTP provider: accepts every message on loopback and files it as JSON.
import { randomUUID } from "node:crypto";
import { mkdir, writeFile } from "node:fs/promises";
import type { AddressInfo } from "node:net";
import { join } from "node:path";
import { simpleParser, type AddressObject } from "mailparser";
import { SMTPServer } from "smtp-server";

export interface CaughtMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  date: string;
}

export interface MailCatcher {
  port: number;
  outboxDir: string;
  close(): Promise<void>;
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((group) => group.value.map((entry) => entry.address ?? "")).filter(Boolean);
}

/** Starts the catcher on 127.0.0.1 (port 0 picks a free one). Messages land in outboxDir as <date>-<id>.json. */
export async function startMailCatcher({ port, outboxDir }: { port: number; outboxDir: string }): Promise<MailCatcher> {
  await mkdir(outboxDir, { recursive: true });
  let arrivals = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    banner: "Dryside mail catcher",
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const date = parsed.date ?? new Date();
          const message: CaughtMessage = {
            id: randomUUID(),
            from: addresses(parsed.from)[0] ?? "",
            to: addresses(parsed.to),
            subject: parsed.subject ?? "",
            text: parsed.text ?? "",
            html: typeof parsed.html === "string" ? parsed.html : null,
            date: date.toISOString(),
          };
          // Arrival time (ms) plus a counter keeps a sorted listing in arrival order; the Date header only has seconds.
          arrivals += 1;
          const name = `${new Date().toISOString().replaceAll(":", "-")}-${String(arrivals).padStart(6, "0")}-${message.id}.json`;
          await writeFile(join(outboxDir, name), JSON.stringify(message, null, 2));
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve());
  });
  const address = server.server.address() as AddressInfo;
  return {
    port: address.port,
    outboxDir,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
