"use server";

import { requireActor } from "@/lib/auth/session";
import { revokeCertificate } from "@/lib/data/certificates";
import { revokeCertificateSchema } from "@/lib/validations/certification";
import { fieldErrorsFrom } from "@/lib/validations/issues";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";

/** An admin revokes a certificate with a reason; its public check page says so at once. */
export async function revokeCertificateAction(certificateId: string, input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const parsed = revokeCertificateSchema.safeParse(input);
    if (!parsed.success)
      return {
        ok: false,
        message: "Check the highlighted fields.",
        fieldErrors: fieldErrorsFrom(parsed.error),
      };
    const { revoked } = await revokeCertificate(actor, String(certificateId), parsed.data.reason);
    return {
      ok: true,
      message:
        revoked.length > 1
          ? `Revoked ${revoked.join(" and ")} (the clearance stood on this module).`
          : `Revoked ${revoked[0]}.`,
    };
  } catch (error) {
    return actionFailure(error);
  }
}
