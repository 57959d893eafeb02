"use server";

import { headers } from "next/headers";
import { currentSessionStart, requireActor } from "@/lib/auth/session";
import { mayChangePasswordWithoutCurrent } from "@/lib/auth/password-rules";
import { clientAddress } from "@/lib/auth/throttle";
import { changeOwnPassword } from "@/lib/data/users";
import { changePasswordSchema } from "@/lib/validations/members";
import { parseActionInput } from "@/lib/validations/issues";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";

/** A member sets a new password; every session of theirs ends, and the form signs in again with it. */
export async function changePasswordAction(input: unknown): Promise<ActionResult<{ email: string }>> {
  try {
    const actor = await requireActor();
    const parsed = parseActionInput(changePasswordSchema, input);
    if (!parsed.success) return { ok: false, message: "Check the highlighted fields.", fieldErrors: parsed.fieldErrors };
    const withoutCurrent = mayChangePasswordWithoutCurrent(await currentSessionStart(), new Date());
    const address = clientAddress(await headers());
    const { email } = await changeOwnPassword(actor, parsed.data, { address, withoutCurrent });
    return { ok: true, message: "Password changed.", data: { email } };
  } catch (error) {
    return actionFailure(error);
  }
}
