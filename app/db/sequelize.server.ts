import { Sequelize } from "sequelize";
import { databaseEnv } from "~/config/env.server";

export interface DatabaseOptions {
  host: string;
  port: number;
  database: string;
  username: string;
  password: string;
}

export function createSequelize(options: DatabaseOptions): Sequelize {
  return new Sequelize(options.database, options.username, options.password, {
    dialect: "mariadb",
    host: options.host,
    port: options.port,
    timezone: "+00:00",
    logging: false,
    define: { charset: "utf8mb4", collate: "utf8mb4_unicode_ci", underscored: true },
    // Fail fast when the server is down so pages answer 503 quickly and recover once it returns.
    pool: { max: 10, min: 0, acquire: 4000, idle: 10000, evict: 5000 },
    dialectOptions: { connectTimeout: 2000, socketTimeout: 20000 },
    retry: { max: 0 },
  });
}

// One instance per process, built at import (it connects only on the first query), so the models in
// app/models bind to it once. Kept on globalThis so dev-server reloads do not open new pools.
// Tests choose the database by setting DB_NAME before the app is imported (tests/setup/database-name.ts).
const globalForDb = globalThis as typeof globalThis & { __drysideSequelize?: Sequelize };

function fromEnvironment(): Sequelize {
  const e = databaseEnv();
  return createSequelize({
    host: e.DB_HOST,
    port: e.DB_PORT,
    database: e.DB_NAME,
    username: e.DB_USER,
    password: e.DB_PASSWORD,
  });
}

export const sequelize: Sequelize = (globalForDb.__drysideSequelize ??= fromEnvironment());

export async function databaseIsUp(): Promise<boolean> {
  try {
    await Promise.race([
      sequelize.query("SELECT 1"),
      new Promise((_, reject) => setTimeout(() => reject(new Error("ping timeout")), 2500)),
    ]);
    return true;
  } catch {
    return false;
  }
}
