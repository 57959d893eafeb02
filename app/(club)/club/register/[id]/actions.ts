"use server";

import { requireActor } from "@/lib/auth/session";
import { assertMayRevokeCertificate, revokeCertificate } from "@/lib/data/certificates";
import { revokeCertificateSchema } from "@/lib/validations/certification";
import { uuidValueSchema } from "@/lib/validations/ids";
import { parseActionArgument, parseActionInput } from "@/lib/validations/issues";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";
import { lookUpBy } from "@/lib/http/look-up";

/** An admin revokes a certificate with a reason; its public check page says so at once. */
export async function revokeCertificateAction(certificateId: string, input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const id = parseActionArgument("certificateId", uuidValueSchema, certificateId);
    if (!id.success) return { ok: false, message: "That certificate does not exist.", fieldErrors: id.fieldErrors };
    // Who may revoke it is settled before the reason is read (404 for another club's, 403 for non-admins).
    await lookUpBy("certificateId", "certificate", () => assertMayRevokeCertificate(actor, id.data));
    const parsed = parseActionInput(revokeCertificateSchema, input);
    if (!parsed.success) return { ok: false, message: "Check the highlighted fields.", fieldErrors: parsed.fieldErrors };
    const { revoked } = await lookUpBy("certificateId", "certificate", () => revokeCertificate(actor, id.data, parsed.data.reason));
    return {
      ok: true,
      message: revoked.length > 1 ? `Revoked ${revoked.join(" and ")} (the clearance stood on this module).` : `Revoked ${revoked[0]}.`,
    };
  } catch (error) {
    return actionFailure(error);
  }
}
