import { useMutation, useQuery, useQueryClient, type QueryClient } from "@tanstack/react-query";
import type { SignInRequest, SignUpRequest, User } from "@spanwright/contracts";
import { routePath } from "@spanwright/contracts/routes";
import { isApiError, request } from "./client";
import { parseWith } from "./schemas";
import { queryKeys } from "./queryKeys";

/** The signed-in user, or null when there is no session (401 is an answer here, not an error). */
export async function fetchMe(signal?: AbortSignal): Promise<User | null> {
  try {
    const body = await request(routePath("me"), { signal, parse: parseWith("meResponseSchema") });
    return body.user;
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

const ME_STALE_MS = 60_000;

export function useMe() {
  return useQuery({
    queryKey: queryKeys.me,
    queryFn: ({ signal }) => fetchMe(signal),
    staleTime: ME_STALE_MS,
  });
}

/**
 * Starts GET /api/me at app start, so it runs while the router downloads the page's chunk instead
 * of after it (the auth guard then finds the answer in the cache). Errors stay in the query.
 */
export function prefetchMe(queryClient: QueryClient): void {
  void queryClient.prefetchQuery({ queryKey: queryKeys.me, queryFn: ({ signal }) => fetchMe(signal), staleTime: ME_STALE_MS });
}

/** Sign-in and sign-up answer alike: the session cookie is set and the body carries the user. */
function useSessionStart<Input>(route: "signIn" | "signUp") {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Input) =>
      request(routePath(route), {
        method: "POST",
        body: input,
        parse: parseWith("meResponseSchema"),
      }),
    onSuccess: (body) => {
      // A different user may sign in on the same tab: drop everything cached for the last one.
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== "me" });
      queryClient.setQueryData(queryKeys.me, body.user);
    },
  });
}

export function useSignIn() {
  return useSessionStart<SignInRequest>("signIn");
}

export function useSignUp() {
  return useSessionStart<SignUpRequest>("signUp");
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => request(routePath("signOut"), { method: "POST" }),
    onSuccess: () => {
      queryClient.clear();
      queryClient.setQueryData(queryKeys.me, null);
    },
  });
}

/**
 * Follows the link of the verification e-mail. The user (if this browser is theirs) and their
 * project list change, so both are fetched again.
 */
export function useVerifyEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (token: string) =>
      request(routePath("verifyEmail"), {
        method: "POST",
        body: { token },
        parse: parseWith("verifyEmailResponseSchema"),
      }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: queryKeys.me });
      void queryClient.invalidateQueries({ queryKey: queryKeys.projects });
    },
  });
}

/** Asks for a new verification link for the signed-in user's address. */
export function useResendVerification() {
  return useMutation({
    mutationFn: () => request(routePath("resendVerification"), { method: "POST" }),
  });
}
