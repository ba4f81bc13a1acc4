import { afterEach, describe, expect, it, vi } from "vitest";
import { fireEvent, screen, waitFor } from "@testing-library/react";
import { renderRoutes, renderWithProviders, stubFetch } from "../../test/renderWithProviders";
import { SignInForm, SignInPage } from "./SignInPage";

afterEach(() => {
  vi.unstubAllGlobals();
});

function fill(label: RegExp, value: string) {
  fireEvent.change(screen.getByLabelText(label), { target: { value } });
}

describe("SignInForm", () => {
  it("shows field errors without calling the server when the form is empty", async () => {
    const fetchSpy = vi.fn(stubFetch({}));
    vi.stubGlobal("fetch", fetchSpy);
    renderWithProviders(<SignInForm onSignedIn={() => undefined} />);

    fireEvent.click(screen.getByRole("button", { name: "Sign in" }));

    expect(await screen.findByText("Enter a valid e-mail address.")).toBeTruthy();
    expect(screen.getByText("Required.")).toBeTruthy();
    expect(screen.getByLabelText(/e-mail/i).getAttribute("aria-invalid")).toBe("true");
    expect(fetchSpy).not.toHaveBeenCalled();
  });

  it("shows the server's field error beside the field it names", async () => {
    vi.stubGlobal(
      "fetch",
      stubFetch({
        "POST /api/auth/sign-in": {
          status: 400,
          body: {
            error: {
              code: "invalid-request",
              message: "Invalid body",
              details: { issues: [{ path: "password", message: "too long for this server" }] },
            },
          },
        },
      }),
    );
    renderWithProviders(<SignInForm onSignedIn={() => undefined} />);
    fill(/e-mail/i, "engineer@example.test");
    fill(/password/i, "correct horse battery");
    fireEvent.click(screen.getByRole("button", { name: "Sign in" }));

    expect(await screen.findByText("Too long for this server")).toBeTruthy();
    // Every server issue has a field here, so no banner repeats it.
    expect(screen.queryByRole("alert")).toBeNull();
  });

  it("says plainly when the e-mail and password do not match", async () => {
    vi.stubGlobal(
      "fetch",
      stubFetch({
        "POST /api/auth/sign-in": {
          status: 401,
          body: { error: { code: "invalid-credentials", message: "Wrong e-mail or password" } },
        },
      }),
    );
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    fill(/e-mail/i, "engineer@example.test");
    fill(/password/i, "not the password");
    fireEvent.click(screen.getByRole("button", { name: "Sign in" }));

    const alert = await screen.findByRole("alert");
    expect(alert.textContent).toContain("do not match an account");
    expect(onSignedIn).not.toHaveBeenCalled();
  });
});

describe("SignInPage", () => {
  it("goes to the page named by ?next after signing in", async () => {
    const user = { id: "5b0c6f55-3c55-4c58-9a55-0c6a4f3c1d11", email: "lead@example.test", name: "Rui Okonkwo-Hale" };
    vi.stubGlobal(
      "fetch",
      stubFetch({
        "GET /api/me": { status: 401, body: { error: { code: "unauthenticated", message: "Sign in" } } },
        "POST /api/auth/sign-in": { status: 200, body: { user } },
      }),
    );
    const { router } = renderRoutes(
      [
        { path: "/sign-in", element: <SignInPage /> },
        { path: "/projects/p1", element: <p>project page</p> },
      ],
      "/sign-in?next=%2Fprojects%2Fp1",
    );
    fill(/e-mail/i, user.email);
    fill(/password/i, "a long enough phrase");
    fireEvent.click(await screen.findByRole("button", { name: "Sign in" }));

    await waitFor(() => expect(router.state.location.pathname).toBe("/projects/p1"));
  });
});
