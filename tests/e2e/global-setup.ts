import { spawn, type ChildProcess } from "node:child_process";
import type { TestProject } from "vitest/node";
import { createEmptyDatabase, dropDatabase } from "../helpers/database";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { startMailCatcher, type MailCatcher } from "../../dev/mail-catcher/server";
import { startPaymentsStandin, type PaymentsStandin } from "../../dev/payments-standin/server";
import { freePort } from "../../scripts/lib/free-port.ts";

async function waitFor(url: string, child: ChildProcess, timeoutMs = 30000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`${url}: process exited with ${child.exitCode}`);
    try {
      const response = await fetch(url);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`${url} did not answer within ${timeoutMs} ms`);
}

function run(command: string, args: string[], env: NodeJS.ProcessEnv): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { env, stdio: "inherit" });
    child.on("exit", (code) =>
      code === 0 ? resolve() : reject(new Error(`${command} ${args.join(" ")} exited with ${code}`)),
    );
  });
}

const children: ChildProcess[] = [];
let database = "";
let mailCatcher: MailCatcher | undefined;
let payments: PaymentsStandin | undefined;

export async function setup(project: TestProject) {
  database = await createEmptyDatabase("e2e");
  const appPort = await freePort();
  const appUrl = `http://127.0.0.1:${appPort}`;
  // The app mails through the local catcher; tests read what it caught from outboxDir.
  mailCatcher = await startMailCatcher({
    port: 0,
    outboxDir: mkdtempSync(join(process.env.TEST_SCRATCH_DIR ?? tmpdir(), "e2e-outbox-")),
  });
  const mail = { SMTP_HOST: "127.0.0.1", SMTP_PORT: String(mailCatcher.port), MAIL_OUTBOX_DIR: mailCatcher.outboxDir };
  // The payments stand-in on a free port, sending its signed webhooks to the app under test.
  const webhookSecret = "whsec_e2e_standin";
  payments = await startPaymentsStandin({
    port: 0,
    host: "127.0.0.1",
    webhookUrl: `${appUrl}/api/payments/webhook`,
    webhookSecret,
  });
  const stripe = {
    STRIPE_SECRET_KEY: "sk_test_e2e",
    STRIPE_API_HOST: "127.0.0.1",
    STRIPE_API_PORT: String(payments.port),
    STRIPE_API_PROTOCOL: "http",
    STRIPE_WEBHOOK_SECRET: webhookSecret,
  };
  const storage = { STORAGE_DIR: mkdtempSync(join(process.env.TEST_SCRATCH_DIR ?? tmpdir(), "e2e-storage-")) };
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    ...mail,
    ...stripe,
    ...storage,
    DB_NAME: database,
    NODE_ENV: "production",
    APP_URL: appUrl,
  };

  await run("npx", ["tsx", "db/migrate.ts", "up"], env);
  // Demo logins first, so the imported details link their authors and reviewers to real accounts.
  await run("npx", ["tsx", "scripts/demo-accounts.ts"], env);
  await run("npx", ["tsx", "scripts/content-import.ts"], env).catch((error) => {
    throw new Error(`content import failed: ${error.message}`);
  });

  const server = spawn(process.execPath, ["node_modules/@react-router/serve/bin.js", "./build/server/index.js"], {
    env: { ...env, HOST: "127.0.0.1", PORT: String(appPort) },
    stdio: ["ignore", "ignore", "inherit"],
  });
  children.push(server);
  await waitFor(`${appUrl}/healthz`, server);
  project.provide("baseUrl", appUrl);
  project.provide("outboxDir", mailCatcher.outboxDir);
}

/** Resolves when the process has exited, sending SIGKILL if SIGTERM was not enough within 2 s. */
function stop(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const force = setTimeout(() => child.kill("SIGKILL"), 2000);
    child.once("exit", () => {
      clearTimeout(force);
      resolve();
    });
    child.kill("SIGTERM");
  });
}

const withinSeconds = <T>(promise: Promise<T> | undefined, seconds: number) =>
  Promise.race([promise, new Promise((resolve) => setTimeout(resolve, seconds * 1000))]);

export async function teardown() {
  // The app server first: its pool's connections must be gone before the database is dropped.
  await Promise.all(children.map(stop));
  await withinSeconds(mailCatcher?.close(), 3);
  await withinSeconds(payments?.close(), 3);
  await dropDatabase(database);
}

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    outboxDir: string;
  }
}
