import { useState } from "react";
import { QueryClientProvider, type QueryClient } from "@tanstack/react-query";
import { matchPath, RouterProvider } from "react-router";
import { prefetchMe } from "./api/auth";
import { beamQueryOptions } from "./api/beams";
import { projectQueryOptions } from "./api/projects";
import { createQueryClient } from "./api/queryClient";
import { createAppRouter } from "./router";

/** The editor's URL (as in router.tsx): its data is fetched at start, not after the editor chunk. */
const EDITOR_PATH = "/projects/:projectId/beams/:beamId";

/**
 * Requests the first screen needs, started before the router loads the page's chunk so the two
 * run at the same time: the user always, and the beam and project when the URL opens the editor.
 */
export function prefetchStartData(client: QueryClient, pathname: string): void {
  prefetchMe(client);
  const editor = matchPath(EDITOR_PATH, pathname);
  const { projectId, beamId } = editor?.params ?? {};
  if (projectId && beamId) {
    void client.prefetchQuery(beamQueryOptions(projectId, beamId));
    void client.prefetchQuery(projectQueryOptions(projectId));
  }
}

export function App() {
  const [queryClient] = useState(() => {
    const client = createQueryClient();
    prefetchStartData(client, window.location.pathname);
    return client;
  });
  const [router] = useState(createAppRouter);
  return (
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>
  );
}
