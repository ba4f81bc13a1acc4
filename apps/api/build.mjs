// `pnpm --filter @spanwright/api build`: the production server as two bundles in dist/ — main.mjs
// (the API with the workspace packages; npm packages stay external and load from node_modules) and
// solveWorker.cjs (a solver thread with the engine, self-contained). Running the TypeScript through
// tsx is for development and tests; its loader made the engine's hot loops several times slower.
import { readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { build } from "esbuild";

const root = path.dirname(fileURLToPath(import.meta.url));
const { dependencies } = JSON.parse(readFileSync(path.join(root, "package.json"), "utf8"));
// every npm dependency (and its subpaths) stays external; the workspace's own packages are bundled
const external = Object.keys(dependencies).filter((name) => !name.startsWith("@spanwright/"));

const common = { bundle: true, platform: "node", target: "node20", logLevel: "warning", sourcemap: "linked" };
await Promise.all([
  build({ ...common, entryPoints: [path.join(root, "src/main.ts")], format: "esm", external, outfile: path.join(root, "dist/main.mjs") }),
  build({ ...common, entryPoints: [path.join(root, "src/solve/solveWorker.ts")], format: "cjs", sourcemap: false, outfile: path.join(root, "dist/solveWorker.cjs") }),
]);
