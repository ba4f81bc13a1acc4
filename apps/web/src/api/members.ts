import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import {
  memberListResponseSchema,
  memberResponseSchema,
  routePath,
  type InviteMemberRequest,
  type Member,
  type Role,
} from "@spanwright/contracts";
import { request } from "./client";
import { queryKeys } from "./queryKeys";

export function useMembers(projectId: string) {
  return useQuery({
    queryKey: queryKeys.members(projectId),
    queryFn: async ({ signal }) => {
      const body = await request(routePath("listMembers", { projectId }), {
        signal,
        parse: (d) => memberListResponseSchema.parse(d),
      });
      return body.members;
    },
  });
}

function useInvalidateMembers(projectId: string): () => void {
  const queryClient = useQueryClient();
  return () => {
    void queryClient.invalidateQueries({ queryKey: queryKeys.members(projectId) });
    // Changing one's own role changes what the project page may show.
    void queryClient.invalidateQueries({ queryKey: queryKeys.project(projectId), exact: true });
  };
}

export function useInviteMember(projectId: string) {
  const invalidate = useInvalidateMembers(projectId);
  return useMutation({
    mutationFn: async (input: InviteMemberRequest): Promise<Member> => {
      const body = await request(routePath("inviteMember", { projectId }), {
        method: "POST",
        body: input,
        parse: (d) => memberResponseSchema.parse(d),
      });
      return body.member;
    },
    onSuccess: invalidate,
  });
}

export function useChangeMemberRole(projectId: string) {
  const invalidate = useInvalidateMembers(projectId);
  return useMutation({
    mutationFn: async (input: { userId: string; role: Role }): Promise<Member> => {
      const body = await request(routePath("changeMemberRole", { projectId, userId: input.userId }), {
        method: "PATCH",
        body: { role: input.role },
        parse: (d) => memberResponseSchema.parse(d),
      });
      return body.member;
    },
    onSuccess: invalidate,
  });
}

export function useRemoveMember(projectId: string) {
  const invalidate = useInvalidateMembers(projectId);
  return useMutation({
    mutationFn: (userId: string) =>
      request(routePath("removeMember", { projectId, userId }), { method: "DELETE" }),
    onSuccess: invalidate,
  });
}
