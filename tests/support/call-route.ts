import { NextRequest } from "next/server";
import { withRequest } from "@/tests/support/request-scope";
import { passwordSignIn, testOrigin } from "@/tests/support/auth-handler";

type Handler = (request: NextRequest, context: { params: Promise<Record<string, string | string[]>> }) => Promise<Response>;

export interface RouteCall {
  method: string;
  path: string;
  params?: Record<string, string | string[]>;
  cookie?: string;
  json?: unknown;
  body?: BodyInit;
  contentType?: string;
  headers?: Record<string, string>;
}

/** Calls a route handler directly, inside a request scope so `currentActor()` reads the cookie. */
export function callRoute(handler: unknown, call: RouteCall): Promise<Response> {
  const headers = new Headers(call.headers);
  if (call.cookie) headers.set("cookie", call.cookie);
  let body = call.body;
  if (call.json !== undefined) {
    headers.set("content-type", "application/json");
    body = JSON.stringify(call.json);
  } else if (call.contentType) headers.set("content-type", call.contentType);
  const request = new NextRequest(`${testOrigin}${call.path}`, { method: call.method, headers, body });
  return withRequest(request, () => (handler as Handler)(request, { params: Promise.resolve(call.params ?? {}) }));
}

let addressCounter = 0;

/** A real session cookie from the next-auth handler, each from its own address so no throttle is hit. */
export async function sessionCookieFor(email: string, password: string): Promise<string> {
  addressCounter += 1;
  const { response, cookie } = await passwordSignIn(email, password, {
    "x-forwarded-for": `198.18.${Math.floor(addressCounter / 250)}.${addressCounter % 250}`,
  });
  if (response.status !== 200) throw new Error(`Sign-in for ${email} failed with ${response.status}`);
  return cookie;
}

/** Runs work (a server action, currentActor) as the owner of the cookie. */
export function asCookie<T>(cookie: string | null, work: () => Promise<T>): Promise<T> {
  const request = new Request(`${testOrigin}/`, { headers: cookie ? { cookie } : {} });
  return withRequest(request, work);
}
