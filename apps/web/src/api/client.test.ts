import { afterEach, describe, expect, it, vi } from "vitest";
import { ApiError, extractFieldErrors, parseErrorBody, request, requestEarly } from "./client";

function jsonResponse(status: number, body: unknown): Response {
  return new Response(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: { "Content-Type": "application/json" },
  });
}

describe("parseErrorBody", () => {
  it("keeps code, message, status and details of the API's error body", () => {
    const error = parseErrorBody(409, {
      error: { code: "last-owner", message: "The last owner cannot be removed", details: { userId: "u1" } },
    });
    expect(error).toBeInstanceOf(ApiError);
    expect(error.code).toBe("last-owner");
    expect(error.status).toBe(409);
    expect(error.message).toBe("The last owner cannot be removed");
    expect(error.details).toEqual({ userId: "u1" });
  });

  it("turns validation issues into field errors keyed by dotted path", () => {
    const error = parseErrorBody(400, {
      error: {
        code: "invalid-request",
        message: "Invalid body",
        details: {
          issues: [
            { path: "email", message: "Invalid email address" },
            { path: "email", message: "a second message is not shown" },
            { path: "model.segments.2.I", message: "must be positive" },
          ],
        },
      },
    });
    expect(error.fieldErrors).toEqual({ email: "Invalid email address", "model.segments.2.I": "must be positive" });
  });

  it.each([
    ["a non-JSON body", "<html>Bad gateway</html>"],
    ["an empty body", null],
    ["an error without a code", { error: { message: "no code" } }],
  ])("gives an http-error for %s", (_label, body) => {
    const error = parseErrorBody(502, body, "Bad Gateway");
    expect(error.code).toBe("http-error");
    expect(error.status).toBe(502);
    expect(error.message).toContain("502");
  });
});

describe("extractFieldErrors", () => {
  it.each([
    ["zod issue list with array paths", [{ path: ["members", 0, "email"], message: "bad" }], { "members.0.email": "bad" }],
    ["flattened fieldErrors", { fieldErrors: { name: ["Too short", "Other"] } }, { name: "Too short" }],
    ["a fields record", { fields: { role: "Unknown role" } }, { role: "Unknown role" }],
    ["an unknown shape", { current: { version: 3 } }, {}],
    ["nothing", null, {}],
  ])("reads %s", (_label, details, expected) => {
    expect(extractFieldErrors(details)).toEqual(expected);
  });
});

describe("request", () => {
  it("sends JSON with same-origin credentials and returns the parsed body", async () => {
    const fetchImpl = vi.fn<typeof fetch>(async () => jsonResponse(201, { project: { id: "p1" } }));
    const body = await request("/api/projects", { method: "POST", body: { name: "Depot" } }, fetchImpl);
    expect(body).toEqual({ project: { id: "p1" } });
    const [path, init] = fetchImpl.mock.calls[0] ?? [];
    expect(path).toBe("/api/projects");
    expect(init?.method).toBe("POST");
    expect(init?.credentials).toBe("same-origin");
    expect(init?.body).toBe(JSON.stringify({ name: "Depot" }));
    expect((init?.headers as Record<string, string>)["Content-Type"]).toBe("application/json");
  });

  it("resolves null for a 204 with no body", async () => {
    const fetchImpl = vi.fn<typeof fetch>(async () => new Response(null, { status: 204 }));
    await expect(request("/api/auth/sign-out", { method: "POST" }, fetchImpl)).resolves.toBeNull();
  });

  it("rejects a failed response with the server's ApiError", async () => {
    const fetchImpl = vi.fn<typeof fetch>(async () =>
      jsonResponse(401, { error: { code: "invalid-credentials", message: "Wrong e-mail or password" } }),
    );
    await expect(request("/api/auth/sign-in", { method: "POST", body: {} }, fetchImpl)).rejects.toMatchObject({
      code: "invalid-credentials",
      status: 401,
    });
  });

  it("reports an unreachable server as a network-error with status 0", async () => {
    const fetchImpl = vi.fn<typeof fetch>(async () => {
      throw new TypeError("Failed to fetch");
    });
    await expect(request("/api/me", {}, fetchImpl)).rejects.toMatchObject({ code: "network-error", status: 0 });
  });

  it("reports a body the parser rejects as invalid-response", async () => {
    const fetchImpl = vi.fn<typeof fetch>(async () => jsonResponse(200, { unexpected: true }));
    const parse = (data: unknown): { user: string } => {
      if (typeof data === "object" && data !== null && "user" in data) return data as { user: string };
      throw new Error("no user");
    };
    await expect(request("/api/me", { parse }, fetchImpl)).rejects.toMatchObject({
      code: "invalid-response",
      details: "no user",
    });
  });
});

describe("requestEarly", () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    vi.useRealTimers();
  });

  function stubFetch(answers: Array<{ status: number; body: unknown }>): string[] {
    const urls: string[] = [];
    vi.stubGlobal("fetch", async (input: string) => {
      urls.push(input);
      const answer = answers.shift() ?? { status: 500, body: null };
      return jsonResponse(answer.status, answer.body);
    });
    return urls;
  }

  it("hands its answer to the first request of the path, parsed, and asks again after that", async () => {
    const urls = stubFetch([{ status: 200, body: { n: 1 } }, { status: 200, body: { n: 2 } }]);
    requestEarly("/api/early-1");
    expect(urls).toEqual(["/api/early-1"]);
    await expect(request("/api/early-1", { parse: (d) => (d as { n: number }).n })).resolves.toBe(1);
    expect(urls).toHaveLength(1);
    await expect(request("/api/early-1")).resolves.toEqual({ n: 2 });
    expect(urls).toHaveLength(2);
  });

  it("hands on the server's error as the ApiError request() would give", async () => {
    stubFetch([{ status: 401, body: { error: { code: "unauthenticated", message: "Sign in first." } } }]);
    requestEarly("/api/early-2");
    await expect(request("/api/early-2")).rejects.toMatchObject({ code: "unauthenticated", status: 401 });
  });

  it("is not used for other methods, nor once it is older than a few seconds", async () => {
    vi.useFakeTimers({ toFake: ["Date"] });
    const urls = stubFetch([{ status: 200, body: { n: 1 } }, { status: 201, body: { n: 2 } }, { status: 200, body: { n: 3 } }]);
    requestEarly("/api/early-3");
    await expect(request("/api/early-3", { method: "POST", body: {} })).resolves.toEqual({ n: 2 });
    vi.setSystemTime(Date.now() + 60_000);
    await expect(request("/api/early-3")).resolves.toEqual({ n: 3 });
    expect(urls).toHaveLength(3);
  });
});
