import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const here = dirname(fileURLToPath(import.meta.url));
const root = resolve(here, "../../..");
const cli = join(here, "cli.ts");
const dir = mkdtempSync(join(tmpdir(), "spanwright-cli-"));

function run(args: string[], input?: string) {
  const result = spawnSync(process.execPath, ["--import", "tsx", cli, ...args], { cwd: root, input, encoding: "utf8", timeout: 60_000 });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

const good = {
  format: "spanwright.beam/1",
  nodes: [{ x: 0, support: { type: "pinned" } }, { x: 4, support: { type: "pinned" } }],
  segments: [{ E: 2e11, I: 8e-5 }],
  loadCases: [{ id: "D", category: "dead", loads: [{ type: "point", x: 2, fy: -1000 }] }],
};

function file(name: string, text: string): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

// Each case spawns Node with tsx, which can take seconds on a busy machine.
describe("solve command line", { timeout: 60_000 }, () => {
  it("prints the result JSON and exits 0 for a file", () => {
    const { status, stdout } = run([file("good.json", JSON.stringify(good))]);
    expect(status).toBe(0);
    const result = JSON.parse(stdout);
    expect(result.format).toBe("spanwright.result/1");
    expect(result.results.D.reactions[0].fy).toBeCloseTo(500, 9);
  });

  it("reads standard input with -", () => {
    const { status, stdout } = run(["-"], JSON.stringify(good));
    expect(status).toBe(0);
    expect(JSON.parse(stdout).results.D).toBeDefined();
  });

  it.each([
    { name: "an invalid model", args: () => [file("bad.json", JSON.stringify({ ...good, segments: [{ E: 2e11, I: -1 }] }))], code: "invalid-model", where: "segments[0].I", message: /segments\[0\]\.I/ },
    { name: "a mechanism", args: () => [file("mech.json", JSON.stringify({ ...good, nodes: [{ x: 0, support: { type: "pinned" } }, { x: 4 }] }))], code: "mechanism", where: "nodes 0 to 1 (x = 0 m to 4 m)", message: /can rotate about the support at x = 0 m/ },
    { name: "malformed JSON", args: () => [file("broken.json", "{ nodes: ")], code: "invalid-model", where: "(file)", message: /not valid JSON/ },
    { name: "a missing file", args: () => [join(dir, "missing.json")], code: "invalid-model", where: "(file)", message: /cannot read/ },
  ])("prints the error object on stderr and exits 2 for $name", ({ args, code, where, message }) => {
    const { status, stdout, stderr } = run(args());
    expect(status).toBe(2);
    expect(stdout).toBe("");
    const { error } = JSON.parse(stderr);
    expect(error.code).toBe(code);
    expect(error.where).toBe(where);
    expect(error.message).toMatch(message);
  });

  it.each([[[]], [["a.json", "b.json"]]])("exits 64 with a usage line for arguments %j", (args) => {
    const { status, stderr } = run(args);
    expect(status).toBe(64);
    expect(stderr).toMatch(/^usage: solve FILE/);
  });
});
