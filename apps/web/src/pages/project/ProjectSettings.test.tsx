import { afterEach, describe, expect, it, vi } from "vitest";
import { fireEvent, screen } from "@testing-library/react";
import type { Project, Role } from "@spanwright/contracts";
import { renderWithProviders, stubFetch } from "../../test/renderWithProviders";
import { ProjectSettings } from "./ProjectSettings";

afterEach(() => {
  vi.unstubAllGlobals();
});

const projectAs = (role: Role): Project => ({
  id: "c0ffee00-1d2e-4f3a-8b4c-5d6e7f8a9b0c",
  name: "Invented depot",
  unitSystem: "us",
  compareThresholdPercent: 5,
  role,
  createdAt: "2026-11-02T09:00:00.000Z",
  updatedAt: "2026-11-02T09:00:00.000Z",
});

describe("ProjectSettings", () => {
  it("shows settings read-only to a role that cannot manage the project", () => {
    renderWithProviders(<ProjectSettings project={projectAs("engineer")} />);
    expect(screen.getByText("US customary (ft, kip, kip·ft)")).toBeTruthy();
    expect(screen.queryByRole("textbox")).toBeNull();
    expect(screen.queryByRole("button", { name: "Save settings" })).toBeNull();
  });

  it("rejects a compare threshold over 100 % beside the field, before calling the server", () => {
    const fetchSpy = vi.fn(stubFetch({}));
    vi.stubGlobal("fetch", fetchSpy);
    renderWithProviders(<ProjectSettings project={projectAs("owner")} />);
    fireEvent.change(screen.getByLabelText("Compare threshold (%)"), { target: { value: "250" } });
    fireEvent.click(screen.getByRole("button", { name: "Save settings" }));
    expect(screen.getByText("Use 100 or less.")).toBeTruthy();
    expect(fetchSpy).not.toHaveBeenCalled();
  });

  it("sends only the settings form's fields, as numbers, to the API", async () => {
    const fetchSpy = vi.fn(
      stubFetch({
        "PATCH /api/projects/c0ffee00-1d2e-4f3a-8b4c-5d6e7f8a9b0c": { status: 200, body: { project: { ...projectAs("owner"), compareThresholdPercent: 7.5 } } },
      }),
    );
    vi.stubGlobal("fetch", fetchSpy);
    renderWithProviders(<ProjectSettings project={projectAs("owner")} />);
    fireEvent.change(screen.getByLabelText("Compare threshold (%)"), { target: { value: "7.5" } });
    fireEvent.click(screen.getByRole("button", { name: "Save settings" }));
    expect(await screen.findByText("Settings saved.")).toBeTruthy();
    const body = JSON.parse(String(fetchSpy.mock.calls[0]?.[1]?.body)) as unknown;
    expect(body).toEqual({ name: "Invented depot", unitSystem: "us", compareThresholdPercent: 7.5 });
  });
});
