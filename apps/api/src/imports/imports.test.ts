import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { teamProject } from "../handoffs/teamFixture.js";
import { createTestApp, invalidModel, twoSpanModel, type Client, type TestApp } from "../testing/index.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

function upload(client: Client, path: string, files: Array<[string, Buffer | string, string?]>, fields: Record<string, string> = {}) {
  let req = client.agent.post(path).set("Origin", client.origin);
  for (const [key, value] of Object.entries(fields)) req = req.field(key, value);
  for (const [name, content, contentType] of files) {
    req = req.attach("file", typeof content === "string" ? Buffer.from(content) : content, contentType ? { filename: name, contentType } : name);
  }
  return req;
}

const csv = (...rows: string[]) => ["case,type,position,magnitude", ...rows].join("\n") + "\n";

describe("beam import (exchange-format JSON)", () => {
  it("creates a beam solved on the server, named by the form field", async () => {
    const { engineer, projectPath } = await teamProject(t);
    const res = await upload(engineer.client, `${projectPath}/beams/import`, [["b7.json", JSON.stringify(twoSpanModel())]], { name: "Imported B7" });
    expect(res.status).toBe(201);
    expect(res.body.beam).toMatchObject({ name: "Imported B7", latestVersion: 1 });
    expect(res.body.revision.changeSummary).toBe("Imported from b7.json");
    expect(res.body.revision.result.results.D.reactions[1].fy).toBeCloseTo(62_500, 6);
  });

  it("takes the model's title as the name when none is typed", async () => {
    const { owner, projectPath } = await teamProject(t);
    const res = await upload(owner.client, `${projectPath}/beams/import`, [["x.json", JSON.stringify(twoSpanModel())]]);
    expect(res.body.beam.name).toBe("test beam");
  });

  it.each([
    ["not JSON", "model.json", "{ nodes: [", undefined, 422, "invalid-file"],
    ["JSON but not a beam", "model.json", JSON.stringify({ format: "something/else" }), undefined, 422, "invalid-file"],
    ["a JSON array", "model.json", "[1, 2]", undefined, 422, "invalid-file"],
    ["a model the solver rejects", "model.json", JSON.stringify(invalidModel()), undefined, 422, "invalid-model"],
    ["an image", "photo.png", "\u0089PNG", "image/png", 422, "invalid-file"],
    ["binary bytes in a .json", "model.json", "{\u0000}", undefined, 422, "invalid-file"],
    ["an empty file", "model.json", "", undefined, 422, "invalid-file"],
  ])("refuses %s and writes nothing", async (_title, name, content, type, status, code) => {
    const { engineer, projectPath } = await teamProject(t);
    const res = await upload(engineer.client, `${projectPath}/beams/import`, [[name, content, type]]);
    expect([res.status, res.body.error?.code]).toEqual([status, code]);
    expect((await engineer.client.get(`${projectPath}/beams`)).body.beams).toHaveLength(1);
  });

  it("refuses two files and a JSON body instead of a file", async () => {
    const { engineer, projectPath } = await teamProject(t);
    const model = JSON.stringify(twoSpanModel());
    const two = await upload(engineer.client, `${projectPath}/beams/import`, [["a.json", model], ["b.json", model]]);
    expect([two.status, two.body.error.code]).toEqual([422, "invalid-file"]);
    const plain = await engineer.client.post(`${projectPath}/beams/import`, twoSpanModel());
    expect([plain.status, plain.body.error.code]).toEqual([422, "invalid-file"]);
    expect((await engineer.client.get(`${projectPath}/beams`)).body.beams).toHaveLength(1);
  });

  it("refuses a 50 MB upload with 413 and writes nothing", async () => {
    const { engineer, projectPath } = await teamProject(t);
    const huge = Buffer.alloc(50 * 1024 * 1024, 0x20);
    const res = await upload(engineer.client, `${projectPath}/beams/import`, [["huge.json", huge]]);
    expect([res.status, res.body.error.code]).toEqual([413, "file-too-large"]);
    expect((await engineer.client.get(`${projectPath}/beams`)).body.beams).toHaveLength(1);
  });

  it("refuses a file just over the 2 MB limit while it streams in (413)", async () => {
    const { engineer, projectPath } = await teamProject(t);
    const over = Buffer.alloc(2_000_000 + 10_000, 0x20);
    const res = await upload(engineer.client, `${projectPath}/beams/import`, [["big.json", over]]);
    expect([res.status, res.body.error.code]).toEqual([413, "file-too-large"]);
  });
});

