import "server-only";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { recordAudit } from "@/lib/data/audit";
import { assertAllowed, canManageClub, type Actor } from "@/lib/auth/permissions";
import { ValidationError } from "@/lib/http/errors";
import { listModules } from "@/lib/content/modules";
import { readClubSettings } from "@/lib/validations/club-settings";
import { timeZoneChoices } from "@/lib/care/calendar";
import { formToSettings, settingsToForm, type ClubSettingsForm } from "@/lib/validations/club-settings-form";
import { Club } from "@/models";

export interface ClubSettingsPageData {
  clubName: string;
  form: ClubSettingsForm;
  modules: { slug: string; title: string }[];
  /** The time zones to choose from, the club's own among them. */
  timeZones: string[];
  hasLogo: boolean;
}

/** What the settings page shows (admins of the club only). */
export async function clubSettingsForAdmin(actor: Actor): Promise<ClubSettingsPageData> {
  await databaseReady();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators change the club's settings.");
  const club = await Club.findByPk(actor.clubId);
  const form = settingsToForm(readClubSettings(club?.settings));
  return {
    clubName: club?.name ?? "",
    form,
    modules: listModules().map((meta) => ({ slug: meta.slug, title: meta.title })),
    timeZones: timeZoneChoices(form.timeZone),
    hasLogo: !!club?.logoFile,
  };
}

/**
 * An admin saves the settings (audited with the names of the fields that changed). Keys the form does
 * not know (other features' settings) are kept as stored. Past results are never rewritten: attempts
 * keep their own pass mark and certificates their own dates.
 */
export async function updateClubSettings(actor: Actor, form: ClubSettingsForm): Promise<{ changed: string[] }> {
  await databaseReady();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators change the club's settings.");
  const known = new Set(listModules().map((meta) => meta.slug));
  const unknown = form.clearanceModules.filter((slug) => !known.has(slug));
  if (unknown.length > 0) {
    throw new ValidationError(`clearanceModules: no module is called ${unknown.join(", ")}`, {
      clearanceModules: ["choose modules of the course"],
    });
  }
  return writeTransaction(async (transaction) => {
    const club = await Club.findByPk(actor.clubId, { transaction });
    if (!club) throw new ValidationError("The club is missing.");
    const stored = (club.settings ?? {}) as Record<string, unknown>;
    const before = readClubSettings(stored);
    const after = formToSettings(form, before);
    const changed = (Object.keys(after) as (keyof typeof after)[]).filter(
      (key) => JSON.stringify(before[key]) !== JSON.stringify(after[key]),
    );
    await club.update({ settings: { ...stored, ...after } }, { transaction });
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: "club.settings-changed",
        subjectType: "club",
        subjectId: actor.clubId,
        details: { changed },
      },
      transaction,
    );
    return { changed };
  });
}
