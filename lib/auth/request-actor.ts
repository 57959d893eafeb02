import "server-only";
import { NextRequest } from "next/server";
import { getToken } from "next-auth/jwt";
import { authOptions } from "@/lib/auth/options";
import { sessionUserById } from "@/lib/data/users";
import type { Actor } from "@/lib/auth/permissions";

/**
 * For public route handlers that answer everyone but tailor the answer to a signed-in member: the actor
 * from the request's session cookie (checked against the database like currentActor), or null. It reads
 * only the request, so it works wherever the handler is called, signed in or not.
 */
export async function optionalActorFromRequest(request: Request): Promise<Actor | null> {
  const { secret } = authOptions();
  // Headers only: building a NextRequest from the Request itself would take over its body.
  const token = await getToken({ req: new NextRequest(request.url, { headers: request.headers }), secret });
  if (typeof token?.uid !== "number" || typeof token.tokenVersion !== "number") return null;
  const user = await sessionUserById(token.uid, token.tokenVersion);
  if (!user) return null;
  return { id: user.id, clubId: user.clubId, role: user.role, name: user.name, email: user.email };
}
