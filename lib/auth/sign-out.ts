import { fetchCsrfToken } from "@/lib/auth/csrf-token";

/**
 * Ends the session from the browser through next-auth's own sign-out endpoint (so `events.signOut` runs
 * and the token version moves on), the same two requests `signOut` from next-auth/react makes. Written
 * out here because the sign-out button sits in the root layout: importing next-auth/react there put
 * about 12 KB (gz) of client code on every page.
 */
export async function endSession(callbackUrl: string): Promise<void> {
  const csrfToken = await fetchCsrfToken();
  if (!csrfToken) throw new Error("GET /api/auth/csrf gave no csrfToken");
  const response = await fetch("/api/auth/signout", {
    method: "POST",
    headers: { "Content-Type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams({ csrfToken, callbackUrl, json: "true" }),
  });
  if (!response.ok) throw new Error(`POST /api/auth/signout answered ${response.status}`);
}
