import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { apiRoutes, can, routePath, type Role, type RouteName } from "@spanwright/contracts";
import { createTestApp, testPassword, twoSpanModel, uniqueEmail, verificationToken, type Client, type TestApp } from "@spanwright/api/testing";
import { listExpressRoutes } from "./routeTable.js";

/**
 * The authorisation matrix: every route of the contract's route table × every kind of caller.
 * Each case that can change data runs against a fresh project, so a successful delete or role
 * change cannot leak into the next case.
 */
type Actor = Role | "outsider" | "anonymous";
const actors: readonly Actor[] = ["owner", "engineer", "checker", "viewer", "outsider", "anonymous"];

interface Fixture {
  projectId: string;
  beamId: string;
  sectionId: string;
  /** A member who is neither an actor nor the owner: the target of role changes and removals. */
  extraUserId: string;
}

interface Call {
  params: Record<string, string | number>;
  body?: unknown;
  /** Query string without "?". */
  query?: string;
  /** For multipart routes: the file in the field `file` and text fields. */
  upload?: { file: { name: string; content: string }; fields?: Record<string, string> };
}

/** An invented rectangular timber section, SI. */
const sectionShape = { kind: "rectangle", b: 0.09, h: 0.24 };
const sectionMaterial = { id: "timber", name: "Sawn timber (demo)", kind: "timber", E: 11e9, typical: true, note: "typical values, confirm for your project", source: "demo" };

const scheduleCsv = "case,type,position,magnitude\nD,point,2 m,-10 kN\n";

/** How to call each route successfully. Typed over every route name, so a new route needs an entry. */
const calls: Record<RouteName, (f: Fixture) => Call> = {
  health: () => ({ params: {} }),
  signUp: () => ({ params: {}, body: { email: uniqueEmail("matrix"), name: "Matrix", password: testPassword } }),
  signIn: () => ({ params: {}, body: { email: emails.extra, password: testPassword } }),
  signOut: () => ({ params: {}, body: {} }),
  verifyEmail: () => ({ params: {}, body: { token: verificationTokens.pop() } }),
  resendVerification: () => ({ params: {}, body: {} }),
  me: () => ({ params: {} }),
  changePassword: () => ({ params: {}, body: { currentPassword: testPassword, newPassword: testPassword } }),
  solve: () => ({ params: {}, body: twoSpanModel() }),
  listProjects: () => ({ params: {} }),
  createProject: () => ({ params: {}, body: { name: "Matrix project" } }),
  getProject: (f) => ({ params: { projectId: f.projectId } }),
  updateProject: (f) => ({ params: { projectId: f.projectId }, body: { name: "Renamed" } }),
  deleteProject: (f) => ({ params: { projectId: f.projectId } }),
  listMembers: (f) => ({ params: { projectId: f.projectId } }),
  inviteMember: (f) => ({ params: { projectId: f.projectId }, body: { email: uniqueEmail("invitee"), role: "viewer" } }),
  changeMemberRole: (f) => ({ params: { projectId: f.projectId, userId: f.extraUserId }, body: { role: "checker" } }),
  removeMember: (f) => ({ params: { projectId: f.projectId, userId: f.extraUserId } }),
  listBeams: (f) => ({ params: { projectId: f.projectId } }),
  createBeam: (f) => ({ params: { projectId: f.projectId }, body: { name: "New beam", model: twoSpanModel() } }),
  getBeam: (f) => ({ params: { projectId: f.projectId, beamId: f.beamId } }),
  renameBeam: (f) => ({ params: { projectId: f.projectId, beamId: f.beamId }, body: { name: "Renamed beam" } }),
  deleteBeam: (f) => ({ params: { projectId: f.projectId, beamId: f.beamId } }),
  updateBeamDesign: (f) => ({
    params: { projectId: f.projectId, beamId: f.beamId },
    body: { designSettings: { section: { source: "project", sectionId: f.sectionId }, material: null, method: "LRFD", lb: null, cb: "equation-f1-1", strengthIds: null, deflection: null, allowableBending: null, allowableShear: null } },
  }),
  listRevisions: (f) => ({ params: { projectId: f.projectId, beamId: f.beamId } }),
  saveRevision: (f) => ({ params: { projectId: f.projectId, beamId: f.beamId }, body: { baseVersion: 1, model: twoSpanModel(-2e4) } }),
  getRevision: (f) => ({ params: { projectId: f.projectId, beamId: f.beamId, version: 1 } }),
  checkRevision: (f) => ({ params: { projectId: f.projectId, beamId: f.beamId, version: 1 }, body: { comment: "ok" } }),
  compareRevisions: (f) => ({ params: { projectId: f.projectId, beamId: f.beamId }, query: "from=1&to=1" }),
  getReactions: (f) => ({ params: { projectId: f.projectId, beamId: f.beamId, version: 1 } }),
  getReactionsCsv: (f) => ({ params: { projectId: f.projectId, beamId: f.beamId, version: 1 }, query: "units=si" }),
  getReportPdf: (f) => ({ params: { projectId: f.projectId, beamId: f.beamId, version: 1 } }),
  importBeam: (f) => ({ params: { projectId: f.projectId }, upload: { file: { name: "beam.json", content: JSON.stringify(twoSpanModel()) } } }),
  previewLoadSchedule: (f) => ({ params: { projectId: f.projectId, beamId: f.beamId }, upload: { file: { name: "loads.csv", content: scheduleCsv } } }),
  applyLoadSchedule: (f) => ({
    params: { projectId: f.projectId, beamId: f.beamId },
    upload: { file: { name: "loads.csv", content: scheduleCsv }, fields: { baseVersion: "1" } },
  }),
  createHandoff: (f) => ({
    params: { projectId: f.projectId, beamId: f.beamId, version: 1 },
    body: { recipients: [{ email: "foundations@groundwork.example" }] },
  }),
  listProjectHandoffs: (f) => ({ params: { projectId: f.projectId } }),
  listBeamHandoffs: (f) => ({ params: { projectId: f.projectId, beamId: f.beamId } }),
  listSections: (f) => ({ params: { projectId: f.projectId } }),
  createSection: (f) => ({ params: { projectId: f.projectId }, body: { name: "New section", shape: sectionShape, material: sectionMaterial } }),
  updateSection: (f) => ({ params: { projectId: f.projectId, sectionId: f.sectionId }, body: { name: "Renamed section" } }),
  deleteSection: (f) => ({ params: { projectId: f.projectId, sectionId: f.sectionId } }),
  outbox: () => ({ params: {} }),
};

