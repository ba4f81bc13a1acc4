/**
 * Where to go after sign-in. Only same-site paths are allowed: "//host" and "/\host" are
 * protocol-relative URLs in browsers and would turn the sign-in page into an open redirect.
 */
export function safeNextPath(next: string | null, fallback = "/projects"): string {
  if (next === null || next === "") return fallback;
  if (!next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return fallback;
  if (next.startsWith("/sign-in") || next.startsWith("/sign-up")) return fallback;
  return next;
}
