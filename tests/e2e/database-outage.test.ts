// A database outage answers 503 (HTML for pages, JSON for the API) and the app recovers by itself
// when the database returns: the app server is never restarted in this test.
import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, expect, test, vi } from "vitest";
import { freePort } from "../../scripts/lib/free-port.ts";

const scratch = mkdtempSync(join(process.env.TEST_SCRATCH_DIR ?? "/tmp", "outage-"));
const datadir = join(scratch, "db");
let dbPort = 0;
let appUrl = "";
let mariadb: ChildProcess | undefined;
let app: ChildProcess | undefined;

function run(command: string, args: string[], env: NodeJS.ProcessEnv = process.env): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { env, stdio: ["ignore", "ignore", "inherit"] });
    child.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`${command} exited with ${code}`))));
  });
}

function until(check: () => Promise<boolean>, what: string, timeoutMs = 30000): Promise<void> {
  return vi.waitFor(
    async () => {
      if (!(await check().catch(() => false))) throw new Error(`timed out waiting for ${what}`);
    },
    { timeout: timeoutMs, interval: 100 },
  );
}

async function startDatabase(): Promise<void> {
  mariadb = spawn(
    "mariadbd",
    [
      "--no-defaults",
      "--user=root",
      `--datadir=${datadir}`,
      `--port=${dbPort}`,
      "--bind-address=127.0.0.1",
      `--socket=${join(scratch, "db.sock")}`,
      `--pid-file=${join(scratch, "db.pid")}`,
      `--log-error=${join(scratch, "db.err")}`,
      "--skip-name-resolve",
      "--character-set-server=utf8mb4",
      "--collation-server=utf8mb4_unicode_ci",
      "--innodb-buffer-pool-size=32M",
      "--innodb-log-file-size=8M",
      "--skip-log-bin",
    ],
    { stdio: "ignore", env: { ...process.env, PATH: `${process.env.PATH}:/usr/sbin` } },
  );
  await until(
    () =>
      run("mariadb-admin", [
        "--no-defaults",
        "--protocol=tcp",
        "-h127.0.0.1",
        `-P${dbPort}`,
        "-uroot",
        "--connect-timeout=1",
        "ping",
      ]).then(() => true),
    "MariaDB",
  );
}

async function stopDatabase(): Promise<void> {
  const child = mariadb;
  if (!child || child.exitCode !== null) return;
  await new Promise<void>((resolve) => {
    child.on("exit", () => resolve());
    child.kill("SIGTERM");
  });
}

beforeAll(async () => {
  dbPort = await freePort();
  const appPort = await freePort();
  appUrl = `http://127.0.0.1:${appPort}`;
  await run("mariadb-install-db", [
    "--no-defaults",
    "--user=root",
    `--datadir=${datadir}`,
    "--auth-root-authentication-method=normal",
    "--skip-test-db",
    "--skip-name-resolve",
  ]);
  await startDatabase();
  await run("mariadb", [
    "--no-defaults",
    "--protocol=tcp",
    "-h127.0.0.1",
    `-P${dbPort}`,
    "-uroot",
    "-e",
    "CREATE DATABASE outage CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci",
  ]);
  const env = { ...process.env, DB_PORT: String(dbPort), DB_NAME: "outage", NODE_ENV: "production", APP_URL: appUrl };
  await run("npx", ["tsx", "db/migrate.ts", "up"], env);
  app = spawn(process.execPath, ["node_modules/@react-router/serve/bin.js", "./build/server/index.js"], {
    env: { ...env, HOST: "127.0.0.1", PORT: String(appPort) },
    stdio: "ignore",
  });
  await until(async () => (await fetch(`${appUrl}/healthz`)).ok, "the app");
}, 120000);

afterAll(async () => {
  app?.kill("SIGKILL");
  await stopDatabase();
});

test("pages and the API answer 503 while the database is down, and recover by themselves when it returns", async () => {
  expect((await fetch(`${appUrl}/details`)).status).toBe(200);

  await stopDatabase();
  const page = await fetch(`${appUrl}/details`);
  expect(page.status).toBe(503);
  expect(page.headers.get("retry-after")).toBe("10");
  expect(await page.text()).toContain("briefly unavailable");
  const api = await fetch(`${appUrl}/api/details?zone=5A`);
  expect(api.status).toBe(503);
  expect(await api.json()).toMatchObject({ error: "database_unavailable" });
  const health = await fetch(`${appUrl}/healthz`);
  expect(health.status).toBe(503);
  expect(await health.json()).toMatchObject({ database: "down" });

  await startDatabase();
  await until(async () => (await fetch(`${appUrl}/details`)).status === 200, "recovery without a restart");
  expect((await fetch(`${appUrl}/api/details?zone=5A`)).status).toBe(200);
});
