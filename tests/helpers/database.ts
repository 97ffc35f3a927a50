import { randomBytes } from "node:crypto";
import { createConnection } from "mariadb";
import { beforeAll, afterAll } from "vitest";

/** Connection settings of the throwaway server that `npm test` started (see scripts/test.sh). */
export function testServer() {
  const port = Number(process.env.DB_PORT);
  if (!port) throw new Error("DB_PORT is not set: run the tests through `npm test`, which starts a throwaway MariaDB");
  return { host: process.env.DB_HOST ?? "127.0.0.1", port, user: process.env.DB_USER ?? "root", password: process.env.DB_PASSWORD ?? "" };
}

export async function createEmptyDatabase(prefix = "t"): Promise<string> {
  const name = `${prefix}_${randomBytes(5).toString("hex")}`;
  const connection = await createConnection(testServer());
  try {
    await connection.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  } finally {
    await connection.end();
  }
  return name;
}

export async function dropDatabase(name: string): Promise<void> {
  const connection = await createConnection(testServer());
  try {
    await connection.query(`DROP DATABASE IF EXISTS \`${name}\``);
  } finally {
    await connection.end();
  }
}

/**
 * Gives this test file its own migrated database and points the app's `db()` at it.
 * Call at the top level of a test file, before anything touches the database.
 */
export function useMigratedDatabase(): { name: () => string } {
  let name = "";
  beforeAll(async () => {
    name = await createEmptyDatabase();
    process.env.DB_NAME = name;
    const { db } = await import("~/db/sequelize.server");
    const { createMigrator } = await import("../../db/migrator.ts");
    await createMigrator(db()).up();
  });
  afterAll(async () => {
    const { db } = await import("~/db/sequelize.server");
    await db().close();
    await dropDatabase(name);
  });
  return { name: () => name };
}
