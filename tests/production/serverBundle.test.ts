import { execFile, spawn, type ChildProcess } from "node:child_process";
import { once } from "node:events";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { inject } from "vitest";
import { createTestDatabase, type TestDatabase } from "@spanwright/api/testing";
import { freePort } from "../freePort";

/*
 * `npm start` and `pnpm loadtest` run the API as bundled by apps/api/build.mjs (dist/main.mjs and the
 * solver threads' dist/solveWorker.cjs), not through tsx as every other test does. This file builds
 * that bundle and drives it over HTTP, so a path or a dependency that only breaks once bundled fails
 * here: start-up, sign-up, a solve on the worker threads, and a PDF report (pdfkit and the fonts it
 * resolves from node_modules).
 */

const apiDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../apps/api");
let database: TestDatabase;
let server: ChildProcess;
let baseUrl: string;
let log = "";


beforeAll(async () => {
  await promisify(execFile)(process.execPath, ["build.mjs"], { cwd: apiDir });
  database = await createTestDatabase(inject("templateDatabase"), inject("databasePrefix"));
  const port = await freePort();
  baseUrl = `http://127.0.0.1:${port}`;
  server = spawn(process.execPath, ["dist/main.mjs"], {
    cwd: apiDir,
    env: { ...process.env, NODE_ENV: "production", HOST: "127.0.0.1", PORT: String(port), DATABASE_URL: database.url, SMTP_MODE: "catcher", SMTP_PORT: "0", SOLVER_THREADS: "1" },
    stdio: ["ignore", "pipe", "pipe"],
  });
  server.stdout!.on("data", (chunk) => (log += chunk));
  server.stderr!.on("data", (chunk) => (log += chunk));
  for (let i = 0; i < 100; i++) {
    const up = await fetch(`${baseUrl}/api/health`).then((r) => r.ok, () => false);
    if (up) return;
    if (server.exitCode !== null) throw new Error(`the bundled server exited (${server.exitCode}):\n${log}`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`the bundled server did not answer /api/health:\n${log}`);
}, 120_000);

afterAll(async () => {
  if (server && server.exitCode === null) {
    server.kill("SIGTERM");
    await once(server, "exit");
    if (process.env.SHOW_SERVER_LOG) console.log(log);
  }
  await database?.drop();
});

async function call(method: string, route: string, body?: unknown, cookie?: string) {
  const res = await fetch(`${baseUrl}${route}`, {
    method,
    headers: { "Content-Type": "application/json", Origin: baseUrl, ...(cookie ? { Cookie: cookie } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  return res;
}

/** Invented: a 6 m simply supported beam, 10 kN/m. */
const model = {
  format: "spanwright.beam/1",
  nodes: [{ x: 0, support: { type: "pinned" } }, { x: 6, support: { type: "pinned" } }],
  segments: [{ E: 2e11, I: 1e-4 }],
  loadCases: [{ id: "D", category: "dead", loads: [{ type: "distributed", x1: 0, x2: 6, qy1: -10_000, qy2: -10_000 }] }],
};

describe("the production server bundle", () => {
  it("serves the API: sign-up, a solve on its solver thread, a saved beam and its PDF report", async () => {
    const up = await call("POST", "/api/auth/sign-up", { email: "bundle.check@example.test", name: "Bundle Check", password: "bundle check passphrase" });
    expect(up.status).toBe(201);
    const cookie = up.headers.getSetCookie().find((c) => c.startsWith("spanwright_session="))!.split(";")[0]!;
    const solved = await call("POST", "/api/solve", model, cookie);
    expect(solved.status).toBe(200);
    // wL/2 = 30 kN at each support (statics)
    const result = (await solved.json()) as { results: { D: { reactions: { fy: number }[] } } };
    expect(result.results.D.reactions.map((r) => r.fy)).toEqual([expect.closeTo(30_000, 6), expect.closeTo(30_000, 6)]);

    const project = (await (await call("POST", "/api/projects", { name: "Bundle check" }, cookie)).json()) as { project: { id: string } };
    const beamRes = await call("POST", `/api/projects/${project.project.id}/beams`, { name: "B1", model }, cookie);
    expect(beamRes.status).toBe(201);
    const { beam } = (await beamRes.json()) as { beam: { id: string } };
    const pdf = await call("GET", `/api/projects/${project.project.id}/beams/${beam.id}/revisions/1/report.pdf`, undefined, cookie);
    expect(pdf.status, log.split("\n").filter((l) => l.includes("\"level\":50")).join("\n")).toBe(200);
    expect(Buffer.from(await pdf.arrayBuffer()).subarray(0, 5).toString()).toBe("%PDF-");
  }, 60_000);
});
