import type { Request } from "express";
import { describe, expect, it } from "vitest";
import { checkOrigin } from "./csrf.js";

const guard = checkOrigin({ allowedOrigins: ["http://localhost:5173"], sessionCookieName: "sid" });

function run(method: string, headers: Record<string, string>, cookies: Record<string, string> = {}): unknown {
  const req = { method, cookies, get: (h: string) => headers[h.toLowerCase()] } as unknown as Request;
  let passed: unknown = "not called";
  guard(req, {} as never, (err?: unknown) => {
    passed = err ?? null;
  });
  return passed;
}

const refused = expect.objectContaining({ code: "csrf" });

describe("checkOrigin", () => {
  it.each([
    ["GET from anywhere", "GET", { origin: "https://evil.example", host: "app.test" }, {}, null],
    ["POST from the same origin", "POST", { origin: "https://app.test", host: "app.test" }, { sid: "x" }, null],
    ["POST from an allowed dev origin", "POST", { origin: "http://localhost:5173", host: "127.0.0.1:3000" }, { sid: "x" }, null],
    ["POST from another site", "POST", { origin: "https://evil.example", host: "app.test" }, { sid: "x" }, refused],
    ["DELETE from another port", "DELETE", { origin: "http://app.test:8080", host: "app.test" }, {}, refused],
    ["PATCH with a garbage Origin", "PATCH", { origin: "null", host: "app.test" }, {}, refused],
    ["POST without Origin but with the session cookie", "POST", { host: "app.test" }, { sid: "x" }, refused],
    ["POST without Origin or cookie (a script)", "POST", { host: "app.test" }, {}, null],
  ])("%s", (_title, method, headers, cookies, expected) => {
    expect(run(method, headers, cookies)).toEqual(expected);
  });
});
