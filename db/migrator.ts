import type { QueryInterface, Sequelize } from "sequelize";
import { SequelizeStorage, Umzug } from "umzug";
import { migrations } from "./migrations/index.ts";

export interface MigrationContext {
  queryInterface: QueryInterface;
  sequelize: Sequelize;
}

export interface Migration {
  name: string;
  up(context: MigrationContext): Promise<void>;
  down(context: MigrationContext): Promise<void>;
}

// The list is explicit (not a glob) so the same code runs under tsx, vitest and a compiled build.
export function createMigrator(
  sequelize: Sequelize,
  logger: Pick<Console, "info" | "warn" | "error" | "debug"> | undefined = undefined,
) {
  return new Umzug<MigrationContext>({
    migrations: migrations.map((m) => ({
      name: m.name,
      up: ({ context }) => m.up(context),
      down: ({ context }) => m.down(context),
    })),
    context: { queryInterface: sequelize.getQueryInterface(), sequelize },
    storage: new SequelizeStorage({ sequelize, tableName: "schema_migrations" }),
    logger,
  });
}
