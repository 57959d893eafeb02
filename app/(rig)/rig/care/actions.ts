"use server";

import { revalidatePath } from "next/cache";
import { requireActor } from "@/lib/auth/session";
import { recordCleaning } from "@/lib/data/cleaning";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";
import { lookUpBy } from "@/lib/http/look-up";
import { clubToday } from "@/lib/data/club-settings";
import { cleaningRecordSchemaFor } from "@/lib/validations/cleaning";
import { parseActionInput } from "@/lib/validations/issues";

/** Any member records that an oar set's handles were cleaned. */
export async function recordCleaningAction(input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const parsed = parseActionInput(cleaningRecordSchemaFor(await clubToday(actor.clubId)), input);
    if (!parsed.success) return { ok: false, message: "Check the highlighted fields.", fieldErrors: parsed.fieldErrors };
    await lookUpBy("oarSetId", "oar set in your club", () => recordCleaning(actor, parsed.data));
    revalidatePath("/rig/care");
    revalidatePath("/roster/fleet/care");
    return { ok: true, message: "Cleaning recorded. Thank you." };
  } catch (error) {
    return actionFailure(error);
  }
}