/**
 * The rules of issue 2, written out here rather than derived from the shared `can`, so a change to
 * the shared table or the route table shows up as a failing test: viewers read, checkers read and
 * mark checked, engineers and owners edit, owners manage members and the project.
 */
const allowed = {
  read: ["owner", "engineer", "checker", "viewer"],
  edit: ["owner", "engineer"],
  check: ["checker"],
  manage: ["owner"],
} as const;
const expectedAccess: Record<RouteName, "public" | "signed-in" | "owner-of-any-project" | keyof typeof allowed> = {
  health: "public",
  signUp: "public",
  signIn: "public",
  signOut: "public",
  verifyEmail: "public",
  resendVerification: "signed-in",
  me: "signed-in",
  changePassword: "signed-in",
  solve: "signed-in",
  listProjects: "signed-in",
  createProject: "signed-in",
  getProject: "read",
  updateProject: "manage",
  deleteProject: "manage",
  listMembers: "read",
  inviteMember: "manage",
  changeMemberRole: "manage",
  removeMember: "manage",
  listBeams: "read",
  createBeam: "edit",
  getBeam: "read",
  renameBeam: "edit",
  deleteBeam: "edit",
  updateBeamDesign: "edit",
  listRevisions: "read",
  saveRevision: "edit",
  getRevision: "read",
  checkRevision: "check",
  compareRevisions: "read",
  getReactions: "read",
  getReactionsCsv: "read",
  getReportPdf: "read",
  importBeam: "edit",
  previewLoadSchedule: "edit",
  applyLoadSchedule: "edit",
  createHandoff: "edit",
  listProjectHandoffs: "read",
  listBeamHandoffs: "read",
  listSections: "read",
  createSection: "edit",
  updateSection: "edit",
  deleteSection: "edit",
  outbox: "owner-of-any-project",
};

/** Whether the actor owns a project now (createProject cases make every actor an owner somewhere). */
async function ownsAnyProject(actor: Actor): Promise<boolean> {
  if (actor === "anonymous") return false;
  return (await t.services.projects.list(ids[actor])).some((p) => p.role === "owner");
}

async function expectedStatus(name: RouteName, actor: Actor): Promise<number> {
  const access = expectedAccess[name];
  const success = apiRoutes[name].status;
  if (access === "public") throw new Error("public routes are not in the matrix");
  if (actor === "anonymous") return 401;
  if (access === "signed-in") return success;
  if (access === "owner-of-any-project") return (await ownsAnyProject(actor)) ? success : 403;
  if (actor === "outsider") return 404;
  return (allowed[access] as readonly string[]).includes(actor) ? success : 403;
}

let t: TestApp;
const clients = {} as Record<Exclude<Actor, "anonymous">, Client>;
const ids = {} as Record<Exclude<Actor, "anonymous"> | "extra", string>;
let foreign: Fixture;
/** Read-only routes share one project; every other case gets its own. */
let shared: Fixture;

async function createFixture(): Promise<Fixture> {
  const { projects, members, beams, sections } = t.services;
  const project = await projects.create(ids.owner, { name: "Matrix", unitSystem: "si", compareThresholdPercent: 5 });
  for (const role of ["engineer", "checker", "viewer"] as const) {
    await members.invite(ids.owner, project.id, { email: emails[role], role });
  }
  await members.invite(ids.owner, project.id, { email: emails.extra, role: "viewer" });
  const { beam } = await beams.create(ids.owner, project.id, { name: "B", model: twoSpanModel(), changeSummary: "" });
  const section = await sections.create(ids.owner, project.id, { name: "S", shape: sectionShape, material: sectionMaterial });
  return { projectId: project.id, beamId: beam.id, sectionId: section.id, extraUserId: ids.extra };
}

