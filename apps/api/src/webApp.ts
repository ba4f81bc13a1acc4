import compression from "compression";
import express, { type Express } from "express";
import fs from "node:fs";
import path from "node:path";

/**
 * Vite names every file under /assets after a hash of its content, so a cached copy can never be
 * stale: a year and `immutable` (no revalidation on reload). index.html names those files and must
 * be fetched again on every visit (`no-cache` = revalidate; the ETag keeps it cheap).
 */
export const HASHED_ASSET_CACHE = "public, max-age=31536000, immutable";
export const INDEX_HTML_CACHE = "no-cache";
/** Other files at the root (icons, robots.txt) keep their names across builds. */
const OTHER_FILE_MAX_AGE_S = 3600;

/** gzip (or deflate) for text responses over 1 kB, negotiated with Accept-Encoding. */
export const compressResponses = compression({ threshold: 1024 });

/** The built web app with a fallback to index.html for client-side routes (GET outside /api). */
export function serveWebApp(app: Express, distDir: string): void {
  const indexHtml = path.join(distDir, "index.html");
  app.use(
    express.static(distDir, {
      index: false,
      setHeaders: (res, filePath) => {
        const relative = path.relative(distDir, filePath).split(path.sep);
        const header = relative[0] === "assets" ? HASHED_ASSET_CACHE : relative.join("/") === "index.html" ? INDEX_HTML_CACHE : `public, max-age=${OTHER_FILE_MAX_AGE_S}`;
        res.setHeader("Cache-Control", header);
      },
    }),
  );
  app.use((req, res, next) => {
    if ((req.method !== "GET" && req.method !== "HEAD") || req.path === "/api" || req.path.startsWith("/api/")) return next();
    if (!fs.existsSync(indexHtml)) return next();
    res.setHeader("Cache-Control", INDEX_HTML_CACHE);
    res.sendFile(indexHtml);
  });
}
