import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, twoSpanModel, type Client, type TestApp } from "@spanwright/api/testing";
import { listExpressRoutes } from "../api/routeTable.js";

/**
 * CSRF: every state-changing route the Express router serves (read from the router, so a route
 * added later is covered without editing this file) refuses a request from another site, whether
 * the attacker's page sends its own Origin, the opaque `null` origin, or none, while the victim's
 * session cookie rides along.
 */
let t: TestApp;
let victim: Client;
let params: Record<string, string>;

beforeAll(async () => {
  t = await createTestApp();
  const account = await t.signUp("CSRF victim");
  victim = account.client;
  const project = await t.services.projects.create(account.userId, { name: "Target", unitSystem: "si", compareThresholdPercent: 5 });
  const { beam } = await t.services.beams.create(account.userId, project.id, { name: "B", model: twoSpanModel(), changeSummary: "" });
  params = { projectId: project.id, beamId: beam.id, userId: account.userId, version: "1" };
});
afterAll(() => t.close());

const stateChanging = () =>
  listExpressRoutes(t.app)
    .map((line) => line.split(" ") as [string, string])
    .filter(([method]) => method !== "GET" && method !== "HEAD" && method !== "OPTIONS");

function fill(path: string): string {
  return path.replace(/:([A-Za-z]+)/g, (_, key: string) => params[key] ?? "1");
}

describe("cross-site requests", () => {
  it("the router serves state-changing routes (the list below is not empty)", () => {
    expect(stateChanging().length).toBeGreaterThanOrEqual(15);
  });

  it.each([
    ["another site's Origin", "https://evil.example"],
    ["the opaque null Origin (sandboxed iframe, data: URL)", "null"],
    ["a look-alike Origin", "http://spanwright.test.evil.example"],
    ["no Origin, with the session cookie", null],
  ])("every state-changing route refuses %s with 403 csrf", async (_label, origin) => {
    const answers: string[] = [];
    for (const [method, path] of stateChanging()) {
      const req = victim.agent[method.toLowerCase() as "post" | "patch" | "delete"](fill(path));
      if (origin) req.set("Origin", origin);
      const res = await req.send({ name: "Pwned", role: "owner", email: "attacker@example.test" });
      answers.push(`${method} ${path} -> ${res.status} ${res.body?.error?.code}`);
    }
    const expected = stateChanging().map(([method, path]) => `${method} ${path} -> 403 csrf`);
    expect(answers).toEqual(expected);
  });

  it("left the victim's project untouched", async () => {
    const res = await victim.get(`/api/projects/${params.projectId}`);
    expect(res.status).toBe(200);
    expect(res.body.project.name).toBe("Target");
    expect((await victim.get(`/api/projects/${params.projectId}/members`)).body.members).toHaveLength(1);
  });
});
