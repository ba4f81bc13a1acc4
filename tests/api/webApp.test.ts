import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "@spanwright/api/testing";

// scripts/test.sh builds the web app before the tests run, so the build must be there.
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ env: { SERVE_WEB: "true" } });
});
afterAll(() => t.close());

describe("the built web app, served by the API on one port", () => {
  it("has been built", () => {
    expect(fs.existsSync(path.join(t.config.webDistDir, "index.html")), `${t.config.webDistDir}/index.html`).toBe(true);
  });

  it("serves index.html at / and for client-side routes", async () => {
    for (const url of ["/", "/projects/some-id/beams/other-id"]) {
      const res = await t.client().get(url);
      expect(res.status).toBe(200);
      expect(res.headers["content-type"]).toMatch(/text\/html/);
      expect(res.text).toMatch(/<div id="root">/);
    }
  });

  it("serves the built scripts", async () => {
    const html = (await t.client().get("/")).text;
    const script = /<script[^>]+src="([^"]+\.js)"/.exec(html)?.[1];
    expect(script).toBeDefined();
    const res = await t.client().get(script!);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toMatch(/javascript/);
  });

  it("keeps /api paths out of the fallback", async () => {
    const res = await t.client().get("/api/not-a-route");
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe("not-found");
  });

  it("serves hashed assets gzip-compressed and cached for a year, index.html revalidated every time", async () => {
    const html = await t.client().get("/").set("Accept-Encoding", "gzip");
    expect(html.headers["cache-control"]).toBe("no-cache");
    const script = /<script[^>]+src="(\/assets\/[^"]+\.js)"/.exec(html.text)?.[1];
    expect(script).toBeDefined();
    const res = await t.client().get(script!).set("Accept-Encoding", "gzip");
    expect(res.status).toBe(200);
    expect(res.headers["content-encoding"]).toBe("gzip");
    expect(res.headers["cache-control"]).toBe("public, max-age=31536000, immutable");
    const fallback = await t.client().get("/projects/x/beams/y");
    expect(fallback.headers["cache-control"]).toBe("no-cache");
  });
});
