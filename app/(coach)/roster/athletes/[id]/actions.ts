"use server";

import { requireActor } from "@/lib/auth/session";
import { liftSuspension, suspendClearance } from "@/lib/data/clearance";
import { liftSuspensionSchema, suspendClearanceSchema } from "@/lib/validations/certification";
import { fieldErrorsFrom } from "@/lib/validations/issues";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";

function athleteIdFrom(value: unknown): number | null {
  const id = Number(value);
  return Number.isInteger(id) && id > 0 ? id : null;
}

/** A coach suspends an athlete's clearance with a reason. */
export async function suspendClearanceAction(athleteId: number, input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const id = athleteIdFrom(athleteId);
    const parsed = suspendClearanceSchema.safeParse(input);
    if (!parsed.success || id === null) {
      return {
        ok: false,
        message: "Check the highlighted fields.",
        fieldErrors: parsed.success ? {} : fieldErrorsFrom(parsed.error),
      };
    }
    await suspendClearance(actor, id, parsed.data.reason);
    return { ok: true, message: "Clearance suspended. The athlete rigs with a coach until you lift it." };
  } catch (error) {
    return actionFailure(error);
  }
}

/** A coach lifts the suspension, with an optional note. */
export async function liftSuspensionAction(athleteId: number, input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const id = athleteIdFrom(athleteId);
    const parsed = liftSuspensionSchema.safeParse(input);
    if (!parsed.success || id === null) {
      return {
        ok: false,
        message: "Check the highlighted fields.",
        fieldErrors: parsed.success ? {} : fieldErrorsFrom(parsed.error),
      };
    }
    await liftSuspension(actor, id, parsed.data.note);
    return { ok: true, message: "Suspension lifted." };
  } catch (error) {
    return actionFailure(error);
  }
}
