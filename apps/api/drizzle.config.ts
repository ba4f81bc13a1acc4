import { defineConfig } from "drizzle-kit";

// Generation only (`pnpm --filter @spanwright/api db:generate`); migrations are applied by src/db/migrate.ts.
export default defineConfig({
  dialect: "postgresql",
  schema: "./src/db/schema.ts",
  out: "./drizzle",
  strict: true,
});
