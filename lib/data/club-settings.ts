import "server-only";
import { databaseReady } from "@/lib/data/database";
import { isoDateInZone } from "@/lib/care/calendar";
import { readClubSettings, type ClubSettings } from "@/lib/validations/club-settings";
import { Club } from "@/models";

/** The club's settings with defaults filled in. */
export async function settingsForClub(clubId: number): Promise<ClubSettings> {
  await databaseReady();
  const club = await Club.findByPk(clubId);
  return readClubSettings(club?.settings);
}

/** Today (YYYY-MM-DD) in the club's time zone: the day cleanings, race days and digests go by. */
export async function clubToday(clubId: number, now: Date = new Date()): Promise<string> {
  return isoDateInZone((await settingsForClub(clubId)).timeZone, now);
}
