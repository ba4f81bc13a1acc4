import { afterEach, describe, expect, it, vi } from "vitest";
import { screen } from "@testing-library/react";
import type { CompareResponse, Project } from "@spanwright/contracts";
import { sampleReactionTable } from "../../revisions/testTables";
import { unitsFor } from "../../revisions/reactionUnits";
import { renderRoutes, stubFetch } from "../../test/renderWithProviders";
import { CompareRevisionsPage } from "./CompareRevisionsPage";

afterEach(() => {
  vi.unstubAllGlobals();
});

const P = "1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d";
const B = "0f5e6c1a-8b2d-4c3e-9f4a-5b6c7d8e9f01";
const base = `/api/projects/${P}/beams/${B}`;
// Invented project and beam.
const project: Project = {
  id: P, name: "Invented depot", unitSystem: "si", compareThresholdPercent: 10, role: "engineer",
  createdAt: "2026-11-02T09:00:00.000Z", updatedAt: "2026-11-02T09:00:00.000Z",
};
const beam = { id: B, projectId: P, name: "Level 2, grid C", latestVersion: 5, createdAt: "2026-11-01T09:00:00.000Z", updatedAt: "2026-11-02T09:00:00.000Z" };
const compare: CompareResponse = {
  from: 3, to: 5, thresholdPercent: 10, units: unitsFor("si"),
  before: sampleReactionTable(), after: sampleReactionTable(1.2),
  supports: [{ x: 0, before: null, after: { node: 0, label: "S1", x: 0, support: "fixed" }, status: "kept" }],
  values: [
    { x: 6, label: "S2", kind: "case", id: "D", quantity: "fy", before: 50_000, after: 60_000, change: 10_000, changePct: 20, flagged: true },
    { x: 0, label: "S1", kind: "case", id: "D", quantity: "fy", before: 20_000, after: 21_000, change: 1_000, changePct: 5, flagged: false },
  ],
  flaggedCount: 1,
  modelDiff: { changes: [{ kind: "load-changed" }], summary: ["D: -10 kN/m became -12 kN/m on span 1"] },
};

describe("CompareRevisionsPage", () => {
  it("asks for the revisions in the URL and shows the model diff and the highlighted change", async () => {
    vi.stubGlobal(
      "fetch",
      stubFetch({
        [`GET /api/projects/${P}`]: { status: 200, body: { project } },
        [`GET ${base}`]: { status: 200, body: { beam, revision: { version: 5, author: { id: "u", name: "T" }, createdAt: "", changeSummary: "", status: "draft", checkedBy: null, checkedAt: null, checkComment: null, model: {}, result: {} } } },
        [`GET ${base}/revisions`]: { status: 200, body: { revisions: [] } },
        [`GET ${base}/revisions/compare?from=3&to=5`]: { status: 200, body: compare },
      }),
    );
    renderRoutes([{ path: "/projects/:projectId/beams/:beamId/compare", element: <CompareRevisionsPage /> }], `/projects/${P}/beams/${B}/compare?from=3&to=5`);
    expect(await screen.findByText("D: -10 kN/m became -12 kN/m on span 1")).toBeTruthy();
    expect(screen.getByText(/1 value changed by more than 10 %/)).toBeTruthy();
    expect(screen.getByText("+20.0 %").closest("tr")?.getAttribute("data-severity")).toBe("beyond");
    expect(screen.getByText("+5.0 %").closest("tr")?.getAttribute("data-severity")).toBe("within");
    expect(screen.getAllByText(/do not replace, the judgement of a licensed engineer/).length).toBeGreaterThan(0);
  });
});
