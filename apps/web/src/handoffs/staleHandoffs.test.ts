import { describe, expect, it } from "vitest";
import type { Handoff } from "@spanwright/contracts";
import { oldestOutdatedVersion, outdatedHandoffs, outdatedRecipients } from "./staleHandoffs";

// Invented recipients.
const ines = { email: "ines@groundworks-demo.example", userId: null, name: "Ines Varga" };
const rig = { email: "pile.rig@firm.example", userId: null, name: null };

function handoff(id: string, beamId: string, version: number, issuedAt: string, recipients: Handoff["recipients"], stale: boolean): Handoff {
  return {
    id, projectId: "p1", beamId, beamName: beamId === "b1" ? "Grid C" : "Grid D", version,
    issuedBy: { id: "u1", name: "Tomas Reyes" }, issuedAt, message: null, messageId: `<${id}@local>`,
    recipients, latestVersion: 6, stale, staleValueCount: stale ? 2 : 0,
  };
}

describe("stale hand-offs", () => {
  it("lists beams whose recipients hold outdated reactions, newest hand-off per beam", () => {
    const list = [
      handoff("h3", "b1", 5, "2026-11-20T10:00:00Z", [{ ...ines, outdated: true }], true),
      handoff("h2", "b1", 4, "2026-11-10T10:00:00Z", [{ ...rig, outdated: true }], true),
      handoff("h1", "b2", 2, "2026-11-01T10:00:00Z", [{ ...ines, outdated: false }], false),
    ];
    expect(outdatedHandoffs(list).map((h) => h.id)).toEqual(["h3"]);
    expect(outdatedRecipients(list, "b1").map((r) => r.email)).toEqual([ines.email, rig.email]);
    expect(oldestOutdatedVersion(list, "b1")).toBe(4);
  });

  it("clears the alert once the latest revision is re-issued to everyone, although the old hand-off stays stale", () => {
    const list = [
      handoff("h4", "b1", 6, "2026-11-21T10:00:00Z", [{ ...ines, outdated: false }, { ...rig, outdated: false }], false),
      handoff("h3", "b1", 5, "2026-11-20T10:00:00Z", [{ ...ines, outdated: false }], true),
      handoff("h2", "b1", 4, "2026-11-10T10:00:00Z", [{ ...rig, outdated: false }], true),
    ];
    expect(outdatedHandoffs(list)).toEqual([]);
    expect(outdatedRecipients(list, "b1")).toEqual([]);
  });

  it("keeps alerting for a recipient the re-issue missed", () => {
    const list = [
      handoff("h4", "b1", 6, "2026-11-21T10:00:00Z", [{ ...ines, outdated: false }], false),
      handoff("h2", "b1", 4, "2026-11-10T10:00:00Z", [{ ...ines, outdated: false }, { ...rig, outdated: true }], true),
    ];
    expect(outdatedRecipients(list, "b1")).toEqual([{ ...rig, outdated: true }]);
  });

  it("falls back to the hand-off's stale flag when recipients carry none", () => {
    const list = [handoff("h1", "b1", 4, "2026-11-10T10:00:00Z", [ines], true)];
    expect(outdatedRecipients(list, "b1")).toEqual([ines]);
  });
});
