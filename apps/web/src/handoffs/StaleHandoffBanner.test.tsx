import { useState } from "react";
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

describe("StaleHandoffBanner re-issue", () => {
  it("keeps the dialog's confirmation after the re-issue clears the alert", async () => {
    const { vi } = await import("vitest");
    const { fireEvent } = await import("@testing-library/react");
    const { stubFetch } = await import("../test/renderWithProviders");
    const viewer = "6f1c2d3e-4a5b-4c6d-8e7f-8091a2b3c4d5";
    const member = { userId: viewer, email: "ines@groundworks-demo.example", name: "Ines Varga", role: "viewer", pending: false, addedAt: "2026-11-02T09:00:00.000Z" };
    const held: Handoff = { ...stale, recipients: [{ email: member.email, userId: viewer, name: "Ines Varga", outdated: true }] };
    const reissued: Handoff = { ...held, id: "h2", version: 6, messageId: "<h2@local>", stale: false, staleValueCount: 0, recipients: [{ ...held.recipients[0]!, outdated: false }] };
    vi.stubGlobal(
      "fetch",
      stubFetch({
        "GET /api/projects/p1/members": { status: 200, body: { members: [member] } },
        "POST /api/projects/p1/beams/b1/revisions/6/handoffs": { status: 201, body: { handoff: reissued } },
      }),
    );
    const after = [reissued, { ...held, recipients: [{ ...held.recipients[0]!, outdated: false }] }];
    // Stands in for the page: the hand-off list it passes changes when the query refetches.
    function Page() {
      const [list, setList] = useState<Handoff[]>([held]);
      return (
        <>
          <button type="button" onClick={() => setList(after)}>refetch</button>
          <StaleHandoffBanner handoffs={list} canIssue />
        </>
      );
    }
    renderWithProviders(<Page />);
    fireEvent.click(screen.getByRole("button", { name: "Re-issue r6" }));
    // The earlier recipient is ticked already.
    const box = (await screen.findByRole("checkbox", { name: /Ines Varga/ })) as HTMLInputElement;
    expect(box.checked).toBe(true);
    fireEvent.click(screen.getByRole("button", { name: "Send hand-off" }));
    await screen.findByText("Sent r6 to Ines Varga.");
    // The refetched list no longer has anyone outdated: the banner goes, the confirmation stays.
    fireEvent.click(screen.getByRole("button", { name: "refetch" }));
    expect(screen.queryByText("The foundation designer holds outdated reactions")).toBeNull();
    expect(screen.getByText("Sent r6 to Ines Varga.")).toBeTruthy();
    vi.unstubAllGlobals();
  });
});
