import { isoDateInZone } from "@/lib/care/calendar";
import { addDaysIso, daysBetweenIso, isoDateToDayNumber } from "@/lib/care/dates";

/**
 * The calendar date (YYYY-MM-DD) of an instant in the club's time zone. Every certification date is the
 * club's: the day a pass is signed off (and so its expiry), "today" for whether a pass, clearance or
 * certificate still counts, and the day shown for a request, a decision, a suspension or a revocation.
 * It is the same day the club's cleanings go by (isoDateInZone).
 */
export function isoDateOf(instant: Date, timeZone: string): string {
  return isoDateInZone(timeZone, instant);
}

function daysInMonth(year: number, monthIndex: number): number {
  return new Date(Date.UTC(year, monthIndex + 1, 0)).getUTCDate();
}

/**
 * The same day `months` calendar months later; a day the target month lacks is clamped to its last day
 * (31 January + 1 month = 28 or 29 February), so a pass never lasts longer than the months it promises.
 */
export function addMonthsIso(isoDate: string, months: number): string {
  if (!Number.isInteger(months)) throw new RangeError(`months must be a whole number, got ${months}`);
  isoDateToDayNumber(isoDate);
  const [year, month, day] = isoDate.split("-").map(Number) as [number, number, number];
  const total = year * 12 + (month - 1) + months;
  const targetYear = Math.floor(total / 12);
  const targetMonth = total - targetYear * 12;
  const targetDay = Math.min(day, daysInMonth(targetYear, targetMonth));
  return `${String(targetYear).padStart(4, "0")}-${String(targetMonth + 1).padStart(2, "0")}-${String(targetDay).padStart(2, "0")}`;
}

/** Whole days from `today` until `isoDate` (negative once it has passed). */
export function daysUntil(today: string, isoDate: string): number {
  return daysBetweenIso(today, isoDate);
}

/** One formatter for the process: toLocaleDateString builds a new one on every call (a 500-row register calls it 1,000 times). */
const longDate = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });

/** A date for people: "14 March 2027". */
export function formatLongDate(isoDate: string): string {
  return longDate.format(new Date(`${isoDate}T00:00:00Z`));
}

/**
 * The last day something that expires on `expiresOn` still counts: the day before, since `expiresOn` is
 * the first day it no longer does. Say "up to and including" this day, never "until" the expiry day.
 */
export function lastValidDay(expiresOn: string): string {
  return addDaysIso(expiresOn, -1);
}

/** "expires" or, from `expiresOn` on (the first day it no longer counts), "expired": for "expired 3 Oct". */
export function expiryVerb(expiresOn: string, today: string): "expires" | "expired" {
  return today >= expiresOn ? "expired" : "expires";
}
