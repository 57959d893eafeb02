import "server-only";
import { NextRequest } from "next/server";
import { actorFromSessionCookies } from "@/lib/auth/session";
import type { Actor } from "@/lib/auth/permissions";

/**
 * For public route handlers that answer everyone but tailor the answer to a signed-in member: the actor
 * from the request's own session cookie (the same check as currentActor), or null. It reads only the
 * request, so it works wherever the handler is called, signed in or not.
 */
export function optionalActorFromRequest(request: Request): Promise<Actor | null> {
  // Headers only: building a NextRequest from the Request itself would take over its body.
  return actorFromSessionCookies(new NextRequest(request.url, { headers: request.headers }).cookies.getAll());
}
