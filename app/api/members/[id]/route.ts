import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { assertAllowed, canManageClub } from "@/lib/auth/permissions";
import { changeMemberRole, setMemberStatus } from "@/lib/data/member-admin";
import { readJson, route } from "@/lib/http/route";
import { memberIdSchema, memberUpdateSchema } from "@/lib/validations/member-admin";
import { validationErrorFrom } from "@/lib/validations/issues";

interface MemberContext {
  params: Promise<{ id: string }>;
}

/** Admins change another member's role or status: 200 with the member; 404 outside their club. */
export const PATCH = route<MemberContext>(async (request, context) => {
  const actor = await requireActor();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can change members.");
  const params = memberIdSchema.safeParse(await context.params);
  if (!params.success) throw validationErrorFrom(params.error);
  const update = await readJson(request, memberUpdateSchema);
  const member = update.role
    ? await changeMemberRole(actor, params.data.id, update.role)
    : await setMemberStatus(actor, params.data.id, update.status!);
  return NextResponse.json({ member });
});
