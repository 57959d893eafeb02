"use server";

import { revalidatePath } from "next/cache";
import { requireActor } from "@/lib/auth/session";
import { createBoat, createOarSet, setBoatArchived, setOarSetArchived, updateBoat, updateOarSet, type SavedFleetRecord } from "@/lib/data/fleet";
import { addRaceDay, removeRaceDay, setHumidSpell } from "@/lib/data/cleaning";
import { sendCleaningDigestNow } from "@/lib/data/cleaning-digest";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";
import { humidSpellSchema, raceDaySchema, removeRaceDaySchema } from "@/lib/validations/cleaning";
import { archiveSchema, boatSchema, oarSetSchema, recordIdSchema } from "@/lib/validations/fleet";
import { fieldErrorsFrom } from "@/lib/validations/issues";

const checkFields = "Check the highlighted fields.";

function refreshFleetPages(): void {
  revalidatePath("/roster/fleet", "layout");
  revalidatePath("/rig", "layout");
}

function savedMessage(what: string, saved: SavedFleetRecord): ActionResult<SavedFleetRecord> {
  return {
    ok: true,
    message: saved.warnings.length ? `${what} saved, with ${saved.warnings.length === 1 ? "a warning" : "warnings"}.` : `${what} saved.`,
    data: saved,
  };
}

/** A coach or admin adds a boat. */
export async function createBoatAction(input: unknown): Promise<ActionResult<SavedFleetRecord>> {
  try {
    const actor = await requireActor();
    const parsed = boatSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: checkFields, fieldErrors: fieldErrorsFrom(parsed.error) };
    const saved = await createBoat(actor, parsed.data);
    refreshFleetPages();
    return savedMessage("Boat", saved);
  } catch (error) {
    return actionFailure(error);
  }
}

/** A coach or admin edits a boat. */
export async function updateBoatAction(boatId: unknown, input: unknown): Promise<ActionResult<SavedFleetRecord>> {
  try {
    const actor = await requireActor();
    const id = recordIdSchema.safeParse(boatId);
    const parsed = boatSchema.safeParse(input);
    if (!id.success) return { ok: false, message: "That boat does not exist.", fieldErrors: {} };
    if (!parsed.success) return { ok: false, message: checkFields, fieldErrors: fieldErrorsFrom(parsed.error) };
    const saved = await updateBoat(actor, id.data, parsed.data);
    refreshFleetPages();
    return savedMessage("Boat", saved);
  } catch (error) {
    return actionFailure(error);
  }
}

/** A coach or admin archives or restores a boat. */
export async function setBoatArchivedAction(input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const parsed = archiveSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: "That boat does not exist.", fieldErrors: fieldErrorsFrom(parsed.error) };
    await setBoatArchived(actor, parsed.data.id, parsed.data.archived);
    refreshFleetPages();
    return { ok: true, message: parsed.data.archived ? "Boat archived." : "Boat restored." };
  } catch (error) {
    return actionFailure(error);
  }
}

/** A coach or admin adds an oar set and the boats it is used in. */
export async function createOarSetAction(input: unknown): Promise<ActionResult<SavedFleetRecord>> {
  try {
    const actor = await requireActor();
    const parsed = oarSetSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: checkFields, fieldErrors: fieldErrorsFrom(parsed.error) };
    const saved = await createOarSet(actor, parsed.data);
    refreshFleetPages();
    return savedMessage("Oar set", saved);
  } catch (error) {
    return actionFailure(error);
  }
}

/** A coach or admin edits an oar set. */
export async function updateOarSetAction(oarSetId: unknown, input: unknown): Promise<ActionResult<SavedFleetRecord>> {
  try {
    const actor = await requireActor();
    const id = recordIdSchema.safeParse(oarSetId);
    const parsed = oarSetSchema.safeParse(input);
    if (!id.success) return { ok: false, message: "That oar set does not exist.", fieldErrors: {} };
    if (!parsed.success) return { ok: false, message: checkFields, fieldErrors: fieldErrorsFrom(parsed.error) };
    const saved = await updateOarSet(actor, id.data, parsed.data);
    refreshFleetPages();
    return savedMessage("Oar set", saved);
  } catch (error) {
    return actionFailure(error);
  }
}

/** A coach or admin archives or restores an oar set. */
export async function setOarSetArchivedAction(input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const parsed = archiveSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: "That oar set does not exist.", fieldErrors: fieldErrorsFrom(parsed.error) };
    await setOarSetArchived(actor, parsed.data.id, parsed.data.archived);
    refreshFleetPages();
    return { ok: true, message: parsed.data.archived ? "Oar set archived." : "Oar set restored." };
  } catch (error) {
    return actionFailure(error);
  }
}

/** A coach or admin adds a race day to the club calendar. */
export async function addRaceDayAction(input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const parsed = raceDaySchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: checkFields, fieldErrors: fieldErrorsFrom(parsed.error) };
    await addRaceDay(actor, parsed.data.raceDay);
    refreshFleetPages();
    return { ok: true, message: "Race day added." };
  } catch (error) {
    return actionFailure(error);
  }
}

/** A coach or admin removes a race day. */
export async function removeRaceDayAction(input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const parsed = removeRaceDaySchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: "That is not a race day.", fieldErrors: fieldErrorsFrom(parsed.error) };
    await removeRaceDay(actor, parsed.data.raceDay);
    refreshFleetPages();
    return { ok: true, message: "Race day removed." };
  } catch (error) {
    return actionFailure(error);
  }
}

/** A coach or admin switches the humid spell on or off. */
export async function setHumidSpellAction(input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const parsed = humidSpellSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: "Choose on or off.", fieldErrors: fieldErrorsFrom(parsed.error) };
    await setHumidSpell(actor, parsed.data.humidSpell);
    refreshFleetPages();
    return { ok: true, message: parsed.data.humidSpell ? "Humid spell on: every set is due daily." : "Humid spell off." };
  } catch (error) {
    return actionFailure(error);
  }
}

/** A coach or admin sends the club's cleaning digest now (it counts as this week's). */
export async function sendDigestNowAction(): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    const { recipients, isoWeek } = await sendCleaningDigestNow(actor);
    return { ok: true, message: `Digest for ${isoWeek} sent to ${recipients} ${recipients === 1 ? "coach or admin" : "coaches and admins"}.` };
  } catch (error) {
    return actionFailure(error);
  }
}
