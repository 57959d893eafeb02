const isoDatePattern = /^(\d{4})-(\d{2})-(\d{2})$/;
const dayMs = 86_400_000;

/** Days since 1970-01-01 for a calendar date written YYYY-MM-DD (no time zone: a date is a date). */
export function isoDateToDayNumber(isoDate: string): number {
  const match = isoDatePattern.exec(isoDate);
  if (match === null) throw new RangeError(`expected a date as YYYY-MM-DD, got "${isoDate}"`);
  const [, year, month, day] = match.map(Number) as [number, number, number, number];
  const ms = Date.UTC(year, month - 1, day);
  const check = new Date(ms);
  if (check.getUTCFullYear() !== year || check.getUTCMonth() !== month - 1 || check.getUTCDate() !== day) {
    throw new RangeError(`"${isoDate}" is not a real calendar date`);
  }
  return Math.round(ms / dayMs);
}

/** The YYYY-MM-DD date for a day number from isoDateToDayNumber. */
export function dayNumberToIsoDate(dayNumber: number): string {
  return new Date(dayNumber * dayMs).toISOString().slice(0, 10);
}

/** The date `days` after (or before, if negative) a YYYY-MM-DD date. */
export function addDaysIso(isoDate: string, days: number): string {
  return dayNumberToIsoDate(isoDateToDayNumber(isoDate) + days);
}

/** Whole days from `fromIso` to `toIso` (negative when `toIso` is earlier). */
export function daysBetweenIso(fromIso: string, toIso: string): number {
  return isoDateToDayNumber(toIso) - isoDateToDayNumber(fromIso);
}
