// `pnpm bench`: bundles the benchmark with esbuild, as the engine ships in the browser's worker
// (Vite's production build) and in the API's production build, then runs it with plain Node.
// Running the TypeScript through tsx instead measures tsx's module loader too: it reads every
// imported binding through a getter, which made the hot loops several times slower.
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { execFileSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { build } from "esbuild";

const SEMI_SPACE_MB = 64;
const here = path.dirname(fileURLToPath(import.meta.url));
const out = mkdtempSync(path.join(tmpdir(), "spanwright-bench-"));
try {
  const outfile = path.join(out, "bench.mjs");
  await build({
    entryPoints: [path.join(here, "bench.ts")],
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    outfile,
    logLevel: "warning",
    // ml-matrix is CommonJS inside; a require shim keeps its interop working in an ES bundle
    banner: { js: "import { createRequire } from 'node:module'; const require = createRequire(import.meta.url);" },
  });
  // The API's solver threads run with a 64 MB young-generation semi-space (solverPool.ts): a full
  // result is ~10 MB of short-lived row objects, and V8's default young generation copies and
  // promotes them mid-solve. The benchmark runs under the same setting, then repeats the
  // interactive case with V8's defaults for comparison.
  console.log(`engine bundled by esbuild, run by Node ${process.version} with --max-semi-space-size=${SEMI_SPACE_MB}`);
  execFileSync(process.execPath, [`--max-semi-space-size=${SEMI_SPACE_MB}`, outfile], { stdio: "inherit" });
  console.log("the interactive case again, with V8's default heap sizes:");
  execFileSync(process.execPath, [outfile], { stdio: "inherit", env: { ...process.env, SPANWRIGHT_BENCH_PART: "interactive" } });
} finally {
  rmSync(out, { recursive: true, force: true });
}
