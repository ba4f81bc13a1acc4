import { defineProject } from "vitest/config";
import react from "@vitejs/plugin-react";

// Component tests render into happy-dom; no test here talks to a server.
export default defineProject({
  plugins: [react()],
  test: {
    name: "web",
    environment: "happy-dom",
    include: ["src/**/*.test.{ts,tsx}"],
    setupFiles: ["./src/test/setup.ts"],
  },
});
