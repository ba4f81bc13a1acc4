import { startMailCatcher, type MailCatcher } from "@spanwright/mailcatcher";
import { solve } from "@spanwright/solver";
import { afterEach, describe, expect, it } from "vitest";
import { exportFileName, reactionTableCsv } from "./csv.js";
import { HandoffMailError, handoffSubject, sendHandoffMail, type HandoffMail } from "./mail.js";
import { CAUTION, renderCalculationReport } from "./pdfReport.js";
import { buildReactionTable } from "./reactionTable.js";
import { twoSpanModel } from "./testing/twoSpanBeam.js";

let catcher: MailCatcher | undefined;
afterEach(async () => {
  await catcher?.close();
  catcher = undefined;
});

// Invented project, people and addresses (reserved example domains).
async function handoff(): Promise<HandoffMail> {
  const model = twoSpanModel();
  const result = solve(model);
  const pdf = await renderCalculationReport({
    project: "Harbour Lane Depot", beam: "B2 grid C", revision: 3, author: "Ines Okafor", checker: "Tomas Lind",
    date: new Date("2026-11-30T10:00:00Z"), units: "si", model, result,
  });
  return {
    from: "spanwright@example.com",
    to: ["foundations@example.org", "site-lead@example.net"],
    project: "Harbour Lane Depot",
    beam: "B2 grid C",
    revision: 3,
    revisionUrl: "http://127.0.0.1:5173/projects/p1/beams/b2/revisions/3",
    issuedBy: "Ines Okafor",
    csv: { filename: exportFileName("B2 grid C", 3, "reactions.csv"), content: reactionTableCsv(buildReactionTable(model, result), { units: "si" }) },
    pdf: { filename: exportFileName("B2 grid C", 3, "report.pdf"), content: pdf },
  };
}

describe("sendHandoffMail", () => {
  it("delivers the hand-off with the CSV and the PDF attached", async () => {
    catcher = await startMailCatcher({ port: 0, host: "127.0.0.1" });
    const mail = await handoff();
    const sent = await sendHandoffMail({ host: catcher.host, port: catcher.port, secure: false, ignoreTLS: true }, mail);
    expect(sent.accepted).toEqual(mail.to);
    expect(sent.rejected).toEqual([]);

    const [message] = catcher.messages();
    expect(message?.messageId).toBe(sent.messageId);
    expect(message?.subject).toBe("Support reactions: Harbour Lane Depot, B2 grid C, revision 3");
    expect(message?.to).toEqual(mail.to);
    expect(message?.text).toContain(mail.revisionUrl);
    expect(message?.text).toContain(CAUTION);
    expect(message?.attachments.map((a) => [a.filename, a.contentType])).toEqual([
      ["b2-grid-c-rev-3-reactions.csv", "text/csv"],
      ["b2-grid-c-rev-3-report.pdf", "application/pdf"],
    ]);
    const [csv, pdf] = message!.attachments;
    expect(Buffer.from(csv!.contentBase64, "base64").toString("utf8")).toBe(mail.csv.content);
    expect(pdf!.size).toBe((mail.pdf.content as Buffer).length);
    expect(Buffer.from(pdf!.contentBase64, "base64").equals(mail.pdf.content as Buffer)).toBe(true);
  }, 30_000);

  it("refuses a hand-off without recipients", async () => {
    const mail = await handoff();
    await expect(sendHandoffMail({ host: "127.0.0.1", port: 1 }, { ...mail, to: [] })).rejects.toMatchObject({ code: "no-recipients" });
  }, 30_000);

  it("reports an unreachable SMTP server as a typed error", async () => {
    const closed = await startMailCatcher({ port: 0 });
    const port = closed.port;
    await closed.close();
    const mail = await handoff();
    const sending = sendHandoffMail({ host: "127.0.0.1", port, secure: false, ignoreTLS: true, connectionTimeout: 2000 }, mail);
    await expect(sending).rejects.toBeInstanceOf(HandoffMailError);
    await expect(sending).rejects.toMatchObject({ code: "send-failed" });
  }, 30_000);

  it("names project, beam and revision in the subject", () => {
    expect(handoffSubject({ project: "P", beam: "B", revision: "7" })).toBe("Support reactions: P, B, revision 7");
  });
});
