import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import {
  compareResponseSchema,
  reactionTableResponseSchema,
  revisionListResponseSchema,
  revisionResponseSchema,
  routePath,
  versionConflictDetailsSchema,
  type CheckRevisionRequest,
  type Revision,
  type SaveRevisionRequest,
  type VersionConflictDetails,
} from "@spanwright/contracts";
import { isApiError, request } from "./client";
import { queryKeys } from "./queryKeys";

export function useRevisions(projectId: string, beamId: string) {
  return useQuery({
    queryKey: queryKeys.revisions(projectId, beamId),
    queryFn: async ({ signal }) => {
      const body = await request(routePath("listRevisions", { projectId, beamId }), {
        signal,
        parse: (d) => revisionListResponseSchema.parse(d),
      });
      return body.revisions;
    },
  });
}

export function useRevision(projectId: string, beamId: string, version: number) {
  return useQuery({
    queryKey: queryKeys.revision(projectId, beamId, version),
    queryFn: async ({ signal }) => {
      const body = await request(routePath("getRevision", { projectId, beamId, version }), {
        signal,
        parse: (d) => revisionResponseSchema.parse(d),
      });
      return body.revision;
    },
    // A saved revision never changes except for its check status.
    staleTime: 5 * 60_000,
  });
}

function useInvalidateBeam(projectId: string, beamId: string): () => void {
  const queryClient = useQueryClient();
  return () => {
    void queryClient.invalidateQueries({ queryKey: queryKeys.beam(projectId, beamId) });
    void queryClient.invalidateQueries({ queryKey: queryKeys.beams(projectId), exact: true });
  };
}

/**
 * Saves a new revision. A stale `baseVersion` rejects with an ApiError of code
 * "version-conflict"; read the latest revision from it with `versionConflictOf`.
 */
export function useSaveRevision(projectId: string, beamId: string) {
  const invalidate = useInvalidateBeam(projectId, beamId);
  return useMutation({
    mutationFn: async (input: SaveRevisionRequest): Promise<Revision> => {
      const body = await request(routePath("saveRevision", { projectId, beamId }), {
        method: "POST",
        body: input,
        parse: (d) => revisionResponseSchema.parse(d),
      });
      return body.revision;
    },
    onSuccess: invalidate,
  });
}

export function useCheckRevision(projectId: string, beamId: string) {
  const invalidate = useInvalidateBeam(projectId, beamId);
  return useMutation({
    mutationFn: async (input: { version: number } & CheckRevisionRequest): Promise<Revision> => {
      const { version, ...body } = input;
      const answer = await request(routePath("checkRevision", { projectId, beamId, version }), {
        method: "POST",
        body,
        parse: (d) => revisionResponseSchema.parse(d),
      });
      return answer.revision;
    },
    onSuccess: invalidate,
  });
}

/** The latest revision carried by a 409 "version-conflict", or null for any other error. */
export function versionConflictOf(error: unknown): VersionConflictDetails | null {
  if (!isApiError(error) || error.code !== "version-conflict") return null;
  const parsed = versionConflictDetailsSchema.safeParse(error.details);
  return parsed.success ? parsed.data : null;
}

/** The reaction table of one revision, SI values with the project's display units beside them. */
export function useReactions(projectId: string, beamId: string, version: number) {
  return useQuery({
    queryKey: queryKeys.reactions(projectId, beamId, version),
    queryFn: ({ signal }) =>
      request(routePath("getReactions", { projectId, beamId, version }), {
        signal,
        parse: (d) => reactionTableResponseSchema.parse(d),
      }),
    // Stored results of a saved revision never change.
    staleTime: 5 * 60_000,
  });
}

export function useCompareRevisions(projectId: string, beamId: string, from: number, to: number) {
  return useQuery({
    queryKey: queryKeys.compare(projectId, beamId, from, to),
    queryFn: ({ signal }) =>
      request(`${routePath("compareRevisions", { projectId, beamId })}?from=${from}&to=${to}`, {
        signal,
        parse: (d) => compareResponseSchema.parse(d),
      }),
    enabled: Number.isInteger(from) && Number.isInteger(to) && from > 0 && to > 0,
  });
}

export type CsvUnits = "project" | "si";

/** Download links: plain GETs the browser follows with the session cookie. */
export function reactionsCsvUrl(projectId: string, beamId: string, version: number, units: CsvUnits): string {
  return `${routePath("getReactionsCsv", { projectId, beamId, version })}?units=${units}`;
}

export function reportPdfUrl(projectId: string, beamId: string, version: number): string {
  return routePath("getReportPdf", { projectId, beamId, version });
}
