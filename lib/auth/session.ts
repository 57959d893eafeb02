import "server-only";
import { cache } from "react";
import { getServerSession } from "next-auth";
import { forbidden, redirect } from "next/navigation";
import { authOptions } from "@/lib/auth/options";
import { sessionUserById } from "@/lib/data/users";
import { assertSignedIn, canEnterArea, type Actor, type Area } from "@/lib/auth/permissions";

/**
 * The signed-in user for this request, checked against the database every time: a deactivated user or
 * one whose role changed (token version bumped) is treated as signed out on their next request.
 */
export const currentActor = cache(async (): Promise<Actor | null> => {
  const session = await getServerSession(authOptions());
  const claims = session?.user;
  if (!claims?.id || typeof claims.tokenVersion !== "number") return null;
  const user = await sessionUserById(claims.id, claims.tokenVersion);
  if (!user) return null;
  return { id: user.id, clubId: user.clubId, role: user.role, name: user.name, email: user.email };
});

/** For route handlers and actions: the actor, or a 401. */
export async function requireActor(): Promise<Actor> {
  const actor = await currentActor();
  assertSignedIn(actor);
  return actor;
}

/** For pages: sends anonymous visitors to sign-in and answers 403 to a role that may not enter. */
export async function requirePageActor(area: Area, returnTo: string): Promise<Actor> {
  const actor = await currentActor();
  if (!actor) redirect(`/sign-in?callbackUrl=${encodeURIComponent(returnTo)}`);
  if (!canEnterArea(actor.role, area)) forbidden();
  return actor;
}
