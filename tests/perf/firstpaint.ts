/**
 * `pnpm firstpaint`: how fast the beam editor first paints the project's demo beam, with the
 * production build, in Debian's Chromium (headless, through playwright-core; nothing downloaded).
 * A script that prints figures, not a timed test.
 *
 * It builds nothing: build the web app first (`pnpm --filter @spanwright/web build`) and the API's
 * server bundle (`pnpm --filter @spanwright/api build`; without it the API runs from source through
 * tsx, and says so). It serves a private copy of apps/web/dist (so a rebuild during the run cannot
 * break a page) from the production API (`NODE_ENV=production`, as `npm start` runs it) on 127.0.0.1 with a fresh
 * database on the project's PostgreSQL cluster, migrated and seeded with the demo data. Per run: a
 * fresh browser profile signs in through the sign-in form as the demo user (so the entry chunk is
 * cached, as for a real user), then a new page opens the demo beam's editor URL. Times are from
 * that navigation's start (performance.timeOrigin) to:
 *   - canvas:   the first animation frame in which the beam canvas has drawn pixels;
 *   - diagrams: the first frame in which the results diagrams (V, M, deflection, rotation) have.
 * One warm-up run is not counted; the median of the next FIRSTPAINT_RUNS (default 5) is printed,
 * with the load average (the machine is shared: compare figures taken under similar load). Then
 * the raw and gzip sizes of the JS the sign-in page loads and of the editor's chunks, read from the
 * Vite manifest (dist/.vite/manifest.json). Everything it started is stopped at the end.
 *
 * Environment: FIRSTPAINT_RUNS, FIRSTPAINT_BEAM (beam name prefix, default "RB-2"),
 * FIRSTPAINT_VERBOSE=1 (the median run's requests on a timeline), FIRSTPAINT_PROFILE=1 (the
 * median run's main-thread CPU by function), FIRSTPAINT_COMPARE=<another build's dist folder>
 * (a second server serves it; runs alternate between the two builds, so both see the same load:
 * keep a copy of dist from before a change to compare with), FIRSTPAINT_TRACE=<file> (a Chrome
 * trace of the editor page, the last run's kept, for Perfetto), SPANWRIGHT_CHROMIUM.
 */
import { execFileSync, spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import zlib from "node:zlib";
import { chromium, type Browser } from "playwright-core";
import { freePort } from "../freePort";

const here = path.dirname(fileURLToPath(import.meta.url));
const root = path.resolve(here, "../..");
const distDir = path.join(root, "apps/web/dist");
const chromiumPath = process.env.SPANWRIGHT_CHROMIUM ?? "/usr/bin/chromium";
const runs = Math.max(1, Number(process.env.FIRSTPAINT_RUNS ?? 5));
const beamPrefix = process.env.FIRSTPAINT_BEAM ?? "RB-2";
const verbose = process.env.FIRSTPAINT_VERBOSE === "1";
const profiling = process.env.FIRSTPAINT_PROFILE === "1";
const compareDir = process.env.FIRSTPAINT_COMPARE;
/** A Chrome trace of each run's editor page (the last run's is left there), for chrome://tracing or Perfetto. */
const tracePath = process.env.FIRSTPAINT_TRACE;
const demo = { email: "demo@spanwright.test", password: "spanwright-demo" };
const chromiumArgs = ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];
const pageTimeoutMs = 60_000;

// ---------------------------------------------------------------------------------------------
// What the page records: injected before any of the app's scripts, it looks at every animation
// frame for the two canvases and keeps the first moment each has drawn pixels.

