import { describe, expect, it } from "vitest";
import { loadConfig } from "./config.js";

describe("loadConfig", () => {
  it("has defaults for a local run on 127.0.0.1:3000", () => {
    const config = loadConfig({});
    expect(config).toMatchObject({ host: "127.0.0.1", port: 3000, sessionCookieName: "spanwright_session", serveWeb: false });
    expect(config.databaseUrl).toMatch(/^postgres:\/\/spanwright@127\.0\.0\.1:\d+\/spanwright$/);
  });

  it("serves the web app in production", () => {
    expect(loadConfig({ NODE_ENV: "production" }).serveWeb).toBe(true);
  });

  it("names every bad variable", () => {
    expect(() => loadConfig({ PORT: "eighty", DATABASE_URL: "nope" })).toThrow(/PORT[\s\S]*DATABASE_URL|DATABASE_URL[\s\S]*PORT/);
  });

  it("splits extra allowed origins", () => {
    expect(loadConfig({ ALLOWED_ORIGINS: "http://a.test, http://b.test" }).allowedOrigins).toEqual(["http://a.test", "http://b.test"]);
  });
});
