import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createApp } from "../app.js";
import { connectDatabase } from "../db/client.js";
import { solverEngine } from "../solve/solverEngine.js";
import { Client, createTestApp, testConfig, type TestApp } from "../testing/index.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** An app whose database URL points at a closed port: the database is "down". */
function appWithoutDatabase() {
  const config = testConfig("postgres://spanwright@127.0.0.1:9/nowhere");
  const database = connectDatabase(config.databaseUrl, { max: 1 });
  const { app } = createApp({ config, database, engine: solverEngine });
  return { client: new Client(app), close: () => database.close() };
}

describe("health and database outages", () => {
  it("reports the database up", async () => {
    const res = await t.client().get("/api/health");
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: "ok", database: "up" });
    expect(res.headers["x-request-id"]).toBeTruthy();
    expect(res.headers["x-content-type-options"]).toBe("nosniff"); // helmet
  });

  it("reports the database down with 503", async () => {
    const down = appWithoutDatabase();
    try {
      const res = await down.client.get("/api/health");
      expect(res.status).toBe(503);
      expect(res.body).toEqual({ status: "degraded", database: "down" });
    } finally {
      await down.close();
    }
  });

  it("answers 503 database-unavailable, without internals, when a route needs the database", async () => {
    const down = appWithoutDatabase();
    try {
      const res = await down.client.post("/api/auth/sign-in", { email: "a@b.test", password: "whatever" });
      expect(res.status).toBe(503);
      expect(res.body.error.code).toBe("database-unavailable");
      expect(JSON.stringify(res.body)).not.toMatch(/ECONNREFUSED|at .*\.ts/);
    } finally {
      await down.close();
    }
  });
});
