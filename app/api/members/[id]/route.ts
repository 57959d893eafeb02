import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { assertAllowed, canManageClub } from "@/lib/auth/permissions";
import { changeMemberRole, setMemberStatus } from "@/lib/data/member-admin";
import { lookUpBy } from "@/lib/http/look-up";
import { readJson, readParams, route } from "@/lib/http/route";
import { memberIdSchema, memberUpdateSchema } from "@/lib/validations/member-admin";

interface MemberContext {
  params: Promise<{ id: string }>;
}

/** Admins change another member's role or status: 200 with the member; 404 naming the id outside their club. */
export const PATCH = route<MemberContext>(async (request, context) => {
  const actor = await requireActor();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can change members.");
  const { id } = await readParams(context.params, memberIdSchema);
  const update = await readJson(request, memberUpdateSchema);
  const member = await lookUpBy("id", "member", () =>
    update.role ? changeMemberRole(actor, id, update.role) : setMemberStatus(actor, id, update.status!),
  );
  return NextResponse.json({ member });
});
