import "server-only";
import { databaseReady } from "@/lib/data/database";
import { readClubSettings, type ClubSettings } from "@/lib/validations/club-settings";
import { Club } from "@/models";

/** The club's settings with defaults filled in. */
export async function settingsForClub(clubId: number): Promise<ClubSettings> {
  await databaseReady();
  const club = await Club.findByPk(clubId);
  return readClubSettings(club?.settings);
}
