import { randomBytes } from "node:crypto";
import { createConnection } from "mariadb";
import { beforeAll, afterAll } from "vitest";

/** Connection settings of the throwaway server that `npm test` started (see scripts/test.sh). */
export function testServer() {
  const port = Number(process.env.DB_PORT);
  if (!port) throw new Error("DB_PORT is not set: run the tests through `npm test`, which starts a throwaway MariaDB");
  return {
    host: process.env.DB_HOST ?? "127.0.0.1",
    port,
    user: process.env.DB_USER ?? "root",
    password: process.env.DB_PASSWORD ?? "",
  };
}

export async function createEmptyDatabase(prefix = "t"): Promise<string> {
  const name = `${prefix}_${randomBytes(5).toString("hex")}`;
  await createNamedDatabase(name);
  return name;
}

async function createNamedDatabase(name: string): Promise<void> {
  const connection = await createConnection(testServer());
  try {
    await connection.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  } finally {
    await connection.end();
  }
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
 * Gives this test file its own migrated database: the one tests/setup/database-name.ts named before the
 * app was imported, so the app's `sequelize` already points at it. Call at the top level of a test file.
 */
export function useMigratedDatabase(): { name: () => string } {
  const name = process.env.DB_NAME;
  if (!name)
    throw new Error("DB_NAME is not set: vitest.config.ts must list tests/setup/database-name.ts in setupFiles");
  beforeAll(async () => {
    await createNamedDatabase(name);
    const { sequelize } = await import("~/db/sequelize.server");
    const { createMigrator } = await import("../../db/migrator.ts");
    await createMigrator(sequelize).up();
  });
  afterAll(async () => {
    const { sequelize } = await import("~/db/sequelize.server");
    await sequelize.close();
    await dropDatabase(name);
  });
  return { name: () => name };
}
