import { afterEach, describe, expect, it, vi } from "vitest";
import { screen, within } from "@testing-library/react";
import { renderRoutes, stubFetch } from "../test/renderWithProviders";
import { DesignPage } from "./DesignPage";

afterEach(() => {
  vi.unstubAllGlobals();
});

const projectId = "6a0f3c52-8d1e-4b7a-9c2f-1e5d7b3a9c40";
const beamId = "c4d2e8f1-7a3b-4c5d-9e6f-2a1b3c4d5e6f";
const when = "2026-11-30T09:00:00.000Z";

/** Invented beam: a 7 m simple span at an imaginary warehouse mezzanine, dead and live cases. */
const model = {
  format: "spanwright.beam/1",
  title: "Mezzanine edge beam",
  nodes: [
    { x: 0, support: { type: "pinned" } },
    { x: 7, support: { type: "pinned" } },
  ],
  segments: [{ E: 200e9, I: 2.1e-4 }],
  loadCases: [
    { id: "D", category: "dead", loads: [{ type: "distributed", x1: 0, x2: 7, qy1: -8e3, qy2: -8e3 }] },
    { id: "L", category: "live", loads: [{ type: "distributed", x1: 0, x2: 7, qy1: -12e3, qy2: -12e3 }] },
  ],
  combinations: [{ id: "C1", factors: { D: 1.2, L: 1.6 } }],
};

function answers() {
  return {
    [`GET /api/projects/${projectId}`]: {
      status: 200,
      body: { project: { id: projectId, name: "Harbour Lane depot", unitSystem: "si", compareThresholdPercent: 5, role: "owner", createdAt: when, updatedAt: when } },
    },
    [`GET /api/projects/${projectId}/beams/${beamId}`]: {
      status: 200,
      body: {
        beam: { id: beamId, projectId, name: "B-12", latestVersion: 3, createdAt: when, updatedAt: when },
        revision: {
          version: 3, author: { id: "u1", name: "Odile Marsh" }, createdAt: when, changeSummary: "", status: "draft",
          checkedBy: null, checkedAt: null, checkComment: null, model, result: { format: "spanwright.result/1", results: {}, envelopes: {} },
        },
      },
    },
  };
}

describe("DesignPage", () => {
  it("loads the beam's latest revision and shows checks, the section at x and the theory panel", async () => {
    vi.stubGlobal("fetch", stubFetch(answers()));
    renderRoutes([{ path: "/projects/:projectId/beams/:beamId/design", element: <DesignPage /> }], `/projects/${projectId}/beams/${beamId}/design`);
    expect(await screen.findByText("Design checks: B-12")).toBeTruthy();
    const checks = screen.getByRole("table", { name: "Member checks" });
    // The saved result has no stations, so the page solves again: C1 flexure and shear, L deflection.
    expect(within(checks).getAllByRole("row")).toHaveLength(1 + 3);
    // wu·L²/8 = (1.2·8 + 1.6·12)·7²/8 = 176.4 kN·m (simple span, uniform load).
    expect(within(checks).getByText("176.4 kN·m")).toBeTruthy();
    expect(screen.getByTestId("stress-top")).toBeTruthy();
    expect(screen.getByRole("table", { name: "Shear deformation per span" })).toBeTruthy();
  });
});
