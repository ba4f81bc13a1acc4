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

  // The editor's page names its chunks as module preloads, from Vite's manifest; other pages do not
  // (the sign-in page's JS stays split from the editor's).
  it("names the editor's chunks as module preloads on the editor's URL only", async () => {
    const manifest = JSON.parse(fs.readFileSync(path.join(t.config.webDistDir, ".vite", "manifest.json"), "utf8"));
    const editorChunk = manifest["src/editor/BeamEditorPage.tsx"].file as string;
    const preloads = (html: string) => [...html.matchAll(/<link rel="modulepreload" crossorigin href="([^"]+)">/g)].map((m) => m[1]!);
    const editor = await t.client().get("/projects/some-id/beams/other-id");
    expect(editor.headers["cache-control"]).toBe("no-cache");
    const named = preloads(editor.text);
    expect(named).toContain(`/${editorChunk}`);
    for (const href of named) expect((await t.client().get(href)).status, href).toBe(200);
    for (const url of ["/", "/sign-in", "/projects/some-id"]) {
      expect(preloads((await t.client().get(url)).text), url).not.toContain(`/${editorChunk}`);
    }
  });

  it("names the editor's first API requests as fetch preloads on the editor's URL only", async () => {
    const preloads = (html: string) => [...html.matchAll(/<link rel="preload" as="fetch" crossorigin href="([^"]+)">/g)].map((m) => m[1]!);
    const editor = await t.client().get("/projects/p-1/beams/b-2");
    expect(preloads(editor.text)).toEqual(["/api/me", "/api/projects/p-1", "/api/projects/p-1/beams/b-2"]);
    // ids that would need escaping get none (the page asks for them itself)
    expect(preloads((await t.client().get("/projects/p%22x/beams/b-2")).text)).toEqual([]);
    for (const url of ["/", "/sign-in", "/projects/p-1"]) expect(preloads((await t.client().get(url)).text), url).toEqual([]);
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
