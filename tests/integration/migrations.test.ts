import { afterAll, beforeAll, expect, test } from "vitest";
import type { Sequelize } from "sequelize";
import { createSequelize } from "~/db/sequelize.server";
import { createMigrator } from "../../db/migrator.ts";
import { migrations } from "../../db/migrations/index.ts";
import { createEmptyDatabase, dropDatabase, testServer } from "../helpers/database";

let name: string;
let sequelize: Sequelize;

beforeAll(async () => {
  name = await createEmptyDatabase("migrations");
  const server = testServer();
  sequelize = createSequelize({
    host: server.host,
    port: server.port,
    database: name,
    username: server.user,
    password: server.password,
  });
});

afterAll(async () => {
  await sequelize.close();
  await dropDatabase(name);
});

async function tableNames(): Promise<string[]> {
  const [rows] = await sequelize.query(
    "SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE()",
  );
  return (rows as { name: string }[]).map((row) => row.name).sort();
}

test("every migration applies on an empty database, in the listed order", async () => {
  const applied = await createMigrator(sequelize).up();
  expect(applied.map((m) => m.name)).toEqual(migrations.map((m) => m.name));
  expect(await tableNames()).toEqual(
    expect.arrayContaining(["users", "details", "detail_revisions", "materials", "schema_migrations"]),
  );
});

test("migrating twice changes nothing", async () => {
  expect(await createMigrator(sequelize).up()).toEqual([]);
});

test("reverting every migration leaves only the migration ledger, and re-applying restores the same schema", async () => {
  const before = await tableNames();
  const migrator = createMigrator(sequelize);
  await migrator.down({ to: 0 });
  expect(await tableNames()).toEqual(["schema_migrations"]);
  await migrator.up();
  expect(await tableNames()).toEqual(before);
});

test("the details table carries a FULLTEXT index for catalogue search", async () => {
  const [rows] = await sequelize.query("SHOW INDEX FROM details WHERE Index_type = 'FULLTEXT'");
  const columns = (rows as { Column_name: string }[]).map((row) => row.Column_name).sort();
  expect(columns).toEqual(["search_text", "summary", "title"]);
});
