import { afterEach, describe, expect, it, vi } from "vitest";
import { screen, waitFor } from "@testing-library/react";
import { renderWithProviders, stubFetch } from "../test/renderWithProviders";
import { OutboxLink } from "./OutboxLink";

afterEach(() => {
  vi.unstubAllGlobals();
});

const classes = () => "";

describe("OutboxLink", () => {
  it("appears when the API serves an outbox", async () => {
    vi.stubGlobal("fetch", stubFetch({ "GET /api/outbox": { status: 200, body: { messages: [] } } }));
    renderWithProviders(<OutboxLink className={classes} />);
    expect((await screen.findByRole("link", { name: "Outbox" })).getAttribute("href")).toBe("/outbox");
  });

  it.each([
    [404, "not-found"],
    [403, "forbidden"],
  ])("stays hidden when the API answers %d", async (status, code) => {
    const fetchStub = vi.fn(stubFetch({ "GET /api/outbox": { status, body: { error: { code, message: code } } } }));
    vi.stubGlobal("fetch", fetchStub);
    renderWithProviders(<OutboxLink className={classes} />);
    await waitFor(() => expect(fetchStub).toHaveBeenCalled());
    // Give the answer time to land; a 4xx is not retried, so one call settles it.
    await new Promise((r) => setTimeout(r, 20));
    expect(screen.queryByRole("link", { name: "Outbox" })).toBeNull();
    expect(fetchStub).toHaveBeenCalledTimes(1);
  });
});
