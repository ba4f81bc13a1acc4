import { defineProject } from "vitest/config";

export default defineProject({
  test: {
    name: "mailcatcher",
    environment: "node",
    include: ["src/**/*.test.ts"],
  },
});
