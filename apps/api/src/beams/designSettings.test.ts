import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { teamProject } from "../handoffs/teamFixture.js";
import { createTestApp, type TestApp } from "../testing/index.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const iShape = { kind: "i-shape", d: 0.3, bf: 0.15, tf: 0.01, tw: 0.006 };
const steel = { id: "s", name: "Steel (demo)", kind: "steel", E: 200e9, Fy: 345e6, typical: true, note: "typical values, confirm for your project", source: "demo" };

/** Invented demo settings: a typed I-shape, ASD, braces every 2.5 m, Cb = 1, L/300 under L. */
const typed = {
  section: { source: "typed", name: "I-300 demo", shape: iShape },
  material: steel,
  method: "ASD",
  lb: 2.5,
  cb: "unity",
  strengthIds: ["C1"],
  deflection: [{ limit: { kind: "ratio", ratio: 300 }, ids: ["L"] }, { limit: { kind: "preset", presetId: "floor-total" }, ids: [] }],
  allowableBending: null,
  allowableShear: null,
};

describe("beam design settings", () => {
  it("are none for a new beam, and read with the beam once an engineer saves them", async () => {
    const { engineer, viewer, beamPath } = await teamProject(t);
    expect((await viewer.client.get(beamPath)).body.designSettings).toBeNull();
    const res = await engineer.client.patch(`${beamPath}/design-settings`, { designSettings: typed });
    expect(res.status).toBe(200);
    expect(res.body.designSettings).toEqual(typed);
    expect((await viewer.client.get(beamPath)).body.designSettings).toEqual(typed);
  });

  it("refer to a project section of the same project, and clear with null", async () => {
    const { owner, engineer, beamPath, projectPath } = await teamProject(t);
    const { section } = (await engineer.client.post(`${projectPath}/sections`, { name: "I-300", shape: iShape, material: steel })).body;
    const byId = { ...typed, section: { source: "project", sectionId: section.id }, material: null };
    expect((await owner.client.patch(`${beamPath}/design-settings`, { designSettings: byId })).body.designSettings).toEqual(byId);
    expect((await owner.client.patch(`${beamPath}/design-settings`, { designSettings: null })).body.designSettings).toBeNull();
    expect((await owner.client.get(beamPath)).body.designSettings).toBeNull();
  });

  it.each([
    ["a negative Lb", { lb: -1 }, 400, "designSettings.lb"],
    ["an unknown method", { method: "WSD" }, 400, "designSettings.method"],
    ["a typed section without a material", { material: null }, 400, "designSettings.material"],
    ["an unknown field", { colour: "red" }, 400, "designSettings"],
    ["an unknown deflection preset", { deflection: [{ limit: { kind: "preset", presetId: "bridge" }, ids: [] }] }, 400, "designSettings.deflection.0.limit.presetId"],
    ["a section id from nowhere", { section: { source: "project", sectionId: "00000000-0000-4000-8000-000000000000" } }, 400, "designSettings.section.sectionId"],
  ])("refuses %s naming the field, and keeps what was saved", async (_, change, status, path) => {
    const { engineer, beamPath } = await teamProject(t);
    await engineer.client.patch(`${beamPath}/design-settings`, { designSettings: typed });
    const res = await engineer.client.patch(`${beamPath}/design-settings`, { designSettings: { ...typed, ...change } });
    expect(res.status).toBe(status);
    expect(res.body.error.code).toBe("invalid-request");
    expect(res.body.error.details.issues.map((i: { path: string }) => i.path)).toContain(path);
    expect((await engineer.client.get(beamPath)).body.designSettings).toEqual(typed);
  });

  it("refuses a shape or material the design rules reject with 422 invalid-section naming the field", async () => {
    const { engineer, beamPath } = await teamProject(t);
    const badShape = await engineer.client.patch(`${beamPath}/design-settings`, { designSettings: { ...typed, section: { ...typed.section, shape: { ...iShape, tw: -1 } } } });
    expect(badShape.status).toBe(422);
    expect(badShape.body.error).toMatchObject({ code: "invalid-section", details: { field: "designSettings.section.shape.tw" } });
    const badMaterial = await engineer.client.patch(`${beamPath}/design-settings`, { designSettings: { ...typed, material: { ...steel, E: 0 } } });
    expect(badMaterial.status).toBe(422);
    expect(badMaterial.body.error).toMatchObject({ code: "invalid-section", details: { field: "designSettings.material.E" } });
    expect((await engineer.client.get(beamPath)).body.designSettings).toBeNull();
  });

  it("may be read but not changed by a checker or a viewer", async () => {
    const { checker, viewer, beamPath } = await teamProject(t);
    for (const who of [checker, viewer]) {
      const res = await who.client.patch(`${beamPath}/design-settings`, { designSettings: typed });
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe("forbidden");
    }
  });
});