// Plain JavaScript text, not a function: tsx would add helpers (__name) the page does not have.
// It sets window.__firstPaint = { canvas, diagrams, ... } (ms since the navigation started, or null).
const probe = `(() => {
  const marks = { canvas: null, diagrams: null, worker: null, solveAsked: null, solveAnswered: null };
  window.__firstPaint = marks;
  // when the engine worker starts, is first asked to solve, and first answers (FIRSTPAINT_VERBOSE)
  const NativeWorker = window.Worker;
  window.Worker = class extends NativeWorker {
    constructor(...args) {
      super(...args);
      if (marks.worker === null) marks.worker = performance.now();
      this.addEventListener("message", () => { if (marks.solveAnswered === null) marks.solveAnswered = performance.now(); });
    }
    postMessage(...args) {
      if (marks.solveAsked === null) marks.solveAsked = performance.now();
      return super.postMessage(...args);
    }
  };
  const hasPixels = (scope) => {
    for (const canvas of document.querySelectorAll(scope + " canvas")) {
      if (canvas.width === 0 || canvas.height === 0) continue;
      const context = canvas.getContext("2d");
      if (!context) continue;
      const pixels = new Uint32Array(context.getImageData(0, 0, canvas.width, canvas.height).data.buffer);
      if (pixels.some((p) => p !== 0)) return true;
    }
    return false;
  };
  const look = () => {
    if (marks.canvas === null && hasPixels('[role="application"][aria-label^="Beam canvas"]')) marks.canvas = performance.now();
    if (marks.diagrams === null && hasPixels('section[aria-label="Results"]')) marks.diagrams = performance.now();
    if (marks.canvas === null || marks.diagrams === null) requestAnimationFrame(look);
  };
  requestAnimationFrame(look);
})();`;

// ---------------------------------------------------------------------------------------------
// Processes and the database.

const stops: Array<() => void | Promise<void>> = [];
/** Undoes what was started, newest first, all but the first `keep` things. */
async function stopAll(keep = 0): Promise<void> {
  while (stops.length > keep) {
    try {
      await stops.pop()!();
    } catch (error) {
      console.error("firstpaint: cleanup:", error instanceof Error ? error.message : error);
    }
  }
}
// Ctrl-C, a kill, or a closed pipe (`| head`) must not leave a server, a browser or a database behind.
process.stdout.on("error", () => {});
for (const signal of ["SIGINT", "SIGTERM", "SIGHUP"] as const) {
  process.once(signal, () => {
    void stopAll().finally(() => process.exit(130));
  });
}

function db(...args: string[]): string {
  return execFileSync("bash", [path.join(root, "scripts/db.sh"), ...args], { cwd: root, encoding: "utf8", stdio: ["ignore", "pipe", "pipe"] }).trim();
}

function dbIsRunning(): boolean {
  try {
    db("is-running");
    return true;
  } catch {
    return false;
  }
}


/** A copy of a build without source maps (others may rebuild apps/web/dist meanwhile). */
function snapshotDist(dir: string): string {
  if (!fs.existsSync(path.join(dir, "index.html"))) {
    throw new Error(`no build in ${dir}: run \`pnpm --filter @spanwright/web build\` first`);
  }
  const copy = fs.mkdtempSync(path.join(os.tmpdir(), "spanwright-firstpaint-web-"));
  fs.cpSync(dir, copy, { recursive: true, filter: (source) => !source.endsWith(".map") });
  const html = fs.readFileSync(path.join(copy, "index.html"), "utf8");
  const missing = [...html.matchAll(/(?:src|href)="\/([^"]+\.(?:js|css))"/g)].map((m) => m[1]!).filter((a) => !fs.existsSync(path.join(copy, a)));
  if (missing.length > 0) throw new Error(`${dir} changed while being copied (a build is running?); run again when it is done`);
  return copy;
}

function stopChild(child: ChildProcess): Promise<void> {
  return new Promise((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null) return resolve();
    const timer = setTimeout(() => child.kill("SIGKILL"), 10_000);
    child.once("exit", () => {
      clearTimeout(timer);
      resolve();
    });
    child.kill("SIGTERM");
  });
}

/** The production server bundle (`pnpm --filter @spanwright/api build`), as `npm start` runs it. */
const apiBundled = fs.existsSync(path.join(root, "apps/api/dist/main.mjs"));

