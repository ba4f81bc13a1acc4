import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, invalidModel, twoSpanModel, type TestApp } from "../testing/index.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function project() {
  const owner = await t.signUp("Owner");
  const { project } = (await owner.client.post("/api/projects", { name: "Beams test" })).body;
  return { client: owner.client, base: `/api/projects/${project.id}/beams` };
}

describe("beams", () => {
  it("creates a beam as revision 1 with the result solved on the server", async () => {
    const { client, base } = await project();
    const res = await client.post(base, { name: "B-1 grid 3", model: twoSpanModel() });
    expect(res.status).toBe(201);
    expect(res.body.beam).toMatchObject({ name: "B-1 grid 3", latestVersion: 1 });
    expect(res.body.revision).toMatchObject({ version: 1, status: "draft", changeSummary: "First revision" });
    // two equal spans L = 5 m under q = 10 kN/m: end reactions 3qL/8 = 18.75 kN
    // (three-moment equation; common practice, e.g. any continuous-beam coefficient table)
    const reactions = res.body.revision.result.results.D.reactions;
    expect(reactions[0].fy).toBeCloseTo(18_750, 6);
    expect(reactions[1].fy).toBeCloseTo(62_500, 6);

    const got = await client.get(`${base}/${res.body.beam.id}`);
    expect(got.status).toBe(200);
    expect(got.body.revision.model).toEqual(twoSpanModel());
    expect((await client.get(base)).body.beams).toHaveLength(1);
  });

  it("answers 422 with the solver's error and its path for an invalid model, and saves nothing", async () => {
    const { client, base } = await project();
    const res = await client.post(base, { name: "Bad", model: invalidModel() });
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code: "invalid-model", where: "segments[1].I", details: { where: "segments[1].I" } });
    expect((await client.get(base)).body.beams).toEqual([]);
  });

  it("refuses a model over the API's size limit with 422 too-large", async () => {
    const { client, base } = await project();
    const model = { ...twoSpanModel(), nodes: Array.from({ length: 1001 }, (_, i) => ({ x: i })) };
    const res = await client.post(base, { name: "Huge", model });
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code: "too-large", details: { where: "nodes", limit: 1000 } });
  });

  it("renames and deletes a beam", async () => {
    const { client, base } = await project();
    const { beam } = (await client.post(base, { name: "Old", model: twoSpanModel() })).body;
    expect((await client.patch(`${base}/${beam.id}`, { name: "New" })).body.beam.name).toBe("New");
    expect((await client.delete(`${base}/${beam.id}`)).status).toBe(204);
    expect((await client.get(`${base}/${beam.id}`)).status).toBe(404);
  });

  it("names a missing model field", async () => {
    const { client, base } = await project();
    const res = await client.post(base, { name: "No model" });
    expect(res.status).toBe(400);
    expect(res.body.error.details.issues.map((i: { path: string }) => i.path)).toEqual(["model"]);
  });
});
