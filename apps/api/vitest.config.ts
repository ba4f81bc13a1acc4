import { defineConfig } from "vitest/config";

// API tests run against the project's PostgreSQL: one migrated template per run, a copy per file.
export default defineConfig({
  test: {
    name: "api",
    include: ["src/**/*.test.ts"],
    globalSetup: ["src/testing/globalSetup.ts"],
    testTimeout: 20_000,
    hookTimeout: 60_000,
  },
});
