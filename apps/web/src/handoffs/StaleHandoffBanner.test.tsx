import { describe, expect, it } from "vitest";
import { screen } from "@testing-library/react";
import type { Handoff } from "@spanwright/contracts";
import { renderWithProviders } from "../test/renderWithProviders";
import { StaleHandoffBanner } from "./StaleHandoffBanner";

// Invented beam and recipient.
const stale: Handoff = {
  id: "h1", projectId: "p1", beamId: "b1", beamName: "Grid C", version: 4,
  issuedBy: { id: "u1", name: "Tomas Reyes" }, issuedAt: "2026-11-10T10:00:00Z", message: null, messageId: "<h1@local>",
  recipients: [{ email: "ines@groundworks-demo.example", userId: null, name: "Ines Varga", outdated: true }],
  latestVersion: 6, stale: true, staleValueCount: 3,
};

describe("StaleHandoffBanner", () => {
  it("says who holds outdated reactions, with the compare link one click away", () => {
    renderWithProviders(<StaleHandoffBanner handoffs={[stale]} canIssue />);
    expect(screen.getByText("The foundation designer holds outdated reactions")).toBeTruthy();
    expect(screen.getByText(/held by Ines Varga/)).toBeTruthy();
    const link = screen.getByRole("link", { name: "Compare r4 with r6" });
    expect(link.getAttribute("href")).toBe("/projects/p1/beams/b1/compare?from=4&to=6");
    expect(screen.getByRole("button", { name: "Re-issue r6" })).toBeTruthy();
  });

  it("offers no re-issue to a role that cannot issue", () => {
    renderWithProviders(<StaleHandoffBanner handoffs={[stale]} canIssue={false} />);
    expect(screen.queryByRole("button", { name: /Re-issue/ })).toBeNull();
  });

  it("shows nothing when every recipient has the latest numbers", () => {
    const current = { ...stale, recipients: [{ ...stale.recipients[0]!, outdated: false }] };
    const { container } = renderWithProviders(<StaleHandoffBanner handoffs={[current]} canIssue />);
    expect(container.textContent).toBe("");
  });
});
