import { useMutation, useQueryClient } from "@tanstack/react-query";
import { beamDesignResponseSchema, routePath, type BeamDesignSettings, type BeamResponse } from "@spanwright/contracts";
import { request } from "../api/client";
import { queryKeys } from "../api/queryKeys";

/** Saves the beam's design settings whole (null clears them) and puts the answer into the cached beam. */
export function useSaveDesignSettings(projectId: string, beamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (designSettings: BeamDesignSettings | null) =>
      (
        await request(routePath("updateBeamDesign", { projectId, beamId }), {
          method: "PATCH",
          body: { designSettings },
          parse: (d) => beamDesignResponseSchema.parse(d),
        })
      ).designSettings,
    onSuccess: (designSettings) => {
      queryClient.setQueryData<BeamResponse>(queryKeys.beam(projectId, beamId), (beam) => (beam ? { ...beam, designSettings } : beam));
    },
  });
}

/** The calculation report of one revision; without a query it prints the beam's saved design settings. */
export function reportPdfUrl(projectId: string, beamId: string, version: number): string {
  return routePath("getReportPdf", { projectId, beamId, version });
}
