import type { TestApp } from "../testing/index.js";
import { twoSpanModel } from "../testing/index.js";

/**
 * Test fixture for the hand-off features: a project with one member per role and one beam.
 * `liveModel` adds a live load case L and a combination C1 = 1.2 D + 1.6 L to the two-span beam
 * (factors are only arbitrary test numbers here; no code combination is implied).
 */
export function liveModel(dead = -10_000, live = -5_000): Record<string, unknown> {
  const model = twoSpanModel(dead);
  return {
    ...model,
    loadCases: [
      ...(model.loadCases as unknown[]),
      { id: "L", category: "live", loads: [{ type: "distributed", x1: 0, x2: 10, qy1: live, qy2: live }] },
    ],
    combinations: [{ id: "C1", factors: { D: 1.2, L: 1.6 } }],
  };
}

export async function teamProject(t: TestApp, options: { unitSystem?: "si" | "us"; threshold?: number } = {}) {
  const owner = await t.signUp("Mara Owner");
  const engineer = await t.signUp("Tobias Engineer");
  const checker = await t.signUp("Ines Checker");
  const viewer = await t.signUp("Oluwaseun Viewer");
  const { project } = (
    await owner.client.post("/api/projects", {
      name: "Harbour Workshop",
      unitSystem: options.unitSystem ?? "si",
      compareThresholdPercent: options.threshold ?? 5,
    })
  ).body;
  for (const [who, role] of [[engineer, "engineer"], [checker, "checker"], [viewer, "viewer"]] as const) {
    await owner.client.post(`/api/projects/${project.id}/members`, { email: who.email, role });
  }
  const { beam } = (await engineer.client.post(`/api/projects/${project.id}/beams`, { name: "Roof beam B2", model: liveModel() })).body;
  const projectPath = `/api/projects/${project.id}`;
  const beamPath = `${projectPath}/beams/${beam.id}`;
  return { owner, engineer, checker, viewer, projectId: project.id as string, beamId: beam.id as string, projectPath, beamPath, revisions: `${beamPath}/revisions` };
}
