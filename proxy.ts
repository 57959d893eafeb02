import { NextResponse, type NextRequest } from "next/server";
import { getToken } from "next-auth/jwt";
import { areaForPath, canEnterArea } from "@/lib/auth/permissions";
import { authSecret, ensureAuthUrl } from "@/lib/env";

/**
 * An optimistic check only: anonymous visitors to a members' page go to sign-in. The pages, actions and
 * route handlers check the session again against the database; this is not the guard.
 */
export async function proxy(request: NextRequest) {
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

export const config = {
  matcher: ["/learn/:path*", "/roster/:path*", "/club/:path*", "/rig/:path*", "/account/:path*"],
};