const emails = {} as Record<Exclude<Actor, "anonymous"> | "extra", string>;
/** Unused e-mail verification tokens of accounts that took over an invitation, one per verifyEmail call. */
const verificationTokens: string[] = [];

beforeAll(async () => {
  t = await createTestApp();
  for (const who of ["owner", "engineer", "checker", "viewer", "outsider", "extra"] as const) {
    const account = await t.signUp(`Matrix ${who}`);
    ids[who] = account.userId;
    emails[who] = account.email;
    if (who !== "extra") clients[who] = account.client;
  }
  // the outsider's own project: its ids must be "not found" from inside the fixture project
  const other = await t.services.projects.create(ids.outsider, { name: "Elsewhere", unitSystem: "si", compareThresholdPercent: 5 });
  const { beam } = await t.services.beams.create(ids.outsider, other.id, { name: "Foreign", model: twoSpanModel(), changeSummary: "" });
  const section = await t.services.sections.create(ids.outsider, other.id, { name: "Foreign", shape: sectionShape, material: sectionMaterial });
  foreign = { projectId: other.id, beamId: beam.id, sectionId: section.id, extraUserId: ids.outsider };
  shared = await createFixture();
  // an invited address signed up: the public verifyEmail case follows its mailed link
  const invited = uniqueEmail("matrix.invited");
  await t.services.members.invite(ids.owner, shared.projectId, { email: invited, role: "viewer" });
  await t.signUp("Matrix invited", invited);
  verificationTokens.push(await verificationToken(t.services.mailer, invited));
});
afterAll(() => t.close());

function send(actor: Actor, name: RouteName, call: Call) {
  const route = apiRoutes[name];
  const client = actor === "anonymous" ? t.client() : clients[actor];
  const path = routePath(name, call.params) + (call.query ? `?${call.query}` : "");
  const method = route.method.toLowerCase() as "get" | "post" | "patch" | "delete";
  if (call.upload) {
    let req = client.agent.post(path).set("Origin", client.origin);
    for (const [key, value] of Object.entries(call.upload.fields ?? {})) req = req.field(key, value);
    return req.attach("file", Buffer.from(call.upload.file.content), call.upload.file.name);
  }
  return client.send(method, path, method === "get" || method === "delete" ? undefined : call.body);
}

const routeNames = Object.keys(apiRoutes) as RouteName[];
const guarded = routeNames.filter((n) => apiRoutes[n].access !== "public");
const publicRoutes = routeNames.filter((n) => apiRoutes[n].access === "public");

describe("route table", () => {
  it("declares each route's access as the role rules say", () => {
    for (const name of routeNames) expect([name, apiRoutes[name].access]).toEqual([name, expectedAccess[name]]);
    for (const role of ["owner", "engineer", "checker", "viewer"] as const) {
      for (const permission of ["read", "edit", "check", "manage"] as const) {
        expect([role, permission, can(role, permission)]).toEqual([role, permission, (allowed[permission] as readonly string[]).includes(role)]);
      }
    }
  });

  it("lists exactly the routes the Express app serves", () => {
    const served = listExpressRoutes(t.app);
    const declared = Object.values(apiRoutes).map((r) => `${r.method} ${r.path}`).sort();
    expect(served).toEqual(declared);
  });
});

describe.each(guarded)("%s", (name) => {
  it.each(actors)("answers %s as the role rules say", async (actor) => {
    const fixture = apiRoutes[name].method === "GET" ? shared : await createFixture();
    const res = await send(actor, name, calls[name](fixture));
    const expected = await expectedStatus(name, actor);
    expect({ status: res.status, code: res.body?.error?.code }).toMatchObject({ status: expected });
    if (expected === 401) expect(res.body.error.code).toBe("unauthenticated");
    if (expected === 403) expect(res.body.error.code).toBe("forbidden");
    if (expected === 404) expect(res.body.error.code).toBe("not-found");
  });
});

describe("public routes", () => {
  it.each(publicRoutes)("%s needs no session", async (name) => {
    const res = await send("anonymous", name, calls[name](foreign));
    expect(res.status).toBe(apiRoutes[name].status);
  });
});

describe("ids from another project", () => {
  const withForeignIds = guarded.filter((n) => /:(beamId|userId|sectionId)/.test(apiRoutes[n].path));
  it.each(withForeignIds)("%s answers 404 to an allowed member for another project's beam, section or user", async (name) => {
    const fixture = await createFixture();
    const mixed: Fixture = { projectId: fixture.projectId, beamId: foreign.beamId, sectionId: foreign.sectionId, extraUserId: foreign.extraUserId };
    const access = apiRoutes[name].access;
    const allowed = (["owner", "engineer", "checker", "viewer"] as const).find((r) => access === "signed-in" || access === "public" || access === "owner-of-any-project" || can(r, access))!;
    const res = await send(allowed, name, calls[name](mixed));
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe("not-found");
  });
});
