/** Runs once when the server starts: the database is created and migrated before the first request. */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { databaseReady } = await import("@/lib/data/database");
  await databaseReady();
  const { startCleaningDigestSchedule } = await import("@/lib/jobs/cleaning-digest-schedule");
  startCleaningDigestSchedule();
}
