import { describe, expect, it } from "vitest";
import { ApiError } from "./client";
import { createQueryClient, shouldRetry } from "./queryClient";
import { queryKeys } from "./queryKeys";

const apiError = (status: number, code: string) => new ApiError({ code, status, message: code });

describe("shouldRetry", () => {
  it.each([
    [apiError(404, "not-found"), 0, false],
    [apiError(401, "unauthenticated"), 0, false],
    [apiError(503, "database-unavailable"), 0, true],
    [apiError(503, "database-unavailable"), 2, false],
    [apiError(0, "network-error"), 1, true],
    [new Error("boom"), 0, true],
  ])("%s after %i failures retries: %s", (error, failures, expected) => {
    expect(shouldRetry(failures, error)).toBe(expected);
  });
});

describe("createQueryClient", () => {
  it("forgets the signed-in user when any query answers unauthenticated", async () => {
    const client = createQueryClient();
    client.setQueryData(queryKeys.me, { id: "u1", email: "a@example.test", name: "A" });
    await client
      .fetchQuery({
        queryKey: queryKeys.projects,
        queryFn: () => Promise.reject(apiError(401, "unauthenticated")),
        retry: false,
      })
      .catch(() => undefined);
    expect(client.getQueryData(queryKeys.me)).toBeNull();
  });
});
