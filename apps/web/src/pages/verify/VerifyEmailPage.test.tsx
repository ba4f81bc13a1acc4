import { afterEach, describe, expect, it, vi } from "vitest";
import { fireEvent, screen, waitFor } from "@testing-library/react";
import { renderRoutes, stubFetch } from "../../test/renderWithProviders";
import { VerifyEmailBanner } from "./VerifyEmailBanner";
import { VerifyEmailPage } from "./VerifyEmailPage";

afterEach(() => {
  vi.unstubAllGlobals();
});

const unverified = { id: "7d1c2b9e-4f7a-4c1e-9b7e-2a6f1e3d5c40", email: "kofi@example.test", name: "Kofi Lindqvist", emailVerified: false };
const signedOut = { status: 401, body: { error: { code: "unauthenticated", message: "sign in first" } } };

function renderPage(path: string) {
  return renderRoutes([{ path: "/verify-email", element: <VerifyEmailPage /> }], path);
}

/** The bodies the page posted to the verify route. */
function postedTokens(fetchSpy: ReturnType<typeof vi.fn>): unknown[] {
  return fetchSpy.mock.calls
    .filter(([url, init]) => url === "/api/auth/verify-email" && (init as RequestInit | undefined)?.method === "POST")
    .map(([, init]) => JSON.parse(String((init as RequestInit).body)));
}

describe("VerifyEmailPage", () => {
  it("posts the link's token once and says the invitations are open", async () => {
    const fetchSpy = vi.fn(
      stubFetch({
        "GET /api/me": signedOut,
        "POST /api/auth/verify-email": { status: 200, body: { email: "kofi@example.test" } },
      }),
    );
    vi.stubGlobal("fetch", fetchSpy);
    renderPage("/verify-email?token=abc234");

    expect(await screen.findByText("Your e-mail is confirmed")).toBeTruthy();
    expect(screen.getByText(/kofi@example\.test is yours/)).toBeTruthy();
    expect(postedTokens(fetchSpy)).toEqual([{ token: "abc234" }]);
    expect(screen.getByRole("link", { name: "Sign in" })).toBeTruthy();
  });

  it("says an expired link has expired and offers a new one to the signed-in user", async () => {
    const fetchSpy = vi.fn(
      stubFetch({
        "GET /api/me": { status: 200, body: { user: unverified } },
        "POST /api/auth/verify-email": { status: 422, body: { error: { code: "verification-token-expired", message: "expired" } } },
        "POST /api/auth/verify-email/resend": { status: 204 },
      }),
    );
    vi.stubGlobal("fetch", fetchSpy);
    renderPage("/verify-email?token=old");

    const alert = await screen.findByRole("alert");
    expect(alert.textContent).toContain("This link has expired");
    fireEvent.click(await screen.findByRole("button", { name: "Send the link again" }));
    expect(await screen.findByText(/Sent\. Use the newest link/)).toBeTruthy();
  });

  it("says a used or unknown link is not valid", async () => {
    vi.stubGlobal(
      "fetch",
      stubFetch({
        "GET /api/me": signedOut,
        "POST /api/auth/verify-email": { status: 400, body: { error: { code: "verification-token-invalid", message: "not valid" } } },
      }),
    );
    renderPage("/verify-email?token=used");
    expect((await screen.findByRole("alert")).textContent).toContain("not valid, or it was already used");
    expect(screen.queryByRole("button", { name: "Send the link again" })).toBeNull();
  });

  it("sends nothing for a link without a token", async () => {
    const fetchSpy = vi.fn(stubFetch({ "GET /api/me": signedOut }));
    vi.stubGlobal("fetch", fetchSpy);
    renderPage("/verify-email");
    expect((await screen.findByRole("alert")).textContent).toContain("Open the link from the e-mail again");
    await waitFor(() => expect(fetchSpy).toHaveBeenCalled());
    expect(postedTokens(fetchSpy)).toEqual([]);
  });
});

describe("VerifyEmailBanner", () => {
  it("asks an unverified user to check their e-mail", async () => {
    vi.stubGlobal("fetch", stubFetch({ "GET /api/me": { status: 200, body: { user: unverified } } }));
    renderRoutes([{ path: "/", element: <VerifyEmailBanner /> }], "/");
    expect(await screen.findByText("Check your e-mail to join the projects you were invited to")).toBeTruthy();
    expect(screen.getByText(/We sent a link to kofi@example\.test/)).toBeTruthy();
  });

  it("shows nothing to a verified user", async () => {
    const fetchSpy = vi.fn(stubFetch({ "GET /api/me": { status: 200, body: { user: { ...unverified, emailVerified: true } } } }));
    vi.stubGlobal("fetch", fetchSpy);
    const { container } = renderRoutes([{ path: "/", element: <VerifyEmailBanner /> }], "/");
    await waitFor(() => expect(fetchSpy).toHaveBeenCalled());
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(container.textContent).toBe("");
  });
});
