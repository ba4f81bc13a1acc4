import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { BeamResponse, CreateBeamRequest } from "@spanwright/contracts";
import { routePath } from "@spanwright/contracts/routes";
import { request } from "./client";
import { parseWith } from "./schemas";
import { queryKeys } from "./queryKeys";

export function useBeams(projectId: string) {
  return useQuery({
    queryKey: queryKeys.beams(projectId),
    queryFn: async ({ signal }) => {
      const body = await request(routePath("listBeams", { projectId }), {
        signal,
        parse: parseWith("beamListResponseSchema"),
      });
      return body.beams;
    },
  });
}

/** One query definition for the hook and for prefetching at app start. */
export function beamQueryOptions(projectId: string, beamId: string) {
  return queryOptions({
    queryKey: queryKeys.beam(projectId, beamId),
    queryFn: ({ signal }) =>
      request(routePath("getBeam", { projectId, beamId }), {
        signal,
        parse: parseWith("beamResponseSchema"),
      }),
  });
}

/** The beam with its latest revision (model and result). */
export function useBeam(projectId: string, beamId: string) {
  return useQuery(beamQueryOptions(projectId, beamId));
}

export function useCreateBeam(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateBeamRequest): Promise<BeamResponse> =>
      request(routePath("createBeam", { projectId }), {
        method: "POST",
        body: input,
        parse: parseWith("beamResponseSchema"),
      }),
    onSuccess: (created) => {
      queryClient.setQueryData(queryKeys.beam(projectId, created.beam.id), created);
      void queryClient.invalidateQueries({ queryKey: queryKeys.beams(projectId), exact: true });
    },
  });
}

export function useDeleteBeam(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (beamId: string) =>
      request(routePath("deleteBeam", { projectId, beamId }), { method: "DELETE" }),
    onSuccess: (_data, beamId) => {
      queryClient.removeQueries({ queryKey: queryKeys.beam(projectId, beamId) });
      void queryClient.invalidateQueries({ queryKey: queryKeys.beams(projectId), exact: true });
    },
  });
}
