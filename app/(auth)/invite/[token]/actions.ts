"use server";

import { acceptInvitation } from "@/lib/data/users";
import { acceptInvitationSchema } from "@/lib/validations/members";
import { parseActionInput } from "@/lib/validations/issues";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";

/** Creates the member from an invitation; the client then signs in with the new password. */
export async function acceptInvitationAction(input: unknown): Promise<ActionResult<{ email: string }>> {
  const parsed = parseActionInput(acceptInvitationSchema, input);
  if (!parsed.success) return { ok: false, message: "Check the highlighted fields.", fieldErrors: parsed.fieldErrors };
  try {
    const { email } = await acceptInvitation(parsed.data.token, parsed.data.name, parsed.data.password);
    return { ok: true, data: { email } };
  } catch (error) {
    return actionFailure(error);
  }
}
