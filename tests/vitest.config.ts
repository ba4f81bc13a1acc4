import { defineConfig } from "vitest/config";

// Cross-package tests. API tests get a migrated template database per run from the API's global
// setup (each file copies it), on the project's PostgreSQL.
export default defineConfig({
  test: {
    name: "tests",
    include: ["**/*.test.ts"],
    exclude: ["**/node_modules/**"],
    globalSetup: ["../apps/api/src/testing/globalSetup.ts"],
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
