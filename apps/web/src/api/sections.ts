import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import {
  routePath,
  sectionListResponseSchema,
  sectionResponseSchema,
  type CreateSectionRequest,
  type ProjectSection,
  type UpdateSectionRequest,
} from "@spanwright/contracts";
import { request } from "./client";
import { queryKeys } from "./queryKeys";

/** Keys of the project's section list, under the project's key so removing a project drops them. */
export const sectionKeys = {
  list: (projectId: string) => [...queryKeys.project(projectId), "sections"] as const,
};

/** The project's sections, each with its shape, material and engine-computed properties (SI). */
export function useSections(projectId: string) {
  return useQuery({
    queryKey: sectionKeys.list(projectId),
    queryFn: async ({ signal }) => {
      const body = await request(routePath("listSections", { projectId }), {
        signal,
        parse: (d) => sectionListResponseSchema.parse(d),
      });
      return body.sections;
    },
  });
}

export function useCreateSection(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: CreateSectionRequest): Promise<ProjectSection> =>
      (
        await request(routePath("createSection", { projectId }), {
          method: "POST",
          body: input,
          parse: (d) => sectionResponseSchema.parse(d),
        })
      ).section,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: sectionKeys.list(projectId), exact: true }),
  });
}

export function useUpdateSection(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ sectionId, changes }: { sectionId: string; changes: UpdateSectionRequest }): Promise<ProjectSection> =>
      (
        await request(routePath("updateSection", { projectId, sectionId }), {
          method: "PATCH",
          body: changes,
          parse: (d) => sectionResponseSchema.parse(d),
        })
      ).section,
    onSuccess: (updated) => {
      queryClient.setQueryData<ProjectSection[]>(sectionKeys.list(projectId), (list) =>
        list?.map((s) => (s.id === updated.id ? updated : s)),
      );
      void queryClient.invalidateQueries({ queryKey: sectionKeys.list(projectId), exact: true });
    },
  });
}

export function useDeleteSection(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (sectionId: string) => request(routePath("deleteSection", { projectId, sectionId }), { method: "DELETE" }),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: sectionKeys.list(projectId), exact: true }),
  });
}
