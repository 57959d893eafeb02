"use server";

import { requireActor } from "@/lib/auth/session";
import { assessmentForCoach, recordAssessment } from "@/lib/data/sign-offs";
import { assessmentSchemaFor } from "@/lib/validations/certification";
import { uuidValueSchema } from "@/lib/validations/ids";
import { parseActionArgument, parseActionInput } from "@/lib/validations/issues";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";
import { lookUpBy } from "@/lib/http/look-up";

/**
 * A coach records the observed assessment; the module's checklist gives the schema. No revalidatePath:
 * the pages render per request, and refreshing this one would replace the form before its message shows.
 */
export async function recordAssessmentAction(
  assessmentId: string,
  input: unknown,
): Promise<ActionResult<{ outcome: string; serials: string[] }>> {
  try {
    const actor = await requireActor();
    const id = parseActionArgument("assessmentId", uuidValueSchema, assessmentId);
    if (!id.success) return { ok: false, message: "That sign-off does not exist.", fieldErrors: id.fieldErrors };
    const detail = await lookUpBy("assessmentId", "sign-off", () => assessmentForCoach(actor, id.data));
    const parsed = parseActionInput(assessmentSchemaFor(detail.checklist), input);
    if (!parsed.success) return { ok: false, message: "Check the highlighted items.", fieldErrors: parsed.fieldErrors };
    const recorded = await lookUpBy("assessmentId", "sign-off", () => recordAssessment(actor, detail.id, parsed.data));
    const serials = recorded.certificates.map((certificate) => certificate.serial);
    const message =
      recorded.outcome === "passed"
        ? `Signed off. Certificate ${serials.join(" and ")} issued${recorded.mailed ? " and e-mailed to the athlete" : "; the e-mail could not be sent"}.`
        : `Recorded as not yet. ${recorded.mailed ? "The athlete has your note by e-mail and on their page." : "The e-mail could not be sent; the note is on their page."}`;
    return { ok: true, message, data: { outcome: recorded.outcome, serials } };
  } catch (error) {
    return actionFailure(error);
  }
}
