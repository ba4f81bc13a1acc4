import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { CreateHandoffRequest, Handoff } from "@spanwright/contracts";
import { routePath } from "@spanwright/contracts/routes";
import { request } from "./client";
import { parseWith } from "./schemas";
import { queryKeys } from "./queryKeys";

/** Every hand-off of the project, newest first, each with its `stale` flag. */
export function useProjectHandoffs(projectId: string) {
  return useQuery({
    queryKey: queryKeys.projectHandoffs(projectId),
    queryFn: async ({ signal }) => {
      const body = await request(routePath("listProjectHandoffs", { projectId }), {
        signal,
        parse: parseWith("handoffListResponseSchema"),
      });
      return body.handoffs;
    },
  });
}

export function useBeamHandoffs(projectId: string, beamId: string) {
  return useQuery({
    queryKey: queryKeys.beamHandoffs(projectId, beamId),
    queryFn: async ({ signal }) => {
      const body = await request(routePath("listBeamHandoffs", { projectId, beamId }), {
        signal,
        parse: parseWith("handoffListResponseSchema"),
      });
      return body.handoffs;
    },
  });
}

/** Issues a revision: e-mails CSV and PDF to the recipients and records the hand-off. */
export function useCreateHandoff(projectId: string, beamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: { version: number } & CreateHandoffRequest): Promise<Handoff> => {
      const { version, ...body } = input;
      const answer = await request(routePath("createHandoff", { projectId, beamId, version }), {
        method: "POST",
        body,
        parse: parseWith("handoffResponseSchema"),
      });
      return answer.handoff;
    },
    onSuccess: () => {
      // The revision becomes "issued" and older hand-offs may stop being stale.
      void queryClient.invalidateQueries({ queryKey: queryKeys.beam(projectId, beamId) });
      void queryClient.invalidateQueries({ queryKey: queryKeys.projectHandoffs(projectId) });
      void queryClient.invalidateQueries({ queryKey: queryKeys.outbox });
    },
  });
}

/** Messages caught by the local SMTP fake; 404 in production, 403 for non-owners. */
export function useOutbox(options: { enabled?: boolean; refetchInterval?: number } = {}) {
  return useQuery({
    queryKey: queryKeys.outbox,
    queryFn: async ({ signal }) => {
      const body = await request(routePath("outbox"), { signal, parse: parseWith("outboxResponseSchema") });
      return body.messages;
    },
    enabled: options.enabled ?? true,
    ...(options.refetchInterval !== undefined ? { refetchInterval: options.refetchInterval } : {}),
  });
}
