"use server";

import { revalidatePath } from "next/cache";
import { assertMayManageClub } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { inviteMember, withdrawInvitation } from "@/lib/data/users";
import { withdrawInvitationSchema } from "@/lib/validations/member-admin";
import { lookUpBy } from "@/lib/http/look-up";
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

/** An admin withdraws an invitation not accepted yet; its link stops working at once. */
export async function withdrawInvitationAction(input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    assertMayManageClub(actor);
    const parsed = parseActionInput(withdrawInvitationSchema, input);
    if (!parsed.success) return { ok: false, message: "Choose an invitation.", fieldErrors: parsed.fieldErrors };
    const { email } = await lookUpBy("invitationId", "invitation waiting for an answer", () =>
      withdrawInvitation(actor, parsed.data.invitationId),
    );
    revalidatePath("/club");
    return { ok: true, message: `Invitation to ${email} withdrawn: its link no longer works.` };
  } catch (error) {
    return actionFailure(error);
  }
}
