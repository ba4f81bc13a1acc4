import { defineProject } from "vitest/config";

export default defineProject({
  test: {
    name: "handoff",
    environment: "node",
    include: ["src/**/*.test.ts"],
  },
});