async function startServer(webDir: string, databaseUrl: string): Promise<string> {
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const log: string[] = [];
  const server = spawn(process.execPath, apiBundled ? ["dist/main.mjs"] : ["--import", "tsx", "src/main.ts"], {
    cwd: path.join(root, "apps/api"),
    env: {
      ...process.env,
      NODE_ENV: "production",
      HOST: "127.0.0.1",
      PORT: String(port),
      PUBLIC_URL: baseUrl,
      DATABASE_URL: databaseUrl,
      SERVE_WEB: "true",
      WEB_DIST_DIR: webDir,
      SMTP_MODE: "catcher",
      SMTP_PORT: "0",
      // five sign-ins and a warm-up must never meet the sign-in rate limit
      AUTH_RATE_LIMIT: "1000",
    },
    stdio: ["ignore", "pipe", "pipe"],
  });
  server.stdout!.on("data", (d: Buffer) => log.push(d.toString()));
  server.stderr!.on("data", (d: Buffer) => log.push(d.toString()));
  stops.push(() => stopChild(server));
  for (let i = 0; i < 240; i++) {
    if (server.exitCode !== null) throw new Error(`the API exited:\n${log.join("")}`);
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) return baseUrl;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`the API did not answer /api/health within 60 s:\n${log.join("")}`);
}

/** The demo beam's editor path, found through the API as the demo user. */
async function demoBeamPath(baseUrl: string): Promise<{ path: string; name: string }> {
  const headers = { "Content-Type": "application/json", Origin: baseUrl };
  const signIn = await fetch(`${baseUrl}/api/auth/sign-in`, { method: "POST", headers, body: JSON.stringify(demo) });
  if (!signIn.ok) throw new Error(`demo sign-in failed: ${signIn.status}`);
  const cookie = signIn.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  const get = async (p: string) => {
    const res = await fetch(`${baseUrl}${p}`, { headers: { ...headers, Cookie: cookie } });
    if (!res.ok) throw new Error(`GET ${p}: ${res.status}`);
    return res.json() as Promise<any>;
  };
  const { projects } = await get("/api/projects");
  for (const project of projects) {
    const { beams } = await get(`/api/projects/${project.id}/beams`);
    const beam = beams.find((b: { name: string }) => b.name.startsWith(beamPrefix));
    if (beam) return { path: `/projects/${project.id}/beams/${beam.id}`, name: beam.name };
  }
  throw new Error(`no demo beam named ${beamPrefix}… (FIRSTPAINT_BEAM)`);
}

// ---------------------------------------------------------------------------------------------
// One measured run.

interface RunFigures {
  canvas: number;
  diagrams: number;
  /** The engine worker's start, first solve request and first answer. */
  worker: { start: number | null; asked: number | null; answered: number | null };
  requests: Array<{ name: string; start: number; end: number; bytes: number }>;
  /** Main-thread CPU ms by function until the diagrams were drawn (FIRSTPAINT_PROFILE=1). */
  profile?: Map<string, number>;
}

interface CpuProfile {
  nodes: Array<{ id: number; callFrame: { functionName: string; url: string; lineNumber: number } }>;
  startTime: number;
  samples: number[];
  timeDeltas: number[];
}

/** Self time per function (name, file and line) over the whole profile (idle time left out). */
function selfTimes(profile: CpuProfile): Map<string, number> {
  const names = new Map(profile.nodes.map((n) => [n.id, `${n.callFrame.functionName || "(anonymous)"} ${path.basename(n.callFrame.url)}:${n.callFrame.lineNumber + 1}`]));
  const out = new Map<string, number>();
  for (let i = 0; i < profile.samples.length; i++) {
    const name = names.get(profile.samples[i]!)!;
    if (name.startsWith("(idle)")) continue;
    out.set(name, (out.get(name) ?? 0) + (profile.timeDeltas[i + 1] ?? 0) / 1000);
  }
  return out;
}

