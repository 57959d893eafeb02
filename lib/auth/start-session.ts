import { fetchCsrfToken } from "@/lib/auth/csrf-token";

/** How a sign-in from the browser ended. */
export type SessionStart = { ok: true } | { ok: false; reason: "refused" | "throttled" | "unreached" };

/**
 * Signs in from the browser with one of Slipway's next-auth Credentials providers: the two requests
 * next-auth/react's `signIn(provider, { redirect: false })` makes (its CSRF token, then the provider's
 * callback with `json=true`), read the same way. Written out because `signIn` that cannot reach the
 * server does not answer: it sends the whole tab to next-auth's error page, which offline is the
 * browser's own "no internet" page, and the form and what was typed are gone.
 */
export async function startSession(
  provider: "password" | "link",
  fields: Record<string, string>,
  // What next-auth's client sends by default; Slipway's forms navigate themselves once signed in.
  callbackUrl: string = window.location.href,
): Promise<SessionStart> {
  let response: Response;
  try {
    const csrfToken = await fetchCsrfToken();
    if (!csrfToken) return { ok: false, reason: "unreached" };
    response = await fetch(`/api/auth/callback/${provider}`, {
      method: "POST",
      headers: { "Content-Type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({ ...fields, csrfToken, callbackUrl, json: "true" }),
    });
  } catch {
    return { ok: false, reason: "unreached" };
  }
  if (response.status === 429) return { ok: false, reason: "throttled" };
  if (response.status >= 500) return { ok: false, reason: "unreached" };
  const { url } = (await response.json().catch(() => ({}))) as { url?: string };
  // next-auth answers a refusal with 401 or with its error page's address (`?error=...`) in `url`.
  const error = url ? new URL(url, window.location.origin).searchParams.get("error") : "no-answer";
  if (response.ok && !error) return { ok: true };
  return { ok: false, reason: error === "throttled" ? "throttled" : "refused" };
}
