import { defineConfig } from "vitest/config";

// One run over every package; each project keeps its own config beside its code.
export default defineConfig({
  test: {
    projects: ["packages/*", "apps/*", "tests"],
  },
});
