"use server";

import { requireActor } from "@/lib/auth/session";
import { liftSuspension, suspendClearance } from "@/lib/data/clearance";
import { assertMayReissueCertificates, reissueUnderCurrentName } from "@/lib/data/certificate-reissue";
import { liftSuspensionSchema, reissueCertificatesSchema, suspendClearanceSchema } from "@/lib/validations/certification";
import { recordIdValueSchema } from "@/lib/validations/ids";
import { parseActionArgument, parseActionInput } from "@/lib/validations/issues";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";
import { lookUpBy } from "@/lib/http/look-up";

const checkFields = "Check the highlighted fields.";

/** A coach suspends an athlete's clearance with a reason. */
export async function suspendClearanceAction(athleteId: number, input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const id = parseActionArgument("athleteId", recordIdValueSchema, athleteId);
    if (!id.success) return { ok: false, message: "That athlete does not exist.", fieldErrors: id.fieldErrors };
    const parsed = parseActionInput(suspendClearanceSchema, input);
    if (!parsed.success) return { ok: false, message: checkFields, fieldErrors: parsed.fieldErrors };
    await lookUpBy("athleteId", "athlete in your club", () => suspendClearance(actor, id.data, parsed.data.reason));
    return { ok: true, message: "Clearance suspended. The athlete rigs with a coach until you lift it." };
  } catch (error) {
    return actionFailure(error);
  }
}

/** A coach lifts the suspension, with an optional note. */
export async function liftSuspensionAction(athleteId: number, input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const id = parseActionArgument("athleteId", recordIdValueSchema, athleteId);
    if (!id.success) return { ok: false, message: "That athlete does not exist.", fieldErrors: id.fieldErrors };
    const parsed = parseActionInput(liftSuspensionSchema, input);
    if (!parsed.success) return { ok: false, message: checkFields, fieldErrors: parsed.fieldErrors };
    await lookUpBy("athleteId", "athlete in your club", () => liftSuspension(actor, id.data, parsed.data.note));
    return { ok: true, message: "Suspension lifted." };
  } catch (error) {
    return actionFailure(error);
  }
}

/**
 * An admin reissues the athlete's certificates that still hold under the name the member has now
 * (after a correction); the earlier ones are revoked as replaced.
 */
export async function reissueCertificatesAction(athleteId: number, input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const id = parseActionArgument("athleteId", recordIdValueSchema, athleteId);
    if (!id.success) return { ok: false, message: "That athlete does not exist.", fieldErrors: id.fieldErrors };
    // Who may reissue is settled before the input is read (404 outside the club, 403 for coaches and athletes).
    await lookUpBy("athleteId", "athlete in your club", () => assertMayReissueCertificates(actor, id.data));
    const parsed = parseActionInput(reissueCertificatesSchema, input);
    if (!parsed.success) return { ok: false, message: "Check the name.", fieldErrors: parsed.fieldErrors };
    const { replaced } = await lookUpBy("athleteId", "athlete in your club", () =>
      reissueUnderCurrentName(actor, id.data, parsed.data.name),
    );
    const pairs = replaced.map(({ from, to }) => `${from} → ${to}`).join(", ");
    return {
      ok: true,
      message: `Reissued under ${parsed.data.name}: ${pairs}. The earlier ${replaced.length === 1 ? "one is" : "ones are"} revoked as replaced; print the new ${replaced.length === 1 ? "one" : "ones"} for the register.`,
    };
  } catch (error) {
    return actionFailure(error);
  }
}
