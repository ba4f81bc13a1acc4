import { MutationCache, QueryCache, QueryClient } from "@tanstack/react-query";
import { isApiError } from "./client";
import { queryKeys } from "./queryKeys";

/** Client errors (4xx) are answers, not glitches: retrying them only delays the message. */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/**
 * A 401 from any call means the session ended (expired or signed out elsewhere): forget the
 * user so the auth guard sends them to sign-in instead of showing a broken page.
 */
export function createQueryClient(): QueryClient {
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      onError: (error, query) => {
        if (isApiError(error) && error.code === "unauthenticated" && query.queryKey[0] !== "me") {
          client.setQueryData(queryKeys.me, null);
        }
      },
    }),
    mutationCache: new MutationCache({
      onError: (error) => {
        if (isApiError(error) && error.code === "unauthenticated") {
          client.setQueryData(queryKeys.me, null);
        }
      },
    }),
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 15_000, refetchOnWindowFocus: true },
      mutations: { retry: false },
    },
  });
  return client;
}