async function measureOnce(browser: Browser, baseUrl: string, beamPath: string, beamName: string): Promise<RunFigures> {
  const context = await browser.newContext({ baseURL: baseUrl, viewport: { width: 1400, height: 1000 } });
  context.setDefaultTimeout(pageTimeoutMs);
  try {
    const signInPage = await context.newPage();
    await signInPage.goto("/sign-in?next=%2Fprojects");
    await signInPage.getByLabel("E-mail").fill(demo.email);
    await signInPage.getByLabel("Password").fill(demo.password);
    await signInPage.getByRole("button", { name: "Sign in" }).click();
    await signInPage.waitForURL((url) => url.pathname === "/projects");
    await signInPage.waitForLoadState("networkidle");
    await signInPage.close();

    const page = await context.newPage();
    await page.addInitScript({ content: probe });
    const cdp = profiling ? await context.newCDPSession(page) : null;
    if (cdp) {
      await cdp.send("Profiler.enable");
      await cdp.send("Profiler.setSamplingInterval", { interval: 200 });
      await cdp.send("Profiler.start");
    }
    if (tracePath) await browser.startTracing(page, { path: tracePath, screenshots: false });
    await page.goto(beamPath, { waitUntil: "commit" });
    // Run in the page: globalThis is its window (no DOM types here). No named inner functions, for
    // which tsx would add a helper (__name) the page does not have; no strings, which the CSP refuses.
    await page.waitForFunction(() => {
      const marks = (globalThis as any).__firstPaint;
      return marks.canvas !== null && marks.diagrams !== null;
    }, null, { timeout: pageTimeoutMs, polling: 100 });
    await page.getByRole("heading", { level: 1, name: beamName }).waitFor();
    const marks = (await page.evaluate(() => (globalThis as any).__firstPaint)) as Record<"canvas" | "diagrams", number> & Record<"worker" | "solveAsked" | "solveAnswered", number | null>;
    const requests = (await page.evaluate(() =>
      (globalThis as any).performance
        .getEntriesByType("resource")
        .map((r: any) => ({ name: new URL(r.name).pathname, start: r.startTime, end: r.responseEnd, bytes: r.transferSize })),
    )) as RunFigures["requests"];
    if (tracePath) await browser.stopTracing();
    let profile: Map<string, number> | undefined;
    if (cdp) {
      const answer = (await cdp.send("Profiler.stop")) as unknown as { profile: CpuProfile };
      profile = selfTimes(answer.profile);
    }
    await page.close();
    return { canvas: marks.canvas, diagrams: marks.diagrams, worker: { start: marks.worker, asked: marks.solveAsked, answered: marks.solveAnswered }, requests, ...(profile ? { profile } : {}) };
  } finally {
    await context.close();
  }
}

// ---------------------------------------------------------------------------------------------
// Bundle sizes from the Vite manifest.

interface ManifestChunk {
  file: string;
  name?: string;
  src?: string;
  isEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
  assets?: string[];
  css?: string[];
}
type Manifest = Record<string, ManifestChunk>;

function sizesOf(dir: string, file: string): { raw: number; gzip: number } {
  const bytes = fs.readFileSync(path.join(dir, file));
  return { raw: bytes.length, gzip: zlib.gzipSync(bytes, { level: 6 }).length };
}

const kB = (n: number) => `${(n / 1000).toFixed(1)} kB`;

/** The chunk keys a chunk loads before it runs (itself and its static imports, transitively). */
function staticClosure(manifest: Manifest, key: string, into = new Set<string>()): Set<string> {
  if (into.has(key) || !manifest[key]) return into;
  into.add(key);
  for (const imported of manifest[key]!.imports ?? []) staticClosure(manifest, imported, into);
  return into;
}

