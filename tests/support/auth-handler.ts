import { NextRequest } from "next/server";
import { withRequest } from "@/tests/support/request-scope";

/** The origin next-auth builds its URLs from in tests (ensureAuthUrl's default). */
export const testOrigin = "http://127.0.0.1:3000";

type AuthRoute = typeof import("@/app/api/auth/[...nextauth]/route");

async function authRoute(): Promise<AuthRoute> {
  return import("@/app/api/auth/[...nextauth]/route");
}

/** `name=value` pairs from a response's Set-Cookie headers, merged over the ones sent. */
export function mergeCookies(sent: string, response: Response): string {
  const jar = new Map<string, string>();
  for (const pair of sent
    .split(";")
    .map((part) => part.trim())
    .filter(Boolean)) {
    const at = pair.indexOf("=");
    jar.set(pair.slice(0, at), pair.slice(at + 1));
  }
  for (const line of response.headers.getSetCookie()) {
    const pair = line.split(";")[0]!;
    const at = pair.indexOf("=");
    const value = pair.slice(at + 1);
    if (value) jar.set(pair.slice(0, at), value);
    else jar.delete(pair.slice(0, at));
  }
  return [...jar].map(([name, value]) => `${name}=${value}`).join("; ");
}

export interface AuthCall {
  response: Response;
  cookie: string;
}

/** Calls the next-auth route handler directly, as the browser's next-auth client would. */
export async function callAuth(
  method: "GET" | "POST",
  segments: string[],
  options: { cookie?: string; form?: Record<string, string>; headers?: Record<string, string> } = {},
): Promise<AuthCall> {
  const route = await authRoute();
  const headers = new Headers(options.headers);
  if (options.cookie) headers.set("cookie", options.cookie);
  let body: string | undefined;
  if (options.form) {
    headers.set("content-type", "application/x-www-form-urlencoded");
    body = new URLSearchParams(options.form).toString();
  }
  const request = new NextRequest(`${testOrigin}/api/auth/${segments.join("/")}`, { method, headers, body });
  const context = { params: Promise.resolve({ nextauth: segments }) };
  const response = await withRequest(request, () => (method === "GET" ? route.GET(request, context) : route.POST(request, context)));
  return { response, cookie: mergeCookies(options.cookie ?? "", response) };
}

/** The CSRF token and cookie next-auth wants with every POST. */
export async function csrf(headers?: Record<string, string>): Promise<{ csrfToken: string; cookie: string }> {
  const { response, cookie } = await callAuth("GET", ["csrf"], { headers });
  const { csrfToken } = (await response.json()) as { csrfToken: string };
  return { csrfToken, cookie };
}

/** A password sign-in through the real handler; the cookie holds the session on success. */
export async function passwordSignIn(email: string, password: string, headers?: Record<string, string>): Promise<AuthCall> {
  const token = await csrf(headers);
  return callAuth("POST", ["callback", "password"], {
    cookie: token.cookie,
    headers,
    form: { email, password, csrfToken: token.csrfToken, callbackUrl: `${testOrigin}/home`, json: "true" },
  });
}

/** Signs out through the real handler (next-auth's events.signOut runs). */
export async function signOutThroughHandler(cookie: string): Promise<AuthCall> {
  const { response } = await callAuth("GET", ["csrf"], { cookie });
  const { csrfToken } = (await response.json()) as { csrfToken: string };
  return callAuth("POST", ["signout"], {
    cookie: mergeCookies(cookie, response),
    form: { csrfToken, callbackUrl: `${testOrigin}/`, json: "true" },
  });
}