describe("load schedule", () => {
  it("previews rows and cases without writing anything", async () => {
    const { engineer, beamPath } = await teamProject(t);
    const res = await upload(engineer.client, `${beamPath}/load-schedule/preview`, [["loads.csv", csv("D,point,2.5 m,-12 kN", "W,distributed,0..5 m,-1.5 kN/m")]]);
    expect(res.status).toBe(200);
    expect(res.body.ok).toBe(true);
    expect(res.body.errors).toEqual([]);
    expect(res.body.preview.rows[0]).toMatchObject({ row: 2, caseId: "D", load: { type: "point", x: 2.5, fy: -12_000 } });
    expect(res.body.preview.cases.map((c: { id: string; willCreate: boolean }) => [c.id, c.willCreate])).toEqual([["D", false], ["W", true]]);
    expect((await engineer.client.get(beamPath)).body.beam.latestVersion).toBe(1);
  });

  it("reports wrong columns as a whole-file error", async () => {
    const { engineer, beamPath } = await teamProject(t);
    const res = await upload(engineer.client, `${beamPath}/load-schedule/preview`, [["loads.csv", "case,kind,where,value\nD,point,1 m,-1 kN\n"]]);
    expect(res.body.ok).toBe(false);
    expect(res.body.errors[0]).toMatchObject({ row: 1, column: null, code: "wrong-columns" });
  });

  it("reports unknown units and out-of-range positions row by row", async () => {
    const { engineer, beamPath } = await teamProject(t);
    const file = csv("D,point,2 m,-10 kN", "D,point,3 m,-4 furlongs", "L,point,12 m,-1 kN", "L,distributed,0..4 m,abc kN/m");
    const res = await upload(engineer.client, `${beamPath}/load-schedule/preview`, [["loads.csv", file]]);
    expect(res.status).toBe(200);
    expect(res.body.ok).toBe(false);
    const errors = res.body.errors.map((e: { row: number; column: string; code: string }) => [e.row, e.column, e.code]);
    expect(errors).toEqual([
      [3, "magnitude", "unknown-unit"],
      [4, "position", "out-of-range"],
      [5, "magnitude", "not-a-number"],
    ]);
  });

  it("applies a clean schedule as a new revision on top of baseVersion", async () => {
    const { engineer, beamPath } = await teamProject(t);
    const res = await upload(engineer.client, `${beamPath}/load-schedule/apply`, [["loads.csv", csv("D,point,2.5 m,-12 kN")]], { baseVersion: "1" });
    expect(res.status).toBe(201);
    expect(res.body.revision.version).toBe(2);
    expect(res.body.revision.changeSummary).toMatch(/^Load schedule loads\.csv: /);
    const dead = res.body.revision.model.loadCases.find((c: { id: string }) => c.id === "D");
    expect(dead.loads).toHaveLength(2);
    // 12 kN more downward load: the sum of the three D reactions grows by 12 kN (equilibrium)
    const sum = (r: Array<{ fy: number }>) => r.reduce((s, x) => s + x.fy, 0);
    expect(sum(res.body.revision.result.results.D.reactions)).toBeCloseTo(100_000 + 12_000, 6);
  });

  it("applies nothing when any row is wrong (422 with the rows) and answers a stale base with 409", async () => {
    const { engineer, beamPath } = await teamProject(t);
    const bad = await upload(engineer.client, `${beamPath}/load-schedule/apply`, [["loads.csv", csv("D,point,2 m,-1 kN", "D,point,30 m,-1 kN")]], { baseVersion: "1" });
    expect([bad.status, bad.body.error.code]).toEqual([422, "invalid-schedule"]);
    expect(bad.body.error.details.errors[0]).toMatchObject({ row: 3, column: "position", code: "out-of-range" });
    expect((await engineer.client.get(beamPath)).body.beam.latestVersion).toBe(1);
    await upload(engineer.client, `${beamPath}/load-schedule/apply`, [["a.csv", csv("D,point,2 m,-1 kN")]], { baseVersion: "1" });
    const stale = await upload(engineer.client, `${beamPath}/load-schedule/apply`, [["b.csv", csv("D,point,3 m,-1 kN")]], { baseVersion: "1" });
    expect([stale.status, stale.body.error.code]).toEqual([409, "version-conflict"]);
    const missing = await upload(engineer.client, `${beamPath}/load-schedule/apply`, [["b.csv", csv("D,point,3 m,-1 kN")]]);
    expect([missing.status, missing.body.error.details.issues[0].path]).toEqual([400, "baseVersion"]);
  });
});
