import { existsSync, readFileSync } from "node:fs";
import { rename, writeFile } from "node:fs/promises";
import type { AddressInfo } from "node:net";
import { simpleParser, type AddressObject } from "mailparser";
import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from "smtp-server";

/**
 * A local fake SMTP server for development and tests: accepts every message on 127.0.0.1 without
 * TLS or authentication, parses it and keeps it in memory (and, optionally, in a JSON file so the
 * outbox survives a restart). Never for production: it relays nothing.
 */

export interface CaughtAttachment {
  filename: string | null;
  contentType: string;
  size: number;
  /** Base64 of the attachment bytes, so an outbox page can offer the download. */
  contentBase64: string;
}

export interface CaughtMessage {
  /** 1, 2, 3, … in arrival order. */
  id: number;
  receivedAt: string;
  /** SMTP envelope: who the client said it sends for and delivers to. */
  envelope: { from: string | null; to: string[] };
  messageId: string | null;
  from: string | null;
  to: string[];
  subject: string | null;
  text: string | null;
  html: string | null;
  attachments: CaughtAttachment[];
}

export interface MailCatcherOptions {
  /** 0 (default) picks a free port. */
  port?: number;
  /** Only loopback: the catcher must never listen on a public interface. */
  host?: "127.0.0.1" | "localhost" | "::1";
  /** JSON file holding the caught messages; loaded at start, rewritten on every message. */
  storeFile?: string;
  /** Largest accepted message in bytes (default 25 MB, a common provider limit). */
  maxMessageBytes?: number;
  now?: () => Date;
}

export interface MailCatcher {
  host: string;
  port: number;
  messages(): CaughtMessage[];
  clear(): Promise<void>;
  close(): Promise<void>;
}

export type MailCatcherErrorCode = "bad-store-file" | "listen-failed";

export class MailCatcherError extends Error {
  constructor(
    readonly code: MailCatcherErrorCode,
    message: string,
  ) {
    super(message);
    this.name = "MailCatcherError";
  }
}

function addresses(value: AddressObject | AddressObject[] | undefined): string[] {
  const list = value === undefined ? [] : Array.isArray(value) ? value : [value];
  return list.flatMap((a) => a.value.map((v) => v.address ?? "").filter(Boolean));
}

function loadStore(file: string): CaughtMessage[] {
  if (!existsSync(file)) return [];
  try {
    const data: unknown = JSON.parse(readFileSync(file, "utf8"));
    if (!Array.isArray(data)) throw new Error("not an array");
    return data as CaughtMessage[];
  } catch (error) {
    throw new MailCatcherError("bad-store-file", `cannot read ${file}: ${(error as Error).message}`);
  }
}

export async function startMailCatcher(options: MailCatcherOptions = {}): Promise<MailCatcher> {
  const host = options.host ?? "127.0.0.1";
  const now = options.now ?? (() => new Date());
  const store: CaughtMessage[] = options.storeFile ? loadStore(options.storeFile) : [];
  let nextId = store.reduce((max, m) => Math.max(max, m.id), 0) + 1;
  // Writes are chained so two messages arriving together never interleave in the file.
  let writing: Promise<void> = Promise.resolve();
  const persist = () => {
    const file = options.storeFile;
    if (!file) return Promise.resolve();
    const snapshot = JSON.stringify(store, null, 2);
    writing = writing.then(async () => {
      await writeFile(`${file}.tmp`, snapshot);
      await rename(`${file}.tmp`, file);
    });
    return writing;
  };

  const receive = async (stream: SMTPServerDataStream, session: SMTPServerSession): Promise<void> => {
    const parsed = await simpleParser(stream);
    if (stream.sizeExceeded) {
      throw Object.assign(new Error("message exceeds the size limit"), { responseCode: 552 });
    }
    const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : null;
    store.push({
      id: nextId++,
      receivedAt: now().toISOString(),
      envelope: { from: envelopeFrom, to: session.envelope.rcptTo.map((r) => r.address) },
      messageId: parsed.messageId ?? null,
      from: addresses(parsed.from)[0] ?? null,
      to: addresses(parsed.to),
      subject: parsed.subject ?? null,
      text: parsed.text ?? null,
      html: typeof parsed.html === "string" ? parsed.html : null,
      attachments: parsed.attachments.map((a) => ({
        filename: a.filename ?? null,
        contentType: a.contentType,
        size: a.size,
        contentBase64: a.content.toString("base64"),
      })),
    });
    await persist();
  };

  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    size: options.maxMessageBytes ?? 25 * 1024 * 1024,
    logger: false,
    banner: "Spanwright local mail catcher",
    onData(stream, session, callback) {
      // Answer the client only once the message is stored, so a resolved send means "caught".
      receive(stream, session).then(
        () => callback(),
        (error: Error) => callback(error),
      );
    },
  });

  await new Promise<void>((resolve, reject) => {
    const fail = (error: Error) => reject(new MailCatcherError("listen-failed", error.message));
    server.once("error", fail);
    server.listen(options.port ?? 0, host, () => {
      server.off("error", fail);
      resolve();
    });
  });
  // smtp-server logs socket errors through 'error'; without a listener Node would throw.
  server.on("error", () => undefined);
  const port = (server.server.address() as AddressInfo).port;

  return {
    host,
    port,
    messages: () => structuredClone(store),
    clear: async () => {
      store.length = 0;
      await persist();
    },
    close: async () => {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await writing;
    },
  };
}
