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

/**
 * Today (YYYY-MM-DD) in the time zone of a club row already read (null: the server's zone): the day
 * cleanings, race days, digests and certification dates go by.
 */
export function todayOfClub(club: Pick<Club, "settings"> | null, now: Date = new Date()): string {
  return isoDateInZone(readClubSettings(club?.settings).timeZone, now);
}

/** Today in the club's time zone, reading the club first (todayOfClub). */
export async function clubToday(clubId: number, now: Date = new Date()): Promise<string> {
  await databaseReady();
  return todayOfClub(await Club.findByPk(clubId), now);
}

/** The clock a club's times are shown on (its settings' zone, or the server's). */
export async function clubTimeZone(clubId: number): Promise<string> {
  return (await settingsForClub(clubId)).timeZone;
}
