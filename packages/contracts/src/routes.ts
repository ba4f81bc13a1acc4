import type { Permission } from "./roles.js";

export type HttpMethod = "GET" | "POST" | "PATCH" | "DELETE";

/**
 * Who may call a route: `public` (anyone), `signed-in` (any session), or a project permission
 * (the caller must be a member of the project in the path with a role that has it; non-members get
 * 404, anonymous callers 401), or `owner-of-any-project` (signed in and owner of at least one
 * project, else 403).
 */
export type RouteAccess = "public" | "signed-in" | "owner-of-any-project" | Permission;

export interface RouteSpec {
  readonly method: HttpMethod;
  /** Express-style path with `:params`. */
  readonly path: string;
  readonly access: RouteAccess;
  /** Success status. */
  readonly status: 200 | 201 | 204;
  /** Request body format when not JSON. */
  readonly body?: "multipart";
}

/** Every API route. The API test suite checks this table against the Express router. */
export const apiRoutes = {
  health: { method: "GET", path: "/api/health", access: "public", status: 200 },
  signUp: { method: "POST", path: "/api/auth/sign-up", access: "public", status: 201 },
  signIn: { method: "POST", path: "/api/auth/sign-in", access: "public", status: 200 },
  signOut: { method: "POST", path: "/api/auth/sign-out", access: "public", status: 204 },
  /** Follows the link of the verification e-mail (body `{ token }`): the invitations of the account open. */
  verifyEmail: { method: "POST", path: "/api/auth/verify-email", access: "public", status: 200 },
  /** Mails the signed-in user a new verification link (204; nothing is sent when already verified). */
  resendVerification: { method: "POST", path: "/api/auth/verify-email/resend", access: "signed-in", status: 204 },
  me: { method: "GET", path: "/api/me", access: "signed-in", status: 200 },
  changePassword: { method: "POST", path: "/api/me/password", access: "signed-in", status: 204 },
  solve: { method: "POST", path: "/api/solve", access: "signed-in", status: 200 },

  listProjects: { method: "GET", path: "/api/projects", access: "signed-in", status: 200 },
  createProject: { method: "POST", path: "/api/projects", access: "signed-in", status: 201 },
  getProject: { method: "GET", path: "/api/projects/:projectId", access: "read", status: 200 },
  updateProject: { method: "PATCH", path: "/api/projects/:projectId", access: "manage", status: 200 },
  deleteProject: { method: "DELETE", path: "/api/projects/:projectId", access: "manage", status: 204 },

  listMembers: { method: "GET", path: "/api/projects/:projectId/members", access: "read", status: 200 },
  inviteMember: { method: "POST", path: "/api/projects/:projectId/members", access: "manage", status: 201 },
  changeMemberRole: { method: "PATCH", path: "/api/projects/:projectId/members/:userId", access: "manage", status: 200 },
  removeMember: { method: "DELETE", path: "/api/projects/:projectId/members/:userId", access: "manage", status: 204 },

  listBeams: { method: "GET", path: "/api/projects/:projectId/beams", access: "read", status: 200 },
  createBeam: { method: "POST", path: "/api/projects/:projectId/beams", access: "edit", status: 201 },
  getBeam: { method: "GET", path: "/api/projects/:projectId/beams/:beamId", access: "read", status: 200 },
  renameBeam: { method: "PATCH", path: "/api/projects/:projectId/beams/:beamId", access: "edit", status: 200 },
  deleteBeam: { method: "DELETE", path: "/api/projects/:projectId/beams/:beamId", access: "edit", status: 204 },
  /** Replaces the beam's saved design settings (body `{ designSettings }`, null clears them). */
  updateBeamDesign: { method: "PATCH", path: "/api/projects/:projectId/beams/:beamId/design-settings", access: "edit", status: 200 },

  listRevisions: { method: "GET", path: "/api/projects/:projectId/beams/:beamId/revisions", access: "read", status: 200 },
  saveRevision: { method: "POST", path: "/api/projects/:projectId/beams/:beamId/revisions", access: "edit", status: 201 },
  getRevision: { method: "GET", path: "/api/projects/:projectId/beams/:beamId/revisions/:version", access: "read", status: 200 },
  checkRevision: { method: "POST", path: "/api/projects/:projectId/beams/:beamId/revisions/:version/check", access: "check", status: 200 },
  // declared before the `:version` routes are matched: "compare" is not a version
  compareRevisions: { method: "GET", path: "/api/projects/:projectId/beams/:beamId/revisions/compare", access: "read", status: 200 },
  getReactions: { method: "GET", path: "/api/projects/:projectId/beams/:beamId/revisions/:version/reactions", access: "read", status: 200 },
  getReactionsCsv: { method: "GET", path: "/api/projects/:projectId/beams/:beamId/revisions/:version/reactions.csv", access: "read", status: 200 },
  getReportPdf: { method: "GET", path: "/api/projects/:projectId/beams/:beamId/revisions/:version/report.pdf", access: "read", status: 200 },

  importBeam: { method: "POST", path: "/api/projects/:projectId/beams/import", access: "edit", status: 201, body: "multipart" },
  previewLoadSchedule: { method: "POST", path: "/api/projects/:projectId/beams/:beamId/load-schedule/preview", access: "edit", status: 200, body: "multipart" },
  applyLoadSchedule: { method: "POST", path: "/api/projects/:projectId/beams/:beamId/load-schedule/apply", access: "edit", status: 201, body: "multipart" },

  createHandoff: { method: "POST", path: "/api/projects/:projectId/beams/:beamId/revisions/:version/handoffs", access: "edit", status: 201 },
  listProjectHandoffs: { method: "GET", path: "/api/projects/:projectId/handoffs", access: "read", status: 200 },
  listBeamHandoffs: { method: "GET", path: "/api/projects/:projectId/beams/:beamId/handoffs", access: "read", status: 200 },

  listSections: { method: "GET", path: "/api/projects/:projectId/sections", access: "read", status: 200 },
  createSection: { method: "POST", path: "/api/projects/:projectId/sections", access: "edit", status: 201 },
  updateSection: { method: "PATCH", path: "/api/projects/:projectId/sections/:sectionId", access: "edit", status: 200 },
  deleteSection: { method: "DELETE", path: "/api/projects/:projectId/sections/:sectionId", access: "edit", status: 204 },

  /** Development and tests only (404 in production unless OUTBOX_ENABLED). */
  outbox: { method: "GET", path: "/api/outbox", access: "owner-of-any-project", status: 200 },
} as const satisfies Record<string, RouteSpec>;

export type RouteName = keyof typeof apiRoutes;

/** Fills `:params` in a route path: `routePath("getBeam", { projectId, beamId })`. */
export function routePath(name: RouteName, params: Record<string, string | number> = {}): string {
  return apiRoutes[name].path.replace(/:([A-Za-z]+)/g, (_, key: string) => {
    const value = params[key];
    if (value === undefined) throw new Error(`routePath(${name}): missing parameter ${key}`);
    return encodeURIComponent(String(value));
  });
}
