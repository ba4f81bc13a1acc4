import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { fileURLToPath } from "node:url";

let source: string | null = null;

/**
 * The solver thread's code (solveWorker.ts with the engine and its dependencies) as one CommonJS
 * script that a thread evaluates directly: no TypeScript loader in the thread, and the engine's hot
 * loops run as the browser's bundled copy does (through tsx's loader they ran several times slower).
 * The production build (build.mjs) writes it next to the server bundle; running from source (tests,
 * development) it is bundled here by esbuild once per process, in about 0.2 s.
 */
export function solverWorkerSource(): string {
  if (source !== null) return source;
  const here = import.meta.url;
  if (!here.endsWith(".ts")) {
    source = readFileSync(fileURLToPath(new URL("./solveWorker.cjs", here)), "utf8");
    return source;
  }
  const { buildSync } = createRequire(here)("esbuild") as typeof import("esbuild");
  const result = buildSync({
    entryPoints: [fileURLToPath(new URL("./solveWorker.ts", here))],
    bundle: true,
    platform: "node",
    format: "cjs",
    target: "node20",
    write: false,
    logLevel: "silent",
  });
  source = result.outputFiles[0]!.text;
  return source;
}
