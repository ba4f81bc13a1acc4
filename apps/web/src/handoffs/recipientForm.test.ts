import { describe, expect, it } from "vitest";
import type { Member } from "@spanwright/contracts";
import { draftFromRecipients, splitEmails, validateRecipients } from "./recipientForm";

const member = (userId: string, email: string, role: Member["role"]): Member => ({
  userId,
  email,
  name: email.split("@")[0]!,
  role,
  pending: false,
  addedAt: "2026-11-02T09:00:00.000Z",
});

const VIEWER = "6f1c2d3e-4a5b-4c6d-8e7f-8091a2b3c4d5";
const ENGINEER = "7a2b3c4d-5e6f-4a7b-9c8d-9e0f1a2b3c4d";
// Invented people and firms.
const members = [
  member(VIEWER, "ines@groundworks-demo.example", "viewer"),
  member(ENGINEER, "tomas@spanwright-demo.example", "engineer"),
];

describe("hand-off recipient form", () => {
  it("splits pasted address lists on commas, semicolons, spaces and lines", () => {
    expect(splitEmails(" a@x.example, b@x.example;c@x.example\nd@x.example  ")).toEqual([
      "a@x.example",
      "b@x.example",
      "c@x.example",
      "d@x.example",
    ]);
  });

  it("asks for at least one recipient", () => {
    const result = validateRecipients({ memberIds: [], emails: "  ", message: "" }, members);
    expect(result).toEqual({ ok: false, errors: { recipients: "Choose at least one viewer or type an e-mail address." } });
  });

  it("names every address that is not one", () => {
    const result = validateRecipients({ memberIds: [], emails: "ok@firm.example, nope@, plain", message: "" }, members);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.emails).toBe("Not e-mail addresses: nope@, plain");
  });

  it("sends ticked viewers by id and typed addresses by e-mail, lower-cased and once each", () => {
    const result = validateRecipients(
      { memberIds: [VIEWER], emails: "Pile.Rig@Firm.example pile.rig@firm.example INES@groundworks-demo.example", message: "  Revised loads at S2  " },
      members,
    );
    expect(result).toEqual({
      ok: true,
      request: {
        recipients: [{ userId: VIEWER }, { email: "pile.rig@firm.example" }],
        message: "Revised loads at S2",
      },
    });
  });

  it("ignores a ticked member who is not a viewer", () => {
    const result = validateRecipients({ memberIds: [ENGINEER], emails: "", message: "" }, members);
    expect(result.ok).toBe(false);
  });

  it("refuses more than 20 recipients and an over-long message", () => {
    const emails = Array.from({ length: 21 }, (_, i) => `r${i}@firm.example`).join(",");
    const result = validateRecipients({ memberIds: [], emails, message: "x".repeat(2001) }, members);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors.recipients).toMatch(/At most 20 recipients/);
      expect(result.errors.message).toMatch(/limit is 2000/);
    }
  });

  it("pre-fills a re-issue with the earlier recipients", () => {
    const draft = draftFromRecipients(
      [
        { email: "ines@groundworks-demo.example", userId: VIEWER, name: "Ines" },
        { email: "pile.rig@firm.example", userId: null, name: null },
      ],
      members,
    );
    expect(draft).toEqual({ memberIds: [VIEWER], emails: "pile.rig@firm.example", message: "" });
  });
});
