"use server";

import { headers } from "next/headers";
import { requestSignInLink } from "@/lib/data/users";
import { clientAddress, publicLimiter } from "@/lib/auth/throttle";
import { signInLinkSchema } from "@/lib/validations/members";
import { parseActionInput } from "@/lib/validations/issues";
import type { ActionResult } from "@/lib/http/action-result";

/** Mails a one-time link; the answer is the same whether or not the address has an account. */
export async function requestSignInLinkAction(input: unknown): Promise<ActionResult> {
  const parsed = parseActionInput(signInLinkSchema, input);
  if (!parsed.success) return { ok: false, message: "Check the e-mail address.", fieldErrors: parsed.fieldErrors };
  const address = clientAddress(await headers());
  try {
    await publicLimiter("sign-in-link", 5).consume(address);
  } catch {
    return { ok: false, message: "Too many links asked for. Wait a minute and try again.", fieldErrors: {} };
  }
  await requestSignInLink(parsed.data.email);
  return { ok: true, message: "If that address belongs to a member, a sign-in link is on its way. It works once, for 20 minutes." };
}
