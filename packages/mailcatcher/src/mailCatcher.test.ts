import { mkdtemp, readFile, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import nodemailer from "nodemailer";
import { afterEach, describe, expect, it } from "vitest";
import { MailCatcherError, startMailCatcher, type MailCatcher } from "./mailCatcher.js";

const open: MailCatcher[] = [];
afterEach(async () => {
  await Promise.all(open.splice(0).map((c) => c.close()));
});

async function start(options: Parameters<typeof startMailCatcher>[0] = {}): Promise<MailCatcher> {
  const catcher = await startMailCatcher({ port: 0, host: "127.0.0.1", ...options });
  open.push(catcher);
  return catcher;
}

function transportTo(catcher: MailCatcher) {
  return nodemailer.createTransport({ host: catcher.host, port: catcher.port, secure: false, ignoreTLS: true });
}

// Invented addresses on reserved example domains.
const message = {
  from: "engineer@example.com",
  to: ["foundations@example.org", "lead@example.com"],
  subject: "Reactions",
  text: "See attached.",
  attachments: [
    { filename: "reactions.csv", content: "a,b\n1,2\n", contentType: "text/csv" },
    { filename: "report.pdf", content: Buffer.from("%PDF-1.7 fake"), contentType: "application/pdf" },
  ],
};

describe("startMailCatcher", () => {
  it("listens on loopback on a free port", async () => {
    const catcher = await start();
    expect(catcher.host).toBe("127.0.0.1");
    expect(catcher.port).toBeGreaterThan(0);
    expect(catcher.messages()).toEqual([]);
  });

  it("stores a sent message with its addresses, text and attachments", async () => {
    const catcher = await start();
    const info = await transportTo(catcher).sendMail(message);
    const [caught] = catcher.messages();
    expect(caught).toMatchObject({
      id: 1,
      from: "engineer@example.com",
      to: ["foundations@example.org", "lead@example.com"],
      envelope: { from: "engineer@example.com", to: ["foundations@example.org", "lead@example.com"] },
      subject: "Reactions",
      messageId: info.messageId,
    });
    expect(caught?.text?.trim()).toBe("See attached.");
    expect(caught?.attachments.map((a) => [a.filename, a.contentType, a.size])).toEqual([
      ["reactions.csv", "text/csv", 8],
      ["report.pdf", "application/pdf", 13],
    ]);
    expect(Buffer.from(caught!.attachments[0]!.contentBase64, "base64").toString()).toBe("a,b\n1,2\n");
  });

  it("keeps messages in a JSON file across restarts, and clears them", async () => {
    const dir = await mkdtemp(join(tmpdir(), "mailcatcher-"));
    try {
      const storeFile = join(dir, "outbox.json");
      const first = await start({ storeFile });
      await transportTo(first).sendMail(message);
      await first.close();
      expect(JSON.parse(await readFile(storeFile, "utf8"))).toHaveLength(1);

      const second = await start({ storeFile });
      expect(second.messages().map((m) => m.subject)).toEqual(["Reactions"]);
      await transportTo(second).sendMail({ ...message, subject: "Again" });
      expect(second.messages().map((m) => m.id)).toEqual([1, 2]);
      await second.clear();
      expect(second.messages()).toEqual([]);
      await second.close();
      expect(JSON.parse(await readFile(storeFile, "utf8"))).toEqual([]);
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });

  it("refuses a message over the size limit and stores nothing", async () => {
    const catcher = await start({ maxMessageBytes: 2048 });
    const big = { ...message, attachments: [{ filename: "big.bin", content: Buffer.alloc(8192, 1) }] };
    await expect(transportTo(catcher).sendMail(big)).rejects.toThrow();
    expect(catcher.messages()).toEqual([]);
  });

  it("reports a corrupt store file as a typed error", async () => {
    const dir = await mkdtemp(join(tmpdir(), "mailcatcher-"));
    try {
      const storeFile = join(dir, "outbox.json");
      await import("node:fs/promises").then((fs) => fs.writeFile(storeFile, "{not json"));
      await expect(startMailCatcher({ storeFile })).rejects.toBeInstanceOf(MailCatcherError);
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });
});
