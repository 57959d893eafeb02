"use server";

import { revalidatePath } from "next/cache";
import { assertMayManageClub } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { updateClubSettings } from "@/lib/data/club-admin-settings";
import { clubSettingsFormSchema } from "@/lib/validations/club-settings-form";
import { parseActionInput } from "@/lib/validations/issues";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";

/** An admin saves the club's settings; past results keep their own pass marks and dates. */
export async function saveClubSettingsAction(input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    assertMayManageClub(actor);
    const parsed = parseActionInput(clubSettingsFormSchema, input);
    if (!parsed.success) return { ok: false, message: "Check the highlighted fields.", fieldErrors: parsed.fieldErrors };
    const { changed } = await updateClubSettings(actor, parsed.data);
    revalidatePath("/club/settings");
    return {
      ok: true,
      message: changed.length === 0 ? "Nothing changed." : "Settings saved. They apply to new quizzes and sign-offs from now on.",
    };
  } catch (error) {
    return actionFailure(error);
  }
}
