import type { ReactElement } from "react";
import { QueryClientProvider } from "@tanstack/react-query";
import { render } from "@testing-library/react";
import { createMemoryRouter, RouterProvider, type RouteObject } from "react-router";
import { createQueryClient } from "../api/queryClient";

/** Renders routes in memory with a fresh query client, as the app does, minus the browser URL. */
export function renderRoutes(routes: RouteObject[], initialPath: string) {
  const queryClient = createQueryClient();
  // Same retry policy as the app, without the back-off wait.
  const defaults = queryClient.getDefaultOptions();
  queryClient.setDefaultOptions({ ...defaults, queries: { ...defaults.queries, retryDelay: 0 } });
  const router = createMemoryRouter(routes, { initialEntries: [initialPath] });
  const view = render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { ...view, router, queryClient };
}

export function renderWithProviders(ui: ReactElement, path = "/") {
  return renderRoutes([{ path: "*", element: ui }], path);
}

/** A fetch stub answering by "METHOD path"; unknown calls fail the test loudly. */
export function stubFetch(answers: Record<string, { status: number; body?: unknown }>) {
  return async (input: RequestInfo | URL, init?: RequestInit): Promise<Response> => {
    const url = typeof input === "string" ? input : input instanceof URL ? input.pathname : input.url;
    const key = `${init?.method ?? "GET"} ${url}`;
    const answer = answers[key];
    if (answer === undefined) throw new Error(`unexpected request ${key}`);
    return new Response(answer.body === undefined ? null : JSON.stringify(answer.body), {
      status: answer.status,
      headers: { "Content-Type": "application/json" },
    });
  };
}
