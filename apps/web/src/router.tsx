import { createBrowserRouter, Navigate, Outlet, type RouteObject } from "react-router";
import { FullPageLoading } from "./components/FullPageLoading";
import { RequireAuth } from "./components/RequireAuth";
import { RouteErrorPage } from "./pages/RouteErrorPage";

/*
 * Every page is its own chunk (route `lazy`), so the sign-in page never downloads the editor,
 * Konva or the solver. Only the shell (header, guard, query client) is in the entry chunk.
 */
export const routes: RouteObject[] = [
  {
    element: <Outlet />,
    HydrateFallback: FullPageLoading,
    errorElement: <RouteErrorPage />,
    children: [
      {
        path: "sign-in",
        lazy: async () => ({ Component: (await import("./pages/auth/SignInPage")).SignInPage }),
      },
      {
        path: "sign-up",
        lazy: async () => ({ Component: (await import("./pages/auth/SignUpPage")).SignUpPage }),
      },
      {
        path: "verify-email",
        lazy: async () => ({ Component: (await import("./pages/verify/VerifyEmailPage")).VerifyEmailPage }),
      },
      {
        element: <RequireAuth />,
        children: [
          { index: true, element: <Navigate to="/projects" replace /> },
          {
            path: "projects",
            lazy: async () => ({ Component: (await import("./pages/projects/ProjectsPage")).ProjectsPage }),
          },
          {
            path: "projects/:projectId",
            lazy: async () => ({ Component: (await import("./pages/project/ProjectPage")).ProjectPage }),
          },
          {
            path: "projects/:projectId/members",
            lazy: async () => ({ Component: (await import("./pages/members/MembersPage")).MembersPage }),
          },
          {
            path: "projects/:projectId/beams/:beamId/revisions",
            lazy: async () => ({
              Component: (await import("./pages/revisions/BeamRevisionsPage")).BeamRevisionsPage,
            }),
          },
          {
            path: "projects/:projectId/beams/:beamId/revisions/:version",
            lazy: async () => ({ Component: (await import("./pages/revisions/RevisionPage")).RevisionPage }),
          },
          {
            path: "projects/:projectId/beams/:beamId/compare",
            lazy: async () => ({
              Component: (await import("./pages/revisions/CompareRevisionsPage")).CompareRevisionsPage,
            }),
          },
          {
            path: "outbox",
            lazy: async () => ({ Component: (await import("./pages/outbox/OutboxPage")).OutboxPage }),
          },
          {
            path: "projects/:projectId/beams/:beamId/design",
            lazy: async () => ({ Component: (await import("./design/DesignPage")).DesignPage }),
          },
          {
            path: "projects/:projectId/beams/:beamId",
            lazy: async () => ({ Component: (await import("./editor/BeamEditorPage")).BeamEditorPage }),
          },
          {
            path: "*",
            lazy: async () => ({ Component: (await import("./pages/NotFoundPage")).NotFoundPage }),
          },
        ],
      },
    ],
  },
];

export function createAppRouter() {
  return createBrowserRouter(routes);
}
