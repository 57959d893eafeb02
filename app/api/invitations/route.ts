import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { assertAllowed, canManageClub } from "@/lib/auth/permissions";
import { inviteMember } from "@/lib/data/users";
import { readJson, route } from "@/lib/http/route";
import { invitationSchema } from "@/lib/validations/members";

/** Admins invite a member by e-mail: 201 with the invitation id, and whether it replaced an open one. */
export const POST = route(async (request) => {
  const actor = await requireActor();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can invite members.");
  const input = await readJson(request, invitationSchema);
  const { invitationId, replaced } = await inviteMember(actor, input);
  return NextResponse.json({ invitationId, replaced }, { status: 201 });
});
