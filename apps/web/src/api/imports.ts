import { useMutation, useQueryClient } from "@tanstack/react-query";
import {
  beamResponseSchema,
  loadSchedulePreviewResponseSchema,
  revisionResponseSchema,
  routePath,
  type BeamResponse,
  type LoadSchedulePreviewResponse,
  type Revision,
} from "@spanwright/contracts";
import { queryKeys } from "./queryKeys";
import { uploadFile } from "./upload";

/** Creates a beam from an exchange-format JSON file. */
export function useImportBeam(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { file: File; name?: string }): Promise<BeamResponse> =>
      uploadFile(
        routePath("importBeam", { projectId }),
        { file: input.file, fields: input.name !== undefined && input.name !== "" ? { name: input.name } : {} },
        (d) => beamResponseSchema.parse(d),
      ),
    onSuccess: (created) => {
      queryClient.setQueryData(queryKeys.beam(projectId, created.beam.id), created);
      void queryClient.invalidateQueries({ queryKey: queryKeys.beams(projectId), exact: true });
    },
  });
}

/** Parses a load schedule CSV on the server; writes nothing. */
export function usePreviewLoadSchedule(projectId: string, beamId: string) {
  return useMutation({
    mutationFn: (file: File): Promise<LoadSchedulePreviewResponse> =>
      uploadFile(routePath("previewLoadSchedule", { projectId, beamId }), { file }, (d) =>
        loadSchedulePreviewResponseSchema.parse(d),
      ),
  });
}

/** Applies an error-free schedule as a new revision on top of `baseVersion`. */
export function useApplyLoadSchedule(projectId: string, beamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: { file: File; baseVersion: number }): Promise<Revision> => {
      const body = await uploadFile(
        routePath("applyLoadSchedule", { projectId, beamId }),
        { file: input.file, fields: { baseVersion: String(input.baseVersion) } },
        (d) => revisionResponseSchema.parse(d),
      );
      return body.revision;
    },
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: queryKeys.beam(projectId, beamId) });
      void queryClient.invalidateQueries({ queryKey: queryKeys.beams(projectId), exact: true });
    },
  });
}
