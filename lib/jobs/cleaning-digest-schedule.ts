import "server-only";
import { sendWeeklyCleaningDigests } from "@/lib/data/cleaning-digest";

/** How often the server looks for clubs whose weekly cleaning digest is still to go out. */
export const digestCheckIntervalMs = 60 * 60 * 1000;

interface ScheduleGlobal {
  slipwayDigestTimer?: ReturnType<typeof setInterval>;
}
const store = globalThis as unknown as ScheduleGlobal;

async function checkOnce(): Promise<void> {
  try {
    const run = await sendWeeklyCleaningDigests();
    if (run.sentToClubs.length > 0) {
      console.info(`Cleaning digest ${run.isoWeeks.join(", ")} sent for ${run.sentToClubs.length} club(s).`);
    }
  } catch (error) {
    console.error("Cleaning digest check failed; trying again in an hour", error);
  }
}

/**
 * Checks once at start and then every hour; each club gets one digest per ISO week, remembered in the
 * database. Off with SLIPWAY_CLEANING_DIGEST=off. One timer per process; it never keeps the process alive.
 */
export function startCleaningDigestSchedule(): void {
  if (process.env.SLIPWAY_CLEANING_DIGEST === "off" || store.slipwayDigestTimer) return;
  store.slipwayDigestTimer = setInterval(() => void checkOnce(), digestCheckIntervalMs);
  store.slipwayDigestTimer.unref();
  setTimeout(() => void checkOnce(), 0).unref();
}
