/** Sessions for the benchmark, obtained the way a browser gets one: next-auth's credentials flow. */

function cookiePairs(response: Response): string[] {
  return response.headers.getSetCookie().map((line) => line.split(";")[0]!.trim());
}

/**
 * Signs in with e-mail and password: GET /api/auth/csrf, then POST /api/auth/callback/password with the
 * CSRF token and json=true. Returns the Cookie header value that carries the session.
 */
export async function signIn(baseUrl: string, email: string, password: string): Promise<string> {
  const csrfResponse = await fetch(`${baseUrl}/api/auth/csrf`);
  if (!csrfResponse.ok) throw new Error(`GET /api/auth/csrf answered ${csrfResponse.status}`);
  const { csrfToken } = (await csrfResponse.json()) as { csrfToken?: string };
  if (!csrfToken) throw new Error("GET /api/auth/csrf returned no csrfToken");
  const csrfCookies = cookiePairs(csrfResponse);

  const response = await fetch(`${baseUrl}/api/auth/callback/password`, {
    method: "POST",
    redirect: "manual",
    headers: { "Content-Type": "application/x-www-form-urlencoded", Cookie: csrfCookies.join("; ") },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  const session = cookiePairs(response).find((pair) => /^(__Secure-)?next-auth\.session-token=/.test(pair));
  if (!session) throw new Error(`sign-in as ${email} gave no session cookie (status ${response.status})`);
  return session;
}
