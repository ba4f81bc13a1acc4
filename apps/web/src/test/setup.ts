import { afterEach } from "vitest";
import { cleanup } from "@testing-library/react";
import { loadSchemas } from "../api/schemas";

// Testing Library only auto-cleans when test globals are on; this project keeps them off.
afterEach(() => {
  cleanup();
});

// The app loads the response schemas as their own chunk on first use (api/schemas.ts); loading
// them before the tests keeps that first use from adding an import's delay to a test's waits.
await loadSchemas();
