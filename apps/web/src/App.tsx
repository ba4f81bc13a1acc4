import { useState } from "react";
import { QueryClientProvider, type QueryClient } from "@tanstack/react-query";
import { RouterProvider } from "react-router";
import { prefetchMe } from "./api/auth";
import { beamQueryOptions } from "./api/beams";
import { projectQueryOptions } from "./api/projects";
import { createQueryClient } from "./api/queryClient";
import { createAppRouter } from "./router";
import { editorRouteParams } from "./startEarly";

/**
 * Requests the first screen needs, started before the router loads the page's chunk so the two
 * run at the same time: the user always, and the beam and project when the URL opens the editor.
 * startEarly() has usually sent them already; request() then takes those answers.
 */
export function prefetchStartData(client: QueryClient, pathname: string): void {
  prefetchMe(client);
  const editor = editorRouteParams(pathname);
  if (editor) {
    void client.prefetchQuery(beamQueryOptions(editor.projectId, editor.beamId));
    void client.prefetchQuery(projectQueryOptions(editor.projectId));
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
