import { afterEach, describe, expect, it, vi } from "vitest";
import { fireEvent, screen } from "@testing-library/react";
import type { Member } from "@spanwright/contracts";
import { renderWithProviders, stubFetch } from "../../test/renderWithProviders";
import { MembersTable } from "./MembersTable";

afterEach(() => {
  vi.unstubAllGlobals();
});

// Invented people for the test.
const lead: Member = {
  userId: "7d1f3a2b-1c4e-4f5a-9b6c-2d3e4f5a6b7c",
  email: "mara.lindqvist@example.test",
  name: "Mara Lindqvist",
  role: "owner",
  pending: false,
  addedAt: "2026-11-02T09:00:00.000Z",
};
const viewer: Member = {
  userId: "3a9e8d7c-6b5a-4f3e-8d2c-1b0a9f8e7d6c",
  email: "footings@example.test",
  name: "Tomas Adebayo",
  role: "viewer",
  pending: false,
  addedAt: "2026-11-05T09:00:00.000Z",
};

describe("MembersTable", () => {
  it("explains the last-owner refusal when the only project lead is demoted", async () => {
    vi.stubGlobal(
      "fetch",
      stubFetch({
        [`PATCH /api/projects/p1/members/${lead.userId}`]: {
          status: 409,
          body: { error: { code: "last-owner", message: "The last owner cannot be removed or demoted" } },
        },
      }),
    );
    renderWithProviders(
      <MembersTable projectId="p1" members={[lead, viewer]} currentUserId={lead.userId} canManage />,
    );
    fireEvent.change(screen.getByLabelText("Role of Mara Lindqvist"), { target: { value: "engineer" } });

    const alert = await screen.findByRole("alert");
    expect(alert.textContent).toContain("A project needs at least one project lead");
  });

  it("shows roles as text and offers no actions to someone who cannot manage", () => {
    renderWithProviders(
      <MembersTable projectId="p1" members={[lead, viewer]} currentUserId={viewer.userId} canManage={false} />,
    );
    expect(screen.getByText("Project lead")).toBeTruthy();
    expect(screen.queryByRole("combobox")).toBeNull();
    expect(screen.queryByRole("button", { name: /remove|leave/i })).toBeNull();
  });
});
