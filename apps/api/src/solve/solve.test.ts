import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, mechanismModel, twoSpanModel, type TestApp } from "../testing/index.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("POST /api/solve", () => {
  it("needs a session", async () => {
    expect((await t.client().post("/api/solve", twoSpanModel())).status).toBe(401);
  });

  it("answers 200 with the exchange-format result", async () => {
    const { client } = await t.signUp("Solver user");
    const res = await client.post("/api/solve", twoSpanModel());
    expect(res.status).toBe(200);
    expect(res.body.format).toBe("spanwright.result/1");
  });

  it("answers 422 with the solver's error object for a mechanism", async () => {
    const { client } = await t.signUp("Solver user");
    const res = await client.post("/api/solve", mechanismModel());
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("mechanism");
    expect(typeof res.body.error.where).toBe("string");
  });

  it("answers a body over 1 MB with 413 too-large", async () => {
    const { client } = await t.signUp("Solver user");
    const res = await client.post("/api/solve", { ...twoSpanModel(), title: "x".repeat(1_100_000) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe("too-large");
  });

  it("answers 422 too-large for more load cases than the API accepts", async () => {
    const { client } = await t.signUp("Solver user");
    const loadCases = Array.from({ length: 51 }, (_, i) => ({ id: `C${i}`, category: "other", loads: [] }));
    const res = await client.post("/api/solve", { ...twoSpanModel(), loadCases });
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code: "too-large", details: { where: "loadCases", limit: 50 } });
  });

  it("answers an unexpected engine failure with a bare 500, no stack or message", async () => {
    const broken = await createTestApp({
      engine: {
        solve: () => {
          throw new TypeError("secret internals at engine.ts:42");
        },
      },
    });
    try {
      const { client } = await broken.signUp("Unlucky");
      const res = await client.post("/api/solve", twoSpanModel());
      expect(res.status).toBe(500);
      expect(res.body).toEqual({ error: { code: "internal", message: "something went wrong on the server" } });
    } finally {
      await broken.close();
    }
  });
});
