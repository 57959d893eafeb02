import "server-only";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { User } from "@/models";

/**
 * Signing out moves the user's token version on, so the signed-out cookie (and any copy of it) stops
 * working at once instead of living until it expires. Only a session carrying the current version can
 * do this: replaying an already dead cookie changes nothing. Because the version is per user, signing
 * out ends that user's sessions on every device.
 */
export async function endSessionsOf(userId: number, tokenVersion: number): Promise<boolean> {
  await databaseReady();
  return writeTransaction(async (transaction) => {
    const [affected] = await User.update({ tokenVersion: tokenVersion + 1 }, { where: { id: userId, tokenVersion }, transaction });
    return affected > 0;
  });
}
