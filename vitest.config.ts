import { defineConfig } from "vitest/config";

// Kept apart from vite.config.ts so tests never load the React Router plugin.
export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    include: ["tests/unit/**/*.test.ts", "tests/integration/**/*.test.ts"],
    environment: "node",
    globalSetup: [],
    // A fresh DB_NAME per test file, set before the app (and its Sequelize singleton) is imported.
    setupFiles: ["tests/setup/database-name.ts"],
    testTimeout: 20000,
    hookTimeout: 60000,
    fileParallelism: false,
  },
});
