"use server";

import { currentActor } from "@/lib/auth/session";
import { confirmEmailChange } from "@/lib/data/email-change";
import { confirmEmailChangeSchema } from "@/lib/validations/members";
import { parseActionInput } from "@/lib/validations/issues";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";

/**
 * Public: the link's token is the guard, and for a change the member asked for, their session too.
 * The account signs in with the new address from now on.
 */
export async function confirmEmailChangeAction(input: unknown): Promise<ActionResult<{ email: string }>> {
  const parsed = parseActionInput(confirmEmailChangeSchema, input);
  if (!parsed.success)
    return { ok: false, message: "This link is incomplete: copy the whole link from the e-mail.", fieldErrors: parsed.fieldErrors };
  try {
    const { email } = await confirmEmailChange(parsed.data.token, await currentActor());
    return {
      ok: true,
      message: `Your Slipway account now signs in with ${email}. Every device was signed out: sign in again with it.`,
      data: { email },
    };
  } catch (error) {
    return actionFailure(error);
  }
}
