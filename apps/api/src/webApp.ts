import { routePath } from "@spanwright/contracts/routes";
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

/** The beam editor's URL (the web app's router: "projects/:projectId/beams/:beamId"), its ids captured. */
const EDITOR_PATH = /^\/projects\/([^/]+)\/beams\/([^/]+)\/?$/;
/** Ids of plain URL characters: they need no escaping in HTML and read back the same. */
const PLAIN_ID = /^[A-Za-z0-9_-]+$/;
/** The editor's chunk in Vite's manifest (dist/.vite/manifest.json), keyed by its source path. */
const EDITOR_SOURCE = "src/editor/BeamEditorPage.tsx";

type Manifest = Record<string, { file: string; imports?: string[] }>;

/** A chunk's file and the files of everything it imports statically, once each, the chunk first. */
export function chunkFiles(manifest: Manifest, source: string): string[] {
  const files: string[] = [];
  const seen = new Set<string>();
  const visit = (key: string) => {
    const chunk = manifest[key];
    if (!chunk || seen.has(key)) return;
    seen.add(key);
    files.push(chunk.file);
    for (const imported of chunk.imports ?? []) visit(imported);
  };
  visit(source);
  return files;
}

/**
 * index.html for the editor's URL, naming the editor's chunks as module preloads: the browser then
 * fetches and compiles the largest chunk of the app while it compiles the entry, instead of after
 * the entry has run and asked for it (the first paint of the editor waited on that compile). Other
 * pages, the sign-in page among them, get index.html as built: the editor's code stays out of them.
 */
function editorHtml(indexHtml: string, manifest: Manifest): string {
  const links = chunkFiles(manifest, EDITOR_SOURCE)
    .map((file) => `<link rel="modulepreload" crossorigin href="/${file}">`)
    .join("\n    ");
  return links ? indexHtml.replace("<head>", `<head>\n    ${links}`) : indexHtml;
}

/**
 * The editor's first requests (the user, the project, the beam: boot.ts asks for the same URLs) as
 * fetch preloads, so they start with the HTML instead of once boot.ts has run. Only for
 * plain ids (`PLAIN_ID`).
 */
function withDataPreloads(html: string, projectId: string, beamId: string): string {
  if (!PLAIN_ID.test(projectId) || !PLAIN_ID.test(beamId)) return html;
  const urls = [routePath("me"), routePath("getProject", { projectId }), routePath("getBeam", { projectId, beamId })];
  const links = urls.map((url) => `<link rel="preload" as="fetch" crossorigin href="${url}">`).join("\n    ");
  return html.replace("<head>", `<head>\n    ${links}`);
}

/** The built web app with a fallback to index.html for client-side routes (GET outside /api). */
export function serveWebApp(app: Express, distDir: string): void {
  const indexHtml = path.join(distDir, "index.html");
  const manifestPath = path.join(distDir, ".vite", "manifest.json");
  // read again when the build changes under a running server (index.html's mtime)
  let editorPage: { built: number; html: string } | null = null;
  const editorPageHtml = (): string => {
    const built = fs.statSync(indexHtml).mtimeMs;
    if (editorPage?.built !== built) {
      const manifest = fs.existsSync(manifestPath) ? (JSON.parse(fs.readFileSync(manifestPath, "utf8")) as Manifest) : {};
      editorPage = { built, html: editorHtml(fs.readFileSync(indexHtml, "utf8"), manifest) };
    }
    return editorPage.html;
  };
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
    const editor = EDITOR_PATH.exec(req.path);
    if (editor) res.type("html").send(withDataPreloads(editorPageHtml(), editor[1]!, editor[2]!));
    else res.sendFile(indexHtml);
  });
}
