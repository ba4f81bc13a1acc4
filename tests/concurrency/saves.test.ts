import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, testPassword, twoSpanModel, uniqueEmail, type TestApp } from "@spanwright/api/testing";
import { sessionCookieOf, startLiveServer, type LiveServer, type RawResponse } from "../fuzz/liveServer.js";

/**
 * Saves racing over real HTTP, each client with its own session. The service-level race is in
 * apps/api/src/revisions/revisions.test.ts; here the whole stack (sessions, pool, transactions)
 * is in the way, as in production.
 */
let t: TestApp;
let server: LiveServer;
beforeAll(async () => {
  t = await createTestApp();
  server = await startLiveServer(t.app);
});
afterAll(async () => {
  await server?.close();
  await t?.close();
});

interface Session {
  userId: string;
  cookie: string;
}

async function signUp(name: string): Promise<Session> {
  const res = await server.send({ method: "POST", path: "/api/auth/sign-up", body: JSON.stringify({ email: uniqueEmail(name), name, password: testPassword }) });
  expect(res.status).toBe(201);
  return { userId: (res.json as { user: { id: string } }).user.id, cookie: sessionCookieOf(res, t.config.sessionCookieName) };
}

const post = (who: Session, path: string, body: unknown): Promise<RawResponse> =>
  server.send({ method: "POST", path, body: JSON.stringify(body), cookie: who.cookie, timeoutMs: 60_000 });
const get = (who: Session, path: string): Promise<RawResponse> => server.send({ method: "GET", path, cookie: who.cookie, timeoutMs: 60_000 });

/** A model told apart by its title and load, so a read-back proves which save it came from. */
const markedModel = (mark: string, qy: number) => ({ ...twoSpanModel(qy), title: mark });

describe("two clients saving the same version", () => {
  it("exactly one wins each round, the other gets 409 with the winner's revision, and the history is complete", async () => {
    const owner = await signUp("Race owner");
    const engineer = await signUp("Race engineer");
    const project = await t.services.projects.create(owner.userId, { name: "Race", unitSystem: "si", compareThresholdPercent: 5 });
    const invited = await post(owner, `/api/projects/${project.id}/members`, { email: await emailOf(engineer), role: "engineer" });
    expect(invited.status).toBe(201);
    const created = await post(owner, `/api/projects/${project.id}/beams`, { name: "Contested", model: twoSpanModel() });
    expect(created.status).toBe(201);
    const beamId = (created.json as { beam: { id: string } }).beam.id;
    const base = `/api/projects/${project.id}/beams/${beamId}/revisions`;

    const acknowledged = new Map<number, string>([[1, "test beam"]]);
    for (let round = 1; round <= 10; round++) {
      const [a, b] = await Promise.all([
        post(owner, base, { baseVersion: round, model: markedModel(`owner ${round}`, -1000 * round), changeSummary: "owner" }),
        post(engineer, base, { baseVersion: round, model: markedModel(`engineer ${round}`, -2000 * round), changeSummary: "engineer" }),
      ]);
      expect([a.status, b.status].sort(), `round ${round}`).toEqual([201, 409]);
      const [won, lost] = a.status === 201 ? [a, b] : [b, a];
      const revision = (won.json as { revision: { version: number; model: { title: string } } }).revision;
      expect(revision.version).toBe(round + 1);
      expect(lost.json).toMatchObject({ error: { code: "version-conflict", details: { current: { version: round + 1, model: { title: revision.model.title } } } } });
      acknowledged.set(revision.version, revision.model.title);
    }

    const list = await get(owner, base);
    const versions = (list.json as { revisions: Array<{ version: number }> }).revisions.map((r) => r.version);
    expect(versions).toEqual([11, 10, 9, 8, 7, 6, 5, 4, 3, 2, 1]);
    for (const [version, title] of acknowledged) {
      const res = await get(engineer, `${base}/${version}`);
      expect((res.json as { revision: { model: { title: string } } }).revision.model.title).toBe(title);
    }
  }, 120_000);
});

async function emailOf(who: Session): Promise<string> {
  return ((await get(who, "/api/me")).json as { user: { email: string } }).user.email;
}

describe("fifty clients saving different beams at once", () => {
  it("every acknowledged save is readable afterwards, with the model that was sent", async () => {
    const owner = await signUp("Crowd owner");
    const project = await t.services.projects.create(owner.userId, { name: "Crowd", unitSystem: "si", compareThresholdPercent: 5 });
    const clients: Session[] = [];
    for (let i = 0; i < 50; i += 10) {
      clients.push(...(await Promise.all(Array.from({ length: 10 }, (_, k) => signUp(`Crowd ${i + k}`)))));
    }
    for (const client of clients) {
      await t.services.members.invite(owner.userId, project.id, { email: await emailOf(client), role: "engineer" });
    }
    const beams = await Promise.all(
      clients.map(async (client, i) => {
        const res = await post(client, `/api/projects/${project.id}/beams`, { name: `Beam ${i}`, model: twoSpanModel() });
        expect(res.status).toBe(201);
        return (res.json as { beam: { id: string } }).beam.id;
      }),
    );

    const rounds = 3;
    const acknowledged: Array<{ client: number; version: number; title: string }> = [];
    const failures: string[] = [];
    await Promise.all(
      clients.map(async (client, i) => {
        for (let version = 1; version <= rounds; version++) {
          const title = `client ${i} save ${version}`;
          const res = await post(client, `/api/projects/${project.id}/beams/${beams[i]}/revisions`, { baseVersion: version, model: markedModel(title, -100 * (i + version)) });
          if (res.status === 201) acknowledged.push({ client: i, version: version + 1, title });
          else failures.push(`${i}/${version}: ${res.status} ${res.text.slice(0, 100)}`);
        }
      }),
    );
    expect(failures).toEqual([]);
    expect(acknowledged).toHaveLength(50 * rounds);

    for (const { client, version, title } of acknowledged) {
      const res = await get(clients[client]!, `/api/projects/${project.id}/beams/${beams[client]}/revisions/${version}`);
      expect(res.status).toBe(200);
      const revision = (res.json as { revision: { model: { title: string }; result: { format: string } } }).revision;
      expect(revision.model.title).toBe(title);
      expect(revision.result.format).toBe("spanwright.result/1");
    }
    const listed = await get(owner, `/api/projects/${project.id}/beams`);
    const latest = (listed.json as { beams: Array<{ latestVersion: number }> }).beams.map((b) => b.latestVersion);
    expect(latest).toEqual(new Array(50).fill(rounds + 1));
  }, 180_000);
});
