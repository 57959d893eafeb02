/**
 * next-auth's CSRF token, which every POST to `/api/auth/*` must carry; null when the server answered
 * without one. A request that cannot leave rejects, as `fetch` does.
 */
export async function fetchCsrfToken(): Promise<string | null> {
  const response = await fetch("/api/auth/csrf", { cache: "no-store" });
  if (!response.ok) return null;
  const { csrfToken } = (await response.json().catch(() => ({}))) as { csrfToken?: unknown };
  return typeof csrfToken === "string" && csrfToken !== "" ? csrfToken : null;
}
