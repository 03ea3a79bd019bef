/**
 * The in-app path to return to after signing in, taken from `?next=`. Only same-site paths
 * are accepted ("/groups/…"), never "//other.site" or "https://…", so the link cannot send
 * someone elsewhere.
 */
export function safeNext(search: URLSearchParams | string, fallback = "/"): string {
  const params = typeof search === "string" ? new URLSearchParams(search) : search;
  const next = params.get("next");
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return fallback;
  return next;
}

/**
 * "/sign-in?next=%2Fgroups%2F…" for a path to come back to, optionally carrying the e-mail
 * address to prefill (an invitation names it).
 */
export function withNext(path: string, next: string, email?: string | null): string {
  const params = new URLSearchParams();
  if (next && next !== "/") params.set("next", next);
  if (email) params.set("email", email);
  const query = params.toString();
  return query ? `${path}?${query}` : path;
}
