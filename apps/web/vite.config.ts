import { defineConfig, type Plugin } from "vite";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";

// In development the API runs beside Vite on port 3000; in production the API serves dist/ itself,
// so the browser only ever talks to one origin and the session cookie stays same-site.
const apiTarget = process.env.SPANWRIGHT_API_URL ?? "http://127.0.0.1:3000";

/**
 * src/boot.ts (which starts the first screen's requests, the editor chunk and the engine worker) as
 * its own small entry, loaded by index.html before the app's entry: it runs as soon as it is
 * compiled, instead of after the browser has compiled the whole app entry (React, the router...).
 * main.tsx imports it too (development, and the build's module graph), so it runs once either way.
 */
function bootFirst(): Plugin {
  return {
    name: "spanwright-boot-first",
    apply: "build",
    transformIndexHtml: {
      order: "post",
      handler(_html, context) {
        const boot = Object.values(context.bundle ?? {}).find((c) => c.type === "chunk" && c.isEntry && c.name === "boot");
        if (!boot) throw new Error("vite.config.ts: no boot entry in the bundle");
        return [{ tag: "script", attrs: { type: "module", crossorigin: true, src: `/${boot.fileName}` }, injectTo: "head-prepend" }];
      },
    },
  };
}

export default defineConfig({
  plugins: [react(), tailwindcss(), bootFirst()],
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
    rollupOptions: {
      input: { index: "index.html", boot: "src/boot.ts" },
    },
  },
});
