import { defineConfig } from "vite";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";

// In development the API runs beside Vite on port 3000; in production the API serves dist/ itself,
// so the browser only ever talks to one origin and the session cookie stays same-site.
const apiTarget = process.env.SPANWRIGHT_API_URL ?? "http://127.0.0.1:3000";

export default defineConfig({
  plugins: [react(), tailwindcss()],
  server: {
    host: "127.0.0.1",
    proxy: {
      "/api": { target: apiTarget, changeOrigin: false },
    },
  },
  preview: {
    host: "127.0.0.1",
    proxy: {
      "/api": { target: apiTarget, changeOrigin: false },
    },
  },
  build: {
    outDir: "dist",
    emptyOutDir: true,
    sourcemap: true,
    // dist/.vite/manifest.json: which chunks each page loads (`pnpm firstpaint` reports their sizes)
    manifest: true,
  },
});
