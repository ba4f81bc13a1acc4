import { afterEach, describe, expect, it, vi } from "vitest";
import { fireEvent, screen } from "@testing-library/react";
import type { Member } from "@spanwright/contracts";
import { renderWithProviders, stubFetch } from "../test/renderWithProviders";
import { HandoffDialog } from "./HandoffDialog";

afterEach(() => {
  vi.unstubAllGlobals();
});

const VIEWER = "6f1c2d3e-4a5b-4c6d-8e7f-8091a2b3c4d5";
// Invented people.
const members: Member[] = [
  { userId: VIEWER, email: "ines@groundworks-demo.example", name: "Ines Varga", role: "viewer", pending: false, addedAt: "2026-11-02T09:00:00.000Z" },
];

describe("HandoffDialog", () => {
  it("shows the recipient errors and sends nothing while they stand", async () => {
    const fetchStub = vi.fn(stubFetch({ "GET /api/projects/p1/members": { status: 200, body: { members } } }));
    vi.stubGlobal("fetch", fetchStub);
    renderWithProviders(<HandoffDialog projectId="p1" beamId="b1" beamName="Grid C" version={4} onClose={() => {}} />);

    await screen.findByRole("checkbox", { name: /Ines Varga/ });
    fireEvent.change(screen.getByLabelText("Other e-mail addresses"), { target: { value: "pile.rig@, ok@firm.example" } });
    fireEvent.click(screen.getByRole("button", { name: "Send hand-off" }));

    expect(await screen.findByText("Not an e-mail address: pile.rig@")).toBeTruthy();
    expect(screen.getByLabelText("Other e-mail addresses").getAttribute("aria-invalid")).toBe("true");
    expect(fetchStub).toHaveBeenCalledTimes(1);
  });

  it("asks for a recipient when none is chosen", async () => {
    vi.stubGlobal("fetch", stubFetch({ "GET /api/projects/p1/members": { status: 200, body: { members } } }));
    renderWithProviders(<HandoffDialog projectId="p1" beamId="b1" beamName="Grid C" version={4} onClose={() => {}} />);
    fireEvent.click(await screen.findByRole("button", { name: "Send hand-off" }));
    expect(await screen.findByText("Choose at least one viewer or type an e-mail address.")).toBeTruthy();
  });

  it("sends to the ticked viewer and shows the message id", async () => {
    const handoff = {
      id: "h1", projectId: "p1", beamId: "b1", beamName: "Grid C", version: 4,
      issuedBy: { id: "u1", name: "Tomas Reyes" }, issuedAt: "2026-12-01T10:00:00.000Z", message: null,
      messageId: "<abc@spanwright.local>", recipients: [{ email: members[0]!.email, userId: VIEWER, name: "Ines Varga" }],
      latestVersion: 4, stale: false, staleValueCount: 0,
    };
    vi.stubGlobal(
      "fetch",
      stubFetch({
        "GET /api/projects/p1/members": { status: 200, body: { members } },
        "POST /api/projects/p1/beams/b1/revisions/4/handoffs": { status: 201, body: { handoff } },
      }),
    );
    renderWithProviders(<HandoffDialog projectId="p1" beamId="b1" beamName="Grid C" version={4} onClose={() => {}} />);
    fireEvent.click(await screen.findByRole("checkbox", { name: /Ines Varga/ }));
    fireEvent.click(screen.getByRole("button", { name: "Send hand-off" }));
    expect(await screen.findByText("Sent r4 to Ines Varga.")).toBeTruthy();
    expect(screen.getByText("Message id: <abc@spanwright.local>")).toBeTruthy();
  });
});
