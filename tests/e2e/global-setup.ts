import { spawn, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";
import type { TestProject } from "vitest/node";
import { createEmptyDatabase, dropDatabase } from "../helpers/database";

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      server.close(() => (typeof address === "object" && address ? resolve(address.port) : reject(new Error("no port"))));
    });
  });
}

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
    child.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`${command} ${args.join(" ")} exited with ${code}`))));
  });
}

const children: ChildProcess[] = [];
let database = "";

export async function setup(project: TestProject) {
  database = await createEmptyDatabase("e2e");
  const appPort = await freePort();
  const appUrl = `http://127.0.0.1:${appPort}`;
  const env: NodeJS.ProcessEnv = { ...process.env, DB_NAME: database, NODE_ENV: "production", APP_URL: appUrl };

  await run("npx", ["tsx", "db/migrate.ts", "up"], env);
  await run("npx", ["tsx", "scripts/content-import.ts"], env).catch((error) => {
    throw new Error(`content import failed: ${error.message}`);
  });

  const server = spawn("npx", ["react-router-serve", "./build/server/index.js"], {
    env: { ...env, HOST: "127.0.0.1", PORT: String(appPort) },
    stdio: ["ignore", "ignore", "inherit"],
  });
  children.push(server);
  await waitFor(`${appUrl}/healthz`, server);
  project.provide("baseUrl", appUrl);
}

export async function teardown() {
  for (const child of children) child.kill("SIGTERM");
  await dropDatabase(database);
}

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
  }
}
