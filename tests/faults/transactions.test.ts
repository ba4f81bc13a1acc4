import postgres from "postgres";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, twoSpanModel, type Client, type TestApp } from "@spanwright/api/testing";

/**
 * Writes that span several tables are all-or-nothing. A trigger makes the last write of each
 * operation (its audit event) fail; nothing the operation wrote before it may remain.
 */
let t: TestApp;
let sql: postgres.Sql;
let owner: Client;
let projectId: string;
let beamId: string;

beforeAll(async () => {
  t = await createTestApp();
  sql = postgres(t.testDatabase.url, { max: 1, onnotice: () => {} });
  const account = await t.signUp("Atomic");
  owner = account.client;
  projectId = (await owner.post("/api/projects", { name: "Atomic" })).body.project.id;
  beamId = (await owner.post(`/api/projects/${projectId}/beams`, { name: "Kept", model: twoSpanModel() })).body.beam.id;
  await sql.unsafe(`
    CREATE FUNCTION fail_audit() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN RAISE EXCEPTION 'audit store unavailable (test fault)'; END $$;
    CREATE TRIGGER fail_audit BEFORE INSERT ON audit_events FOR EACH ROW EXECUTE FUNCTION fail_audit();`);
});
afterAll(async () => {
  await sql?.end();
  await t?.close();
});

const count = async (query: string, ...params: string[]) => (await sql.unsafe<{ n: number }[]>(query, params))[0]!.n;

describe("a failure at the last write of an operation", () => {
  it("saving a revision leaves no revision, no result and the version unchanged", async () => {
    const res = await owner.post(`/api/projects/${projectId}/beams/${beamId}/revisions`, { baseVersion: 1, model: twoSpanModel(-5000) });
    expect(res.status).toBe(500);
    expect(await count("SELECT latest_version AS n FROM beams WHERE id = $1", beamId)).toBe(1);
    expect(await count("SELECT count(*)::int AS n FROM beam_revisions WHERE beam_id = $1", beamId)).toBe(1);
    expect(await count("SELECT count(*)::int AS n FROM revision_results r JOIN beam_revisions b ON b.id = r.revision_id WHERE b.beam_id = $1", beamId)).toBe(1);
  });

  it("creating a beam leaves no beam and no revision", async () => {
    const res = await owner.post(`/api/projects/${projectId}/beams`, { name: "Never", model: twoSpanModel() });
    expect(res.status).toBe(500);
    expect(await count("SELECT count(*)::int AS n FROM beams WHERE name = 'Never'")).toBe(0);
    expect(await count("SELECT count(*)::int AS n FROM beam_revisions r LEFT JOIN beams b ON b.id = r.beam_id WHERE b.id IS NULL")).toBe(0);
  });

  it("creating a project leaves no project and no membership", async () => {
    const res = await owner.post("/api/projects", { name: "Phantom" });
    expect(res.status).toBe(500);
    expect(await count("SELECT count(*)::int AS n FROM projects WHERE name = 'Phantom'")).toBe(0);
    expect(await count("SELECT count(*)::int AS n FROM project_members m LEFT JOIN projects p ON p.id = m.project_id WHERE p.id IS NULL")).toBe(0);
  });

  it("once the fault is gone, the same save succeeds", async () => {
    await sql.unsafe("DROP TRIGGER fail_audit ON audit_events");
    const res = await owner.post(`/api/projects/${projectId}/beams/${beamId}/revisions`, { baseVersion: 1, model: twoSpanModel(-5000) });
    expect(res.status).toBe(201);
    expect(res.body.revision.version).toBe(2);
  });
});
