/** Every TanStack Query key in one place, so invalidations cannot drift from the queries. */
export const queryKeys = {
  me: ["me"] as const,
  projects: ["projects"] as const,
  project: (projectId: string) => ["projects", projectId] as const,
  members: (projectId: string) => ["projects", projectId, "members"] as const,
  beams: (projectId: string) => ["projects", projectId, "beams"] as const,
  beam: (projectId: string, beamId: string) => ["projects", projectId, "beams", beamId] as const,
  revisions: (projectId: string, beamId: string) =>
    ["projects", projectId, "beams", beamId, "revisions"] as const,
  revision: (projectId: string, beamId: string, version: number) =>
    ["projects", projectId, "beams", beamId, "revisions", version] as const,
  reactions: (projectId: string, beamId: string, version: number) =>
    ["projects", projectId, "beams", beamId, "revisions", version, "reactions"] as const,
  compare: (projectId: string, beamId: string, from: number, to: number) =>
    ["projects", projectId, "beams", beamId, "compare", from, to] as const,
  projectHandoffs: (projectId: string) => ["projects", projectId, "handoffs"] as const,
  beamHandoffs: (projectId: string, beamId: string) => ["projects", projectId, "beams", beamId, "handoffs"] as const,
  outbox: ["outbox"] as const,
};
