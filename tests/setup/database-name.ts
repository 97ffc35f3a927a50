// Runs before each test file is loaded: gives the file its own database name, so the app's Sequelize
// singleton (built when app modules are imported) points at it. useMigratedDatabase() creates,
// migrates and drops exactly this database; files that never call it never connect.
import { randomBytes } from "node:crypto";

process.env.DB_NAME = `t_${randomBytes(5).toString("hex")}`;
