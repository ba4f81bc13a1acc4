import { describe, expect, it } from "vitest";
import { loadConfig } from "../config.js";
import { createMailer } from "./mailer.js";

describe("mail configuration", () => {
  it("uses the local catcher outside production, on any free port", () => {
    expect(loadConfig({ NODE_ENV: "development" }).mail).toEqual({ mode: "catcher", port: 0, from: "Spanwright <handoffs@spanwright.test>" });
    expect(loadConfig({ NODE_ENV: "test" }).outboxEnabled).toBe(true);
  });

  it("reads SMTP settings from the environment in production, with no outbox", () => {
    const config = loadConfig({
      NODE_ENV: "production",
      SMTP_HOST: "smtp.example.test",
      SMTP_PORT: "465",
      SMTP_SECURE: "true",
      SMTP_USER: "spanwright",
      SMTP_PASS: "secret",
      SMTP_FROM: "Hand-offs <handoffs@firm.example>",
    });
    expect(config.mail).toEqual({
      mode: "smtp",
      host: "smtp.example.test",
      port: 465,
      secure: true,
      user: "spanwright",
      pass: "secret",
      from: "Hand-offs <handoffs@firm.example>",
    });
    expect(config.outboxEnabled).toBe(false);
  });

  it("lets the local demo run the catcher in production mode when asked", () => {
    const config = loadConfig({ NODE_ENV: "production", SMTP_MODE: "catcher", OUTBOX_ENABLED: "true" });
    expect([config.mail.mode, config.outboxEnabled]).toEqual(["catcher", true]);
  });

  it("refuses a port out of range", () => {
    expect(() => loadConfig({ SMTP_PORT: "70000" })).toThrow(/SMTP_PORT/);
  });
});

describe("createMailer", () => {
  it("starts the catcher on 127.0.0.1 on first use and stops it on close", async () => {
    const mailer = createMailer({ mode: "catcher", port: 0, from: "a@b.test" });
    const transport = await mailer.transport();
    expect(transport).toMatchObject({ host: "127.0.0.1", secure: false });
    expect(await mailer.caught()).toEqual([]);
    await mailer.close();
    await mailer.close();
  });

  it("fails a send with mail-failed when production has no SMTP host", async () => {
    const mailer = createMailer({ mode: "smtp", host: null, port: 587, secure: false, user: null, pass: null, from: "a@b.test" });
    await expect(mailer.transport()).rejects.toMatchObject({ code: "mail-failed" });
    expect(await mailer.caught()).toBeNull();
  });
});
