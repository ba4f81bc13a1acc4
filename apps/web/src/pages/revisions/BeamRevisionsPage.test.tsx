import { afterEach, describe, expect, it, vi } from "vitest";
import { screen, within } from "@testing-library/react";
import type { Project, RevisionSummary, Role } from "@spanwright/contracts";
import { sampleReactionTable } from "../../revisions/testTables";
import { unitsFor } from "../../revisions/reactionUnits";
import { renderRoutes, stubFetch } from "../../test/renderWithProviders";
import { BeamRevisionsPage } from "./BeamRevisionsPage";

afterEach(() => {
  vi.unstubAllGlobals();
});

const B = "0f5e6c1a-8b2d-4c3e-9f4a-5b6c7d8e9f01";
const P = "1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d";
const base = `/api/projects/${P}/beams/${B}`;

// Invented project, beam and people.
const project = (role: Role): Project => ({
  id: P, name: "Invented depot", unitSystem: "si", compareThresholdPercent: 5, role,
  createdAt: "2026-11-02T09:00:00.000Z", updatedAt: "2026-11-02T09:00:00.000Z",
});
const revision = (version: number, status: RevisionSummary["status"]): RevisionSummary => ({
  version, author: { id: "u1", name: "Tomas Reyes" }, createdAt: "2026-11-0" + version + "T09:00:00.000Z",
  changeSummary: version === 1 ? "First revision" : "L: +2 kN/m on span 2", status,
  checkedBy: status === "draft" ? null : { id: "u2", name: "Ada Okafor" }, checkedAt: null, checkComment: null,
});
const beam = { id: B, projectId: P, name: "Level 2, grid C", latestVersion: 2, createdAt: "2026-11-01T09:00:00.000Z", updatedAt: "2026-11-02T09:00:00.000Z" };

function answers(role: Role) {
  return stubFetch({
    [`GET /api/projects/${P}`]: { status: 200, body: { project: project(role) } },
    [`GET ${base}`]: { status: 200, body: { beam, revision: { ...revision(2, "draft"), model: {}, result: {} } } },
    [`GET ${base}/revisions`]: { status: 200, body: { revisions: [revision(1, "checked"), revision(2, "draft")] } },
    [`GET ${base}/handoffs`]: { status: 200, body: { handoffs: [] } },
    [`GET ${base}/revisions/2/reactions`]: {
      status: 200,
      body: { version: 2, units: unitsFor("si"), table: sampleReactionTable(), upliftSupports: ["S3"] },
    },
  });
}

function renderAs(role: Role) {
  vi.stubGlobal("fetch", answers(role));
  return renderRoutes([{ path: "/projects/:projectId/beams/:beamId/revisions", element: <BeamRevisionsPage /> }], `/projects/${P}/beams/${B}/revisions`);
}

describe("BeamRevisionsPage", () => {
  it("lists revisions newest first with status, summary, downloads and compare", async () => {
    renderAs("engineer");
    const r2 = await screen.findByRole("link", { name: "Open r2 read-only" });
    const row = r2.closest("tr")!;
    expect(within(row).getByText("Draft")).toBeTruthy();
    expect(within(row).getByText("L: +2 kN/m on span 2")).toBeTruthy();
    expect(within(row).getByRole("link", { name: "CSV" }).getAttribute("href")).toBe(`${base}/revisions/2/reactions.csv?units=project`);
    expect(within(row).getByRole("link", { name: "CSV (SI)" }).getAttribute("href")).toBe(`${base}/revisions/2/reactions.csv?units=si`);
    expect(within(row).getByRole("link", { name: "PDF report" }).getAttribute("href")).toBe(`${base}/revisions/2/report.pdf`);
    expect(within(row).getByRole("link", { name: "Compare with r1" }).getAttribute("href")).toBe(`/projects/${P}/beams/${B}/compare?from=1&to=2`);
    expect(await screen.findByText(/S3 pulls the beam down/)).toBeTruthy();
  });

  it.each([
    ["engineer", { issue: true, check: false, upload: true }],
    ["checker", { issue: false, check: true, upload: false }],
    ["viewer", { issue: false, check: false, upload: false }],
  ] as const)("as %s offers %o", async (role, offers) => {
    renderAs(role);
    await screen.findByRole("link", { name: "Open r2 read-only" });
    expect(screen.queryAllByRole("button", { name: "Issue…" }).length > 0).toBe(offers.issue);
    // Only the draft r2 can be marked checked.
    expect(screen.queryAllByRole("button", { name: "Mark checked" }).length).toBe(offers.check ? 1 : 0);
    expect(screen.queryByLabelText("Load schedule (CSV)") !== null).toBe(offers.upload);
  });
});
