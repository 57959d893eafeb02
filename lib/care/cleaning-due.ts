import { dayNumberToIsoDate, isoDateToDayNumber } from "@/lib/care/dates";

export type CleaningDueReason = "never-cleaned" | "over-7-days" | "race-day-next" | "humid-spell" | "ok";

export interface CleaningDueInput {
  /** The last day the athlete cleaned their handles (YYYY-MM-DD), or null if never. */
  lastCleanedOn: string | null;
  /** Today (YYYY-MM-DD). */
  today: string;
  /** Race days (YYYY-MM-DD); past ones are ignored. */
  raceDays: string[];
  /** True while the weather is hot and humid. */
  humidSpell: boolean;
}

export interface CleaningDueState {
  due: boolean;
  reason: CleaningDueReason;
  /**
   * The day from which a clean is (or will be) due if nothing is done: today or earlier when due
   * (earlier means overdue), later when not; null when there is no cleaning on record.
   */
  nextDueOn: string | null;
}

/** Days after a cleaning on which the weekly clean falls due: cleaned on day D, due from D + 7. */
export const weeklyCleanDays = 7;

/** Rules checked in this order when two fall due on the same day. */
const reasonPriority: readonly Exclude<CleaningDueReason, "never-cleaned" | "ok">[] = ["over-7-days", "race-day-next", "humid-spell"];

/**
 * Handle cleaning rule (common practice: at least weekly, before every race, daily in hot humid
 * weather). Cleaned on day D: due from D + 7; for a race on day R, due from R − 1 unless cleaned on
 * R − 1 or later; in a humid spell, due every day not yet cleaned that day. Never cleaned: due now.
 * The earliest of these dates is nextDueOn, and it is due when that date is today or earlier.
 */
export function cleaningDueState(input: CleaningDueInput): CleaningDueState {
  const today = isoDateToDayNumber(input.today);
  const raceDays = input.raceDays.map(isoDateToDayNumber);
  if (input.lastCleanedOn === null) return { due: true, reason: "never-cleaned", nextDueOn: null };

  const cleaned = isoDateToDayNumber(input.lastCleanedOn);
  if (cleaned > today) {
    throw new RangeError(`lastCleanedOn (${input.lastCleanedOn}) is after today (${input.today})`);
  }

  const candidates: { day: number; reason: (typeof reasonPriority)[number] }[] = [
    { day: cleaned + weeklyCleanDays, reason: "over-7-days" },
  ];
  for (const race of raceDays) {
    // A race today or later needs a clean on the day before it (or on the day itself).
    if (race >= today && cleaned < race - 1) candidates.push({ day: race - 1, reason: "race-day-next" });
  }
  if (input.humidSpell) {
    candidates.push({ day: cleaned < today ? today : today + 1, reason: "humid-spell" });
  }

  const first = candidates.reduce((best, candidate) =>
    candidate.day < best.day ||
    (candidate.day === best.day && reasonPriority.indexOf(candidate.reason) < reasonPriority.indexOf(best.reason))
      ? candidate
      : best,
  );
  const due = first.day <= today;
  return { due, reason: due ? first.reason : "ok", nextDueOn: dayNumberToIsoDate(first.day) };
}
