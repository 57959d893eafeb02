"use server";

import { revalidatePath } from "next/cache";
import { assertMayManageClub } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { inviteMember } from "@/lib/data/users";
import { invitationSchema } from "@/lib/validations/members";
import { parseActionInput } from "@/lib/validations/issues";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";

/** An admin invites a member; the invitation e-mail goes out at once. */
export async function inviteMemberAction(input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    assertMayManageClub(actor);
    const parsed = parseActionInput(invitationSchema, input);
    if (!parsed.success) return { ok: false, message: "Check the highlighted fields.", fieldErrors: parsed.fieldErrors };
    const { replaced } = await inviteMember(actor, parsed.data);
    revalidatePath("/club");
    const earlier = replaced ? " The earlier invitation to this address no longer works." : "";
    return { ok: true, message: `Invitation sent to ${parsed.data.email}.${earlier}` };
  } catch (error) {
    return actionFailure(error);
  }
}
