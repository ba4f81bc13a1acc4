import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { CreateProjectRequest, Project, UpdateProjectRequest } from "@spanwright/contracts";
import { routePath } from "@spanwright/contracts/routes";
import { request } from "./client";
import { parseWith } from "./schemas";
import { queryKeys } from "./queryKeys";

export function useProjects() {
  return useQuery({
    queryKey: queryKeys.projects,
    queryFn: async ({ signal }) => {
      const body = await request(routePath("listProjects"), {
        signal,
        parse: parseWith("projectListResponseSchema"),
      });
      return body.projects;
    },
  });
}

/** One query definition for the hook and for prefetching at app start. */
export function projectQueryOptions(projectId: string) {
  return queryOptions({
    queryKey: queryKeys.project(projectId),
    queryFn: async ({ signal }) => {
      const body = await request(routePath("getProject", { projectId }), {
        signal,
        parse: parseWith("projectResponseSchema"),
      });
      return body.project;
    },
  });
}

export function useProject(projectId: string) {
  return useQuery(projectQueryOptions(projectId));
}

export function useCreateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: CreateProjectRequest): Promise<Project> => {
      const body = await request(routePath("createProject"), {
        method: "POST",
        body: input,
        parse: parseWith("projectResponseSchema"),
      });
      return body.project;
    },
    onSuccess: (project) => {
      queryClient.setQueryData(queryKeys.project(project.id), project);
      void queryClient.invalidateQueries({ queryKey: queryKeys.projects, exact: true });
    },
  });
}

export function useUpdateProject(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: UpdateProjectRequest): Promise<Project> => {
      const body = await request(routePath("updateProject", { projectId }), {
        method: "PATCH",
        body: input,
        parse: parseWith("projectResponseSchema"),
      });
      return body.project;
    },
    onSuccess: (project) => {
      queryClient.setQueryData(queryKeys.project(projectId), project);
      void queryClient.invalidateQueries({ queryKey: queryKeys.projects, exact: true });
    },
  });
}

export function useDeleteProject(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => request(routePath("deleteProject", { projectId }), { method: "DELETE" }),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: queryKeys.project(projectId) });
      void queryClient.invalidateQueries({ queryKey: queryKeys.projects, exact: true });
    },
  });
}
