import { NextResponse, type NextRequest } from "next/server";
import { getToken } from "next-auth/jwt";
import { areaForPath, canEnterArea } from "@/lib/auth/permissions";
import { authSecret, ensureAuthUrl } from "@/lib/env";
import { actionRequestProblem, isActionRequest } from "@/lib/http/action-request";
import { assertSameOrigin, errorResponse } from "@/lib/http/route";

/**
 * Two edge checks, neither of them the guard (pages, actions and route handlers check the session
 * again against the database):
 * - a server-action request from another site, or one Next could not decode, is refused with a 4xx
 *   before Next tries (it would answer 500); see lib/http/action-request.ts;
 * - anonymous visitors to a members' page go to sign-in.
 */
export async function proxy(request: NextRequest) {
  if (isActionRequest(request)) {
    try {
      assertSameOrigin(request);
    } catch (error) {
      return errorResponse(error);
    }
    const problem = await actionRequestProblem(request);
    if (problem) return errorResponse(problem);
  }
  const { pathname, search } = request.nextUrl;
  const area = areaForPath(pathname);
  if (area === "public") return NextResponse.next();
  // getToken picks the cookie name (__Secure- or not) from NEXTAUTH_URL: set it before the first
  // next-auth call of this process, or an https deployment reads no cookie right after a restart.
  ensureAuthUrl();
  const token = await getToken({ req: request, secret: authSecret() });
  if (!token || !canEnterArea(token.role ?? null, "member")) {
    const signIn = new URL("/sign-in", request.url);
    signIn.searchParams.set("callbackUrl", `${pathname}${search}`);
    return NextResponse.redirect(signIn);
  }
  return NextResponse.next();
}

// The last two: every page path a server action can be posted to (any page: Next decodes a multipart
// POST anywhere), but only requests that carry an action, so page loads and static files skip the proxy.
// (Next reads the matcher without running this file: the sources must be literal strings.)
export const config = {
  matcher: [
    "/learn/:path*",
    "/roster/:path*",
    "/club/:path*",
    "/rig/:path*",
    "/account/:path*",
    { source: "/((?!api/|_next/).*)", has: [{ type: "header", key: "next-action" }] },
    { source: "/((?!api/|_next/).*)", has: [{ type: "header", key: "content-type", value: "multipart/form-data.*" }] },
  ],
};
