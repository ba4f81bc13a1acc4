import { afterEach, describe, expect, it, vi } from "vitest";
import { screen, waitFor } from "@testing-library/react";
import { renderRoutes, stubFetch } from "../test/renderWithProviders";
import { cautionText } from "./Caution";
import { RequireAuth } from "./RequireAuth";

afterEach(() => {
  vi.unstubAllGlobals();
});

const routes = [
  { path: "/sign-in", element: <p>sign-in page</p> },
  { element: <RequireAuth />, children: [{ path: "/projects", element: <p>projects page</p> }] },
];

describe("RequireAuth", () => {
  it("sends a visitor without a session to sign-in, remembering where they were going", async () => {
    vi.stubGlobal(
      "fetch",
      stubFetch({ "GET /api/me": { status: 401, body: { error: { code: "unauthenticated", message: "Sign in" } } } }),
    );
    const { router } = renderRoutes(routes, "/projects");
    await waitFor(() => expect(router.state.location.pathname).toBe("/sign-in"));
    expect(router.state.location.search).toBe("?next=%2Fprojects");
  });

  it("shows the page inside the shell, with the user's name and the caution, when signed in", async () => {
    vi.stubGlobal(
      "fetch",
      stubFetch({
        "GET /api/me": {
          status: 200,
          body: { user: { id: "0e6b1c7a-2f4e-4d7b-8f4e-7c1d2a3b4c5d", email: "ines@example.test", name: "Ines Varga" } },
        },
      }),
    );
    renderRoutes(routes, "/projects");
    expect(await screen.findByText("projects page")).toBeTruthy();
    expect(screen.getByText("Spanwright")).toBeTruthy();
    expect(screen.getByText("Ines Varga")).toBeTruthy();
    expect(screen.getByText(cautionText)).toBeTruthy();
  });
});
