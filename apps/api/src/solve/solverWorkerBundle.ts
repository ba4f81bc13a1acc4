import { fileURLToPath } from "node:url";
import { buildSync } from "esbuild";

let source: string | null = null;

/**
 * The solver thread's code (solveWorker.ts with the engine and its dependencies) as one CommonJS
 * script, bundled by esbuild once per process. A thread evaluates it directly: no TypeScript loader
 * in the thread, and the engine's hot loops run as the browser's bundled copy does (through tsx's
 * loader they ran several times slower), for about 0.2 s of bundling at start-up.
 */
export function solverWorkerSource(): string {
  if (source !== null) return source;
  const result = buildSync({
    entryPoints: [fileURLToPath(new URL("./solveWorker.ts", import.meta.url))],
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