function printSizes(dir: string): void {
  const manifestPath = path.join(dir, ".vite/manifest.json");
  if (!fs.existsSync(manifestPath)) {
    console.log("\nbundle sizes: no dist/.vite/manifest.json (build with the current vite.config.ts)");
    return;
  }
  const manifest = JSON.parse(fs.readFileSync(manifestPath, "utf8")) as Manifest;
  // index.html loads every entry (the app and its small boot script, see vite.config.ts)
  const entryKeys = Object.keys(manifest).filter((k) => manifest[k]!.isEntry);
  const entryKey = entryKeys.find((k) => k === "index.html") ?? entryKeys[0]!;
  const keyOf = (src: string) => Object.keys(manifest).find((k) => manifest[k]!.src === src);
  const signInKey = keyOf("src/pages/auth/SignInPage.tsx");
  const editorKey = keyOf("src/editor/BeamEditorPage.tsx");
  const table = (title: string, keys: Iterable<string>, extraFiles: string[] = []) => {
    const files = [...new Set([...[...keys].map((k) => manifest[k]!.file), ...extraFiles])];
    let raw = 0;
    let gzip = 0;
    console.log(`\n${title}`);
    for (const file of files) {
      const s = sizesOf(dir, file);
      raw += s.raw;
      gzip += s.gzip;
      console.log(`  ${path.basename(file).padEnd(44)} ${kB(s.raw).padStart(10)} ${kB(s.gzip).padStart(10)} gzip`);
    }
    if (files.length > 1) console.log(`  ${"total".padEnd(44)} ${kB(raw).padStart(10)} ${kB(gzip).padStart(10)} gzip`);
  };

  const entry = new Set<string>();
  for (const key of entryKeys) staticClosure(manifest, key, entry);
  const signIn = signInKey ? staticClosure(manifest, signInKey, new Set(entry)) : entry;
  table("sign-in page JS (entry chunk, its imports and the sign-in route):", signIn);
  if (!editorKey) return;
  const editorAll = staticClosure(manifest, editorKey);
  const editorOwn = [...editorAll].filter((k) => !signIn.has(k));
  const shared = [...editorAll].filter((k) => !entry.has(k) && signIn.has(k));
  table("editor chunks loaded on opening a beam (beyond the sign-in page's JS):", editorOwn);
  if (shared.length > 0) console.log(`  (also uses, already loaded by sign-in: ${shared.map((k) => path.basename(manifest[k]!.file)).join(", ")})`);
  const css = manifest[entryKey]!.css ?? [];
  if (css.length > 0) table("stylesheet (entry):", [], css);
  const workers = [...new Set([...entry, ...editorAll].flatMap((k) => manifest[k]!.assets ?? []).filter((f) => f.endsWith(".js")))];
  if (workers.length > 0) table("solver worker (started on the editor's URL):", [], workers);
  const lazy = new Set<string>();
  for (const k of editorOwn) for (const d of manifest[k]!.dynamicImports ?? []) if (!editorAll.has(d)) lazy.add(d);
  const lazyOwn = [...lazy].flatMap((k) => [...staticClosure(manifest, k)]).filter((k) => !editorAll.has(k) && !signIn.has(k));
  if (lazyOwn.length > 0) table("editor chunks loaded only when used (dialogs, panels):", new Set(lazyOwn));
}

// ---------------------------------------------------------------------------------------------

const median = (values: number[]) => {
  const s = [...values].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
};
const ms = (n: number) => `${Math.round(n)} ms`;
const load = () => os.loadavg().map((l) => l.toFixed(2)).join(" ");

interface Build {
  label: string;
  /** The private copy served. */
  dir: string;
  baseUrl: string;
  figures: RunFigures[];
}

function printFigures(build: Build): void {
  const { figures } = build;
  const canvas = median(figures.map((f) => f.canvas));
  const diagrams = median(figures.map((f) => f.diagrams));
  console.log(`\n${build.label}: median of ${figures.length}: first canvas paint ${ms(canvas)}, diagrams drawn ${ms(diagrams)} (target < 1000 ms)`);
  const mid = [...figures].sort((a, b) => a.diagrams - b.diagrams)[Math.floor(figures.length / 2)]!;
  if (verbose) {
    console.log("requests of the median run (start → end, ms from navigation; 0 bytes = from cache):");
    for (const r of [...mid.requests].sort((a, b) => a.start - b.start)) {
      console.log(`  ${ms(r.start).padStart(8)} → ${ms(r.end).padStart(8)}  ${String(r.bytes).padStart(7)} B  ${r.name}`);
    }
    const w = mid.worker;
    const at = (t: number | null) => (t === null ? "never" : ms(t));
    console.log(`engine worker: started ${at(w.start)}, first solve asked ${at(w.asked)}, answered ${at(w.answered)}; canvas ${ms(mid.canvas)}, diagrams ${ms(mid.diagrams)}`);
  }
  if (mid.profile) {
    const top = [...mid.profile].sort((a, b) => b[1] - a[1]);
    const total = top.reduce((sum, [, t]) => sum + t, 0);
    console.log(`main-thread CPU of the median run: ${ms(total)} busy; most self time:`);
    for (const [name, t] of top.slice(0, 25)) console.log(`  ${ms(t).padStart(8)}  ${name}`);
    const byFile = new Map<string, number>();
    for (const [name, t] of top) {
      const file = name.slice(name.lastIndexOf(" ") + 1).replace(/:\d+$/, "") || "(native)";
      byFile.set(file, (byFile.get(file) ?? 0) + t);
    }
    console.log("by file:");
    for (const [file, t] of [...byFile].sort((a, b) => b[1] - a[1]).slice(0, 12)) console.log(`  ${ms(t).padStart(8)}  ${file}`);
  }
}

