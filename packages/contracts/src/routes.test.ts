import { describe, expect, it } from "vitest";
import { apiRoutes, routePath } from "./routes.js";
import { can, roles } from "./roles.js";

describe("routePath", () => {
  it("fills and encodes path parameters", () => {
    expect(routePath("getRevision", { projectId: "p 1", beamId: "b", version: 3 })).toBe(
      "/api/projects/p%201/beams/b/revisions/3",
    );
  });
  it("refuses a missing parameter", () => {
    expect(() => routePath("getProject")).toThrow(/projectId/);
  });
});

describe("route table", () => {
  it("names every route under /api once", () => {
    const keys = Object.values(apiRoutes).map((r) => `${r.method} ${r.path}`);
    expect(new Set(keys).size).toBe(keys.length);
    for (const k of keys) expect(k).toMatch(/^[A-Z]+ \/api\//);
  });
});

describe("can", () => {
  it.each([
    ["owner", ["read", "edit", "manage"]],
    ["engineer", ["read", "edit"]],
    ["checker", ["read", "check"]],
    ["viewer", ["read"]],
  ] as const)("gives %s exactly %j", (role, allowed) => {
    for (const p of ["read", "edit", "check", "manage"] as const) {
      expect(can(role, p)).toBe((allowed as readonly string[]).includes(p));
    }
    expect(roles).toContain(role);
  });
});
