import { AsyncLocalStorage } from "node:async_hooks";
import Module, { createRequire } from "node:module";
import path from "node:path";

/**
 * Lets integration tests call route handlers, server actions and `currentActor()` directly. Next's
 * `headers()` and `cookies()` only work inside a request Next itself is serving; here they read the
 * request the test passed to `withRequest()`. Everything below them (next-auth's real JWT decoding,
 * the database check of the token version, permissions) runs unchanged.
 */
const scope = new AsyncLocalStorage<Headers>();

function currentHeaders(): Headers {
  const headers = scope.getStore();
  if (!headers) throw new Error("No request in scope: wrap the call in withRequest(request, …).");
  return headers;
}

function cookieStore(headers: Headers) {
  const cookies = (headers.get("cookie") ?? "")
    .split(";")
    .map((part) => part.trim())
    .filter(Boolean)
    .map((part) => {
      const at = part.indexOf("=");
      return { name: part.slice(0, at), value: decodeURIComponent(part.slice(at + 1)) };
    });
  return {
    getAll: () => cookies,
    get: (name: string) => cookies.find((cookie) => cookie.name === name),
    has: (name: string) => cookies.some((cookie) => cookie.name === name),
  };
}

/** Stands in for the `next/headers` module. */
export const nextHeadersStandIn = {
  headers: async () => currentHeaders(),
  cookies: async () => cookieStore(currentHeaders()),
  draftMode: async () => ({ isEnabled: false }),
};

/** Runs the work as if Next were serving this request. */
export function withRequest<T>(request: Request, work: () => Promise<T>): Promise<T> {
  return scope.run(request.headers, work);
}

/**
 * next-auth `require()`s next/headers natively at request time, out of reach of `vi.mock`; this puts
 * the stand-in into Node's module cache where that require looks. Call once per test file (with
 * `vi.mock("next/headers", …)` for the project's own imports).
 */
export function installNextHeadersStandIn(): void {
  const require = createRequire(import.meta.url);
  const nextAuthDir = path.dirname(require.resolve("next-auth"));
  const resolved = require.resolve("next/headers", { paths: [nextAuthDir] });
  const standIn = new Module(resolved);
  standIn.filename = resolved;
  standIn.loaded = true;
  standIn.exports = nextHeadersStandIn;
  require.cache[resolved] = standIn;
}