async function main(): Promise<void> {
  if (!fs.existsSync(chromiumPath)) throw new Error(`no Chromium at ${chromiumPath}; install it with: bash scripts/bootstrap.sh --browser`);
  const sources = [{ label: path.relative(root, distDir), dir: distDir }, ...(compareDir ? [{ label: compareDir, dir: path.resolve(compareDir) }] : [])];
  const copies = sources.map((source) => {
    const copy = snapshotDist(source.dir);
    stops.push(() => fs.rmSync(copy, { recursive: true, force: true }));
    return { label: source.label, dir: copy };
  });

  const startedDb = !dbIsRunning();
  db("start");
  if (startedDb) stops.push(() => void db("stop"));
  const dbName = `spanwright_firstpaint_${Date.now()}_${process.pid}`;
  db("createdb", dbName);
  stops.push(() => void db("dropdb", dbName));
  const databaseUrl = db("url", dbName);
  const apiEnv = { ...process.env, DATABASE_URL: databaseUrl, NODE_ENV: "production" };
  execFileSync("pnpm", ["--silent", "--filter", "@spanwright/api", "run", "migrate"], { cwd: root, env: apiEnv, stdio: ["ignore", "ignore", "inherit"] });
  execFileSync("pnpm", ["--silent", "--filter", "@spanwright/api", "run", "seed"], { cwd: root, env: apiEnv, stdio: ["ignore", "ignore", "inherit"] });

  // one server per build (FIRSTPAINT_COMPARE), on the same database; runs alternate between them
  const builds: Build[] = [];
  for (const copy of copies) builds.push({ ...copy, baseUrl: await startServer(copy.dir, databaseUrl), figures: [] });
  const beam = await demoBeamPath(builds[0]!.baseUrl);
  const browser = await chromium.launch({ executablePath: chromiumPath, headless: true, args: chromiumArgs });
  stops.push(() => browser.close());

  console.log(`first paint of "${beam.name}" (${beam.path}), production build, Chromium headless 1400×1000`);
  console.log(
    apiBundled
      ? "API: the production bundle apps/api/dist/main.mjs"
      : "API: apps/api/src through tsx (no apps/api/dist/main.mjs; `pnpm --filter @spanwright/api build` makes it)",
  );
  console.log(`load average before: ${load()} (${os.cpus().length} cores)`);
  for (const build of builds) {
    const warmUp = await measureOnce(browser, build.baseUrl, beam.path, beam.name);
    console.log(`${build.label}: warm-up (not counted): canvas ${ms(warmUp.canvas)}, diagrams ${ms(warmUp.diagrams)}`);
  }
  for (let i = 0; i < runs; i++) {
    for (const build of builds) {
      const f = await measureOnce(browser, build.baseUrl, beam.path, beam.name);
      build.figures.push(f);
      console.log(`${build.label}: run ${i + 1}: canvas ${ms(f.canvas)}, diagrams ${ms(f.diagrams)}`);
    }
  }
  console.log(`load average after: ${load()}`);
  // Stop the browser, servers and database before the report (the dist copies, pushed first, stay
  // for the sizes), so that a reader who stops reading early (\`| head\`) leaves nothing running.
  await stopAll(copies.length);
  for (const build of builds) printFigures(build);
  for (const build of builds) {
    if (builds.length > 1) console.log(`\n===== bundle sizes of ${build.label}`);
    printSizes(build.dir);
  }
}

try {
  await main();
} catch (error) {
  console.error("firstpaint:", error instanceof Error ? error.message : error);
  process.exitCode = 1;
} finally {
  await stopAll();
}
