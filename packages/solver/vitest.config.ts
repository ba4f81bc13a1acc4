import { defineProject } from "vitest/config";

export default defineProject({
  test: {
    name: "@spanwright/solver",
    include: ["src/**/*.test.ts"],
  },
});
