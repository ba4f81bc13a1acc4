import { afterEach, describe, expect, it, vi } from "vitest";
import { screen } from "@testing-library/react";
import type { Project, Role } from "@spanwright/contracts";
import { sampleReactionTable } from "../../revisions/testTables";
import { unitsFor } from "../../revisions/reactionUnits";
import { renderRoutes, stubFetch } from "../../test/renderWithProviders";
import { RevisionPage } from "./RevisionPage";

afterEach(() => {
  vi.unstubAllGlobals();
});

const P = "1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d";
const B = "0f5e6c1a-8b2d-4c3e-9f4a-5b6c7d8e9f01";
const base = `/api/projects/${P}/beams/${B}`;
// Invented project, beam and people.
const project = (role: Role): Project => ({
  id: P, name: "Invented depot", unitSystem: "si", compareThresholdPercent: 5, role,
  createdAt: "2026-11-02T09:00:00.000Z", updatedAt: "2026-11-02T09:00:00.000Z",
});
const beam = { id: B, projectId: P, name: "Level 2, grid C", latestVersion: 4, createdAt: "2026-11-01T09:00:00.000Z", updatedAt: "2026-11-02T09:00:00.000Z" };
const revision = {
  version: 3, author: { id: "u1", name: "Tomas Reyes" }, createdAt: "2026-11-03T09:00:00.000Z", changeSummary: "L: +2 kN/m on span 2",
  status: "issued", checkedBy: { id: "u2", name: "Ada Okafor" }, checkedAt: "2026-11-03T10:00:00.000Z", checkComment: "Agreed.",
  model: {
    format: "spanwright.beam/1",
    nodes: [{ x: 0, support: { type: "fixed" } }, { x: 6, support: { type: "pinned" } }, { x: 12, support: { type: "pinned" } }],
    segments: [],
    loadCases: [{ id: "D", category: "dead", loads: [{ type: "distributed", x1: 0, x2: 12, qy1: -3000, qy2: -3000 }] }],
    combinations: [{ id: "C1", factors: { D: 1.35 } }],
  },
  result: {},
};

function renderAs(role: Role) {
  vi.stubGlobal(
    "fetch",
    stubFetch({
      [`GET /api/projects/${P}`]: { status: 200, body: { project: project(role) } },
      [`GET ${base}`]: { status: 200, body: { beam, revision: { ...revision, version: 4, status: "draft" } } },
      [`GET ${base}/revisions/3`]: { status: 200, body: { revision } },
      [`GET ${base}/revisions/3/reactions`]: { status: 200, body: { version: 3, units: unitsFor("si"), table: sampleReactionTable(), upliftSupports: [] } },
      [`GET /api/projects/${P}/sections`]: { status: 200, body: { sections: [] } },
    }),
  );
  renderRoutes([{ path: "/projects/:projectId/beams/:beamId/revisions/:version", element: <RevisionPage /> }], `/projects/${P}/beams/${B}/revisions/3`);
}

describe("RevisionPage", () => {
  it("shows a viewer the revision read-only: model, downloads, reactions, no actions", async () => {
    renderAs("viewer");
    expect(await screen.findByText("Not the latest: r4 exists.")).toBeTruthy();
    expect(screen.getByText("distributed -3 kN/m from 0 m to 12 m")).toBeTruthy();
    expect(screen.getByText("S1: fixed at 0 m")).toBeTruthy();
    expect(screen.getByRole("link", { name: "PDF report" }).getAttribute("href")).toBe(`${base}/revisions/3/report.pdf`);
    expect(await screen.findByRole("table", { name: "Support reactions of r3" })).toBeTruthy();
    expect(screen.queryByRole("button", { name: /Issue/ })).toBeNull();
    expect(screen.queryByRole("button", { name: "Mark checked" })).toBeNull();
  });

  it("lets an engineer issue it", async () => {
    renderAs("engineer");
    expect(await screen.findByRole("button", { name: "Issue r3…" })).toBeTruthy();
  });
});
