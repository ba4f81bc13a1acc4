import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../testing/index.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** Invented demo values, SI: an I-shape 0.3 m deep, steel with E = 200 GPa (typical, confirm). */
const iShape = { kind: "i-shape", d: 0.3, bf: 0.15, tf: 0.01, tw: 0.006 };
const steel = {
  id: "steel-demo",
  name: "Structural steel (demo)",
  kind: "steel",
  E: 200e9,
  G: 77e9,
  Fy: 345e6,
  typical: true,
  note: "typical values, confirm for your project",
  source: "demo",
};

async function project() {
  const owner = await t.signUp("Section owner");
  const { project } = (await owner.client.post("/api/projects", { name: "Sections test" })).body;
  return { owner, projectId: project.id as string, base: `/api/projects/${project.id}/sections` };
}

describe("project sections", () => {
  it("stores a section and answers with its properties computed by the engine", async () => {
    const { owner, base } = await project();
    const res = await owner.client.post(base, { name: "Floor beam I-300", shape: iShape, material: steel });
    expect(res.status).toBe(201);
    expect(res.body.section).toMatchObject({ name: "Floor beam I-300", shape: iShape, material: { E: 200e9 } });
    expect(res.body.section.createdBy).toMatchObject({ name: "Section owner" });
    // hand calculation from the plates (fillets ignored): A = 2·bf·tf + (d − 2tf)·tw
    // = 2·0.15·0.01 + 0.28·0.006 = 4.68e-3 m²; I = bf·d³/12 − (bf − tw)(d − 2tf)³/12
    // = 0.15·0.027/12 − 0.144·0.021952/12 = 3.375e-4 − 2.634e-4 = 7.4076e-5 m⁴
    const p = res.body.section.sectionProperties;
    expect(p.A).toBeCloseTo(4.68e-3, 9);
    expect(p.I).toBeCloseTo(7.4076e-5, 9);
    expect(p.Stop).toBeCloseTo(7.4076e-5 / 0.15, 9);

    const list = await owner.client.get(base);
    expect(list.body.sections.map((s: { name: string }) => s.name)).toEqual(["Floor beam I-300"]);
    expect(list.body.sections[0].sectionProperties.depth).toBeCloseTo(0.3, 12);
  });

  it("refuses a second section with the same name in the project with 409 name-taken", async () => {
    const { owner, base } = await project();
    await owner.client.post(base, { name: "R-1", shape: { kind: "rectangle", b: 0.1, h: 0.2 }, material: steel });
    const res = await owner.client.post(base, { name: "R-1", shape: { kind: "rectangle", b: 0.2, h: 0.4 }, material: steel });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: "name-taken", details: { name: "R-1" } });
    // the same name in another project is fine
    const other = await project();
    expect((await other.owner.client.post(other.base, { name: "R-1", shape: iShape, material: steel })).status).toBe(201);
  });

  it.each([
    ["a flange thicker than half the depth", { ...iShape, tf: 0.2 }, steel, "shape.tf"],
    ["a negative width", { kind: "rectangle", b: -1, h: 0.2 }, steel, "shape.b"],
    ["a material without E", iShape, { ...steel, E: undefined }, "material.E"],
  ])("answers 422 invalid-section naming the field for %s", async (_, shape, material, field) => {
    const { owner, base } = await project();
    const res = await owner.client.post(base, { name: "Bad", shape, material });
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code: "invalid-section", details: { field } });
    expect((await owner.client.get(base)).body.sections).toEqual([]);
  });

  it("updates the shape and recomputes the properties, then deletes the section", async () => {
    const { owner, base } = await project();
    const { section } = (await owner.client.post(base, { name: "R", shape: { kind: "rectangle", b: 0.1, h: 0.2 }, material: steel })).body;
    const res = await owner.client.patch(`${base}/${section.id}`, { name: "R deeper", shape: { kind: "rectangle", b: 0.1, h: 0.4 } });
    expect(res.status).toBe(200);
    // rectangle I = b·h³/12 = 0.1·0.064/12 (closed form)
    expect(res.body.section.sectionProperties.I).toBeCloseTo((0.1 * 0.4 ** 3) / 12, 12);
    expect(res.body.section).toMatchObject({ name: "R deeper", material: { Fy: 345e6 } });
    expect((await owner.client.patch(`${base}/${section.id}`, {})).status).toBe(400);
    expect((await owner.client.delete(`${base}/${section.id}`)).status).toBe(204);
    expect((await owner.client.patch(`${base}/${section.id}`, { name: "Gone" })).status).toBe(404);
  });

  it("treats another project's section id as not found", async () => {
    const a = await project();
    const b = await project();
    const { section } = (await a.owner.client.post(a.base, { name: "Mine", shape: iShape, material: steel })).body;
    expect((await a.owner.client.post(b.base, { name: "x", shape: iShape, material: steel })).status).toBe(404);
    const invitee = await b.owner.client.patch(`${b.base}/${section.id}`, { name: "Stolen" });
    expect(invitee.status).toBe(404);
  });
});
