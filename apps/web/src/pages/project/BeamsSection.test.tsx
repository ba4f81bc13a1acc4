import { afterEach, describe, expect, it, vi } from "vitest";
import { screen } from "@testing-library/react";
import type { Project, Role } from "@spanwright/contracts";
import { renderWithProviders, stubFetch } from "../../test/renderWithProviders";
import { BeamsSection } from "./BeamsSection";

afterEach(() => {
  vi.unstubAllGlobals();
});

const projectAs = (role: Role): Project => ({
  id: "p1",
  name: "Invented depot",
  unitSystem: "si",
  compareThresholdPercent: 5,
  role,
  createdAt: "2026-11-02T09:00:00.000Z",
  updatedAt: "2026-11-02T09:00:00.000Z",
});

const beams = [
  {
    id: "0f5e6c1a-8b2d-4c3e-9f4a-5b6c7d8e9f01",
    projectId: "p1",
    name: "Level 2, grid C",
    latestVersion: 3,
    createdAt: "2026-11-02T09:00:00.000Z",
    updatedAt: "2026-11-03T09:00:00.000Z",
  },
];

describe("BeamsSection", () => {
  it.each([
    ["owner", true],
    ["engineer", true],
    ["checker", false],
    ["viewer", false],
  ] as const)("for a %s, offers add and delete: %s", async (role, editable) => {
    vi.stubGlobal("fetch", stubFetch({ "GET /api/projects/p1/beams": { status: 200, body: { beams } } }));
    renderWithProviders(<BeamsSection project={projectAs(role)} />);

    const link = await screen.findByRole("link", { name: "Level 2, grid C" });
    expect(link.getAttribute("href")).toBe(`/projects/p1/beams/${beams[0]?.id}`);
    expect(screen.queryByRole("button", { name: "Delete" }) !== null).toBe(editable);
    expect(screen.queryByRole("button", { name: "Add beam" }) !== null).toBe(editable);
  });

  it("shows the load error with a way to retry when the server is down", async () => {
    vi.stubGlobal(
      "fetch",
      stubFetch({
        "GET /api/projects/p1/beams": {
          status: 503,
          body: { error: { code: "database-unavailable", message: "The database is not answering." } },
        },
      }),
    );
    renderWithProviders(<BeamsSection project={projectAs("viewer")} />);
    // Server errors are retried twice by the query client before the error state shows.
    const alert = await screen.findByRole("alert");
    expect(alert.textContent).toContain("The database is not answering.");
    expect(screen.getByRole("button", { name: "Try again" })).toBeTruthy();
  });
});
