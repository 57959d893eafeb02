"use server";

import { revalidatePath } from "next/cache";
import { assertMayManageFleet } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import {
  createBoat,
  createOarSet,
  setBoatArchived,
  setOarSetArchived,
  updateBoat,
  updateOarSet,
  type SavedFleetRecord,
} from "@/lib/data/fleet";
import { addRaceDay, removeRaceDay, setHumidSpell } from "@/lib/data/cleaning";
import { sendCleaningDigestNow } from "@/lib/data/cleaning-digest";
import { actionFailure, type ActionResult } from "@/lib/http/action-result";
import { lookUpBy } from "@/lib/http/look-up";
import { humidSpellSchema, raceDaySchemaFor, removeRaceDaySchema } from "@/lib/validations/cleaning";
import { clubToday } from "@/lib/data/club-settings";
import { archiveSchema, boatSchema, oarSetSchema } from "@/lib/validations/fleet";
import { recordIdValueSchema } from "@/lib/validations/ids";
import { parseActionArgument, parseActionInput } from "@/lib/validations/issues";

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
    assertMayManageFleet(actor);
    const parsed = parseActionInput(boatSchema, input);
    if (!parsed.success) return { ok: false, message: checkFields, fieldErrors: parsed.fieldErrors };
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
    assertMayManageFleet(actor);
    const id = parseActionArgument("boatId", recordIdValueSchema, boatId);
    if (!id.success) return { ok: false, message: "That boat does not exist.", fieldErrors: id.fieldErrors };
    const parsed = parseActionInput(boatSchema, input);
    if (!parsed.success) return { ok: false, message: checkFields, fieldErrors: parsed.fieldErrors };
    const saved = await lookUpBy("boatId", "boat in your club", () => updateBoat(actor, id.data, parsed.data));
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
    assertMayManageFleet(actor);
    const parsed = parseActionInput(archiveSchema, input);
    if (!parsed.success) return { ok: false, message: "That boat does not exist.", fieldErrors: parsed.fieldErrors };
    const { id, archived } = parsed.data;
    await lookUpBy("id", "boat in your club", () => setBoatArchived(actor, id, archived));
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
    assertMayManageFleet(actor);
    const parsed = parseActionInput(oarSetSchema, input);
    if (!parsed.success) return { ok: false, message: checkFields, fieldErrors: parsed.fieldErrors };
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
    assertMayManageFleet(actor);
    const id = parseActionArgument("oarSetId", recordIdValueSchema, oarSetId);
    if (!id.success) return { ok: false, message: "That oar set does not exist.", fieldErrors: id.fieldErrors };
    const parsed = parseActionInput(oarSetSchema, input);
    if (!parsed.success) return { ok: false, message: checkFields, fieldErrors: parsed.fieldErrors };
    const saved = await lookUpBy("oarSetId", "oar set in your club", () => updateOarSet(actor, id.data, parsed.data));
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
    assertMayManageFleet(actor);
    const parsed = parseActionInput(archiveSchema, input);
    if (!parsed.success) return { ok: false, message: "That oar set does not exist.", fieldErrors: parsed.fieldErrors };
    const { id, archived } = parsed.data;
    await lookUpBy("id", "oar set in your club", () => setOarSetArchived(actor, id, archived));
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
    assertMayManageFleet(actor);
    const parsed = parseActionInput(raceDaySchemaFor(await clubToday(actor.clubId)), input);
    if (!parsed.success) return { ok: false, message: checkFields, fieldErrors: parsed.fieldErrors };
    const { changed } = await addRaceDay(actor, parsed.data.raceDay);
    refreshFleetPages();
    return { ok: true, message: changed ? "Race day added." : "That day is already a race day." };
  } catch (error) {
    return actionFailure(error);
  }
}

/** A coach or admin removes a race day. */
export async function removeRaceDayAction(input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    assertMayManageFleet(actor);
    const parsed = parseActionInput(removeRaceDaySchema, input);
    if (!parsed.success) return { ok: false, message: "That is not a race day.", fieldErrors: parsed.fieldErrors };
    const { changed } = await removeRaceDay(actor, parsed.data.raceDay);
    refreshFleetPages();
    return { ok: true, message: changed ? "Race day removed." : "That day was no longer a race day." };
  } catch (error) {
    return actionFailure(error);
  }
}

/** A coach or admin switches the humid spell on or off. */
export async function setHumidSpellAction(input: unknown): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    assertMayManageFleet(actor);
    const parsed = parseActionInput(humidSpellSchema, input);
    if (!parsed.success) return { ok: false, message: "Choose on or off.", fieldErrors: parsed.fieldErrors };
    await setHumidSpell(actor, parsed.data.humidSpell);
    refreshFleetPages();
    return { ok: true, message: parsed.data.humidSpell ? "Humid spell on: every set is due daily." : "Humid spell off." };
  } catch (error) {
    return actionFailure(error);
  }
}

/**
 * A coach or admin sends the club's cleaning digest now (it counts as this week's). It takes no input,
 * so any argument is refused rather than ignored, as GET /api/me/progress refuses any parameter.
 */
export async function sendDigestNowAction(...input: unknown[]): Promise<ActionResult> {
  try {
    const actor = await requireActor();
    assertMayManageFleet(actor);
    if (input.length > 0) return { ok: false, message: "Sending the digest takes no input.", fieldErrors: { _: ["Send no input."] } };
    const { recipients, isoWeek } = await sendCleaningDigestNow(actor);
    return {
      ok: true,
      message: `Digest for ${isoWeek} sent to ${recipients} ${recipients === 1 ? "coach or admin" : "coaches and admins"}.`,
    };
  } catch (error) {
    return actionFailure(error);
  }
}
