import { afterEach, describe, expect, it, vi } from "vitest";
import { createQueryClient } from "./api/queryClient";
import { prefetchStartData } from "./App";

afterEach(() => vi.unstubAllGlobals());

function recordRequests(): string[] {
  const urls: string[] = [];
  vi.stubGlobal("fetch", (input: string) => {
    urls.push(input);
    return Promise.resolve(new Response(JSON.stringify({}), { status: 500, headers: { "Content-Type": "application/json" } }));
  });
  return urls;
}

describe("prefetchStartData", () => {
  it("asks for the user, the beam and the project at once when the URL opens the editor", () => {
    const urls = recordRequests();
    prefetchStartData(createQueryClient(), "/projects/p1/beams/b1");
    // all three leave before any answer: nothing waits for the editor chunk or for /api/me
    expect(urls.sort()).toEqual(["/api/me", "/api/projects/p1", "/api/projects/p1/beams/b1"]);
  });

  it.each(["/projects", "/sign-in", "/projects/p1/beams/b1/revisions"])("asks only for the user on %s", (path) => {
    const urls = recordRequests();
    prefetchStartData(createQueryClient(), path);
    expect(urls).toEqual(["/api/me"]);
  });
});
