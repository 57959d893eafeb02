"use server";

import { headers } from "next/headers";
import { currentSessionStart, requireActor } from "@/lib/auth/session";
import { mayChangePasswordWithoutCurrent } from "@/lib/auth/password-rules";
import { clientAddress } from "@/lib/auth/throttle";
import { revalidatePath } from "next/cache";
import { changeOwnName, changeOwnPassword } from "@/lib/data/users";
import { emailChangeLinkHours, requestEmailChange } from "@/lib/data/email-change";
import { changeOwnNameSchema, changePasswordSchema, requestEmailChangeSchema } from "@/lib/validations/members";
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

/** A member corrects how their name is written; the header and roster show it from the next page. */
export async function changeOwnNameAction(input: unknown): Promise<ActionResult<{ name: string }>> {
  try {
    const actor = await requireActor();
    const parsed = parseActionInput(changeOwnNameSchema, input);
    if (!parsed.success) return { ok: false, message: "Check your name.", fieldErrors: parsed.fieldErrors };
    const { name, certificatesUnderEarlierName: outdated } = await changeOwnName(actor, parsed.data.name);
    revalidatePath("/", "layout");
    const saved = name === actor.name ? "Your name was already written that way." : "Name saved.";
    const reissue =
      outdated === 0
        ? ""
        : ` ${outdated === 1 ? "One current certificate carries" : `${outdated} current certificates carry`} your earlier name: a club administrator can reissue ${outdated === 1 ? "it" : "them"} under this one.`;
    return { ok: true, message: `${saved}${reissue}`, data: { name } };
  } catch (error) {
    return actionFailure(error);
  }
}

/** A member asks to sign in with another address: a link goes there, and nothing changes until it is used. */
export async function requestEmailChangeAction(input: unknown): Promise<ActionResult<{ newEmail: string }>> {
  try {
    const actor = await requireActor();
    const parsed = parseActionInput(requestEmailChangeSchema, input);
    if (!parsed.success) return { ok: false, message: "Check the highlighted fields.", fieldErrors: parsed.fieldErrors };
    const withoutCurrent = mayChangePasswordWithoutCurrent(await currentSessionStart(), new Date());
    const address = clientAddress(await headers());
    const { newEmail } = await requestEmailChange(actor, parsed.data, { address, withoutCurrent });
    revalidatePath("/account");
    return {
      ok: true,
      message: `A confirmation link is on its way to ${newEmail}. Open it within ${emailChangeLinkHours} hours; until then you sign in with ${actor.email}.`,
      data: { newEmail },
    };
  } catch (error) {
    return actionFailure(error);
  }
}
