// Standalone migration command: `tsx db/migrate.ts up|down|reset|status`.
import { sequelize } from "../app/db/sequelize.server.ts";
import { createMigrator } from "./migrator.ts";

const command = process.argv[2] ?? "up";
const migrator = createMigrator(sequelize);

try {
  if (command === "up") {
    const done = await migrator.up();
    console.log(done.length ? `migrated: ${done.map((m) => m.name).join(", ")}` : "schema up to date");
  } else if (command === "down") {
    const done = await migrator.down();
    console.log(`reverted: ${done.map((m) => m.name).join(", ") || "nothing"}`);
  } else if (command === "reset") {
    await migrator.down({ to: 0 });
    await migrator.up();
    console.log("schema rebuilt");
  } else if (command === "status") {
    const pending = await migrator.pending();
    console.log(`pending: ${pending.map((m) => m.name).join(", ") || "none"}`);
  } else {
    throw new Error(`unknown command "${command}" (use up, down, reset or status)`);
  }
} finally {
  await sequelize.close();
}
