import { dayNumberToIsoDate, isoDateToDayNumber } from "@/lib/care/dates";

/** Today's calendar date (YYYY-MM-DD) in the local time zone of the machine that asks. */
export function localIsoDate(now: Date = new Date()): string {
  const month = String(now.getMonth() + 1).padStart(2, "0");
  const day = String(now.getDate()).padStart(2, "0");
  return `${now.getFullYear()}-${month}-${day}`;
}

/** The IANA time zone of the machine that asks (the server's, when a club has not chosen one). */
export function machineTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone;
}

/** The Intl formats this file asks for, each made once a zone. */
const zoneFormats = {
  day: { year: "numeric", month: "2-digit", day: "2-digit" },
  offset: { hourCycle: "h23", year: "numeric", month: "numeric", day: "numeric", hour: "numeric", minute: "numeric", second: "numeric" },
  instant: { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", hourCycle: "h23", timeZoneName: "short" },
} satisfies Record<string, Intl.DateTimeFormatOptions>;

const zoneFormatters = new Map<string, Intl.DateTimeFormat>();

/** An en-GB formatter of `format` in `timeZone`, kept for the process; a RangeError for a name Intl does not know. */
function zoneFormatter(format: keyof typeof zoneFormats, timeZone: string): Intl.DateTimeFormat {
  const key = `${format} ${timeZone}`;
  let formatter = zoneFormatters.get(key);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat("en-GB", { timeZone, ...zoneFormats[format] });
    zoneFormatters.set(key, formatter);
  }
  return formatter;
}

const dayFormatter = (timeZone: string) => zoneFormatter("day", timeZone);

/** Whether Intl knows `name` as a time zone ("Europe/Oslo", "UTC"): the check behind the club setting. */
export function isTimeZone(name: string): boolean {
  if (name.length === 0 || name.length > 64) return false;
  try {
    dayFormatter(name);
    return true;
  } catch {
    return false;
  }
}

/** Intl's own spelling of a zone it knows ("europe/oslo" is "Europe/Oslo"), so the stored name matches the list. */
export function canonicalTimeZone(name: string): string {
  return dayFormatter(name).resolvedOptions().timeZone;
}

/** The zones an administrator chooses from: UTC first, then Intl's list, with `current` kept if Intl lacks it. */
export function timeZoneChoices(current: string): string[] {
  const zones = new Set(["UTC", ...Intl.supportedValuesOf("timeZone")]);
  if (isTimeZone(current)) zones.add(current);
  const [first, ...rest] = [...zones];
  return [first!, ...rest.sort()];
}

/** The calendar date (YYYY-MM-DD) at `instant` in `timeZone`, asked of Intl itself. */
function intlIsoDate(timeZone: string, instant: Date): string {
  const parts = dayFormatter(timeZone).formatToParts(instant);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((entry) => entry.type === type)?.value ?? "";
  return `${part("year")}-${part("month")}-${part("day")}`;
}

/** How far `timeZone`'s wall clock is ahead of UTC at `epochMs`, in milliseconds (Intl, to the second). */
function zoneOffsetMs(timeZone: string, epochMs: number): number {
  const formatter = zoneFormatter("offset", timeZone);
  const value = (type: Intl.DateTimeFormatPartTypes) =>
    Number(formatter.formatToParts(epochMs).find((entry) => entry.type === type)?.value);
  const wallClock = Date.UTC(value("year"), value("month") - 1, value("day"), value("hour"), value("minute"), value("second"));
  return wallClock - Math.floor(epochMs / 1000) * 1000;
}

const dayMs = 86_400_000;

/**
 * Each zone's offset through one UTC day, when it holds all day (null on a day the clocks change): one
 * Intl lookup a zone and day instead of one a date. The roster works out thousands of dates at a time,
 * and Intl's formatToParts costs several times what the arithmetic does.
 */
const steadyOffsets = new Map<string, number | null>();
const maxSteadyOffsets = 20_000;

function steadyOffsetOn(timeZone: string, utcDay: number): number | null {
  const key = `${timeZone}|${utcDay}`;
  const known = steadyOffsets.get(key);
  if (known !== undefined) return known;
  const start = zoneOffsetMs(timeZone, utcDay * dayMs);
  const steady = start === zoneOffsetMs(timeZone, utcDay * dayMs + dayMs - 1000) ? start : null;
  if (steadyOffsets.size >= maxSteadyOffsets) steadyOffsets.clear();
  steadyOffsets.set(key, steady);
  return steady;
}

/**
 * The calendar date (YYYY-MM-DD) at `now` in `timeZone`: the club's own "today", the same on the server
 * and in any athlete's browser, wherever either of them is. The wall clock is the instant plus the
 * zone's offset that day; on a day the clocks change, Intl is asked for the date itself.
 */
export function isoDateInZone(timeZone: string, now: Date = new Date()): string {
  const epochMs = now.getTime();
  if (!Number.isFinite(epochMs)) throw new RangeError("isoDateInZone needs a valid date");
  const offset = steadyOffsetOn(timeZone, Math.floor(epochMs / dayMs));
  if (offset === null) return intlIsoDate(timeZone, now);
  return new Date(epochMs + offset).toISOString().slice(0, 10);
}

/**
 * The start of `isoDate` in `timeZone` as an RFC 3339 time with the zone's offset that moment, e.g.
 * "2027-03-02T00:00:00+13:00": when a date-only pass starts or ends, for readers in any zone. On the
 * rare day a zone's clocks jump over midnight, the first moment the day has.
 */
export function midnightInZone(isoDate: string, timeZone: string): string {
  // Throws a RangeError for anything but a real YYYY-MM-DD date.
  const wallMidnight = isoDateToDayNumber(isoDate) * dayMs;
  // The instant whose wall clock reads midnight: the offset there, looked up twice in case midnight
  // itself lies across a change of offset.
  let instant = wallMidnight - zoneOffsetMs(timeZone, wallMidnight);
  instant = wallMidnight - zoneOffsetMs(timeZone, instant);
  if (isoDateInZone(timeZone, new Date(instant)) !== isoDate) instant += 3_600_000;
  const offsetMinutes = Math.round(zoneOffsetMs(timeZone, instant) / 60_000);
  const wall = new Date(instant + offsetMinutes * 60_000).toISOString().slice(0, 19);
  const sign = offsetMinutes < 0 ? "-" : "+";
  const hours = String(Math.floor(Math.abs(offsetMinutes) / 60)).padStart(2, "0");
  const minutes = String(Math.abs(offsetMinutes) % 60).padStart(2, "0");
  return `${wall}${sign}${hours}:${minutes}`;
}

/**
 * A moment for people, on the club's clock and saying which clock, e.g. "1 Jul 2026, 13:34 BST" or
 * "2 Dec 2026, 12:34 GMT+13": when an attempt was sent in or a sign-off recorded. Server-rendered only
 * (Intl's zone names can differ between engines).
 */
export function formatInstantInZone(instant: Date | string, timeZone: string): string {
  const moment = typeof instant === "string" ? new Date(instant) : instant;
  if (!Number.isFinite(moment.getTime())) throw new RangeError("formatInstantInZone needs a valid date");
  return zoneFormatter("instant", timeZone).format(moment);
}

/** ISO weekday of a day number: Monday 1 … Sunday 7 (day 0, 1970-01-01, was a Thursday). */
function isoWeekday(dayNumber: number): number {
  return ((((dayNumber + 3) % 7) + 7) % 7) + 1;
}

/**
 * ISO 8601 week of a date, e.g. "2026-W49": weeks start on Monday, and week 1 is the week with the
 * year's first Thursday, so a week belongs to the year its Thursday falls in.
 */
export function isoWeekOf(isoDate: string): string {
  const day = isoDateToDayNumber(isoDate);
  const thursday = day + (4 - isoWeekday(day));
  const year = Number(dayNumberToIsoDate(thursday).slice(0, 4));
  const firstOfYear = isoDateToDayNumber(`${String(year).padStart(4, "0")}-01-01`);
  const week = Math.floor((thursday - firstOfYear) / 7) + 1;
  return `${year}-W${String(week).padStart(2, "0")}`;
}

const weekdayNames = ["Mon", "Tue", "Wed", "Thu", "Fri", "Sat", "Sun"] as const;
const monthNames = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"] as const;

/**
 * A YYYY-MM-DD date for people, e.g. "Wed 2 Dec 2026": built by hand rather than with Intl, so the server
 * and every browser write it the same way (no hydration mismatch, no time zone shift).
 */
export function formatIsoDate(isoDate: string): string {
  const day = isoDateToDayNumber(isoDate);
  const [year, month, date] = isoDate.split("-").map(Number) as [number, number, number];
  return `${weekdayNames[isoWeekday(day) - 1]} ${date} ${monthNames[month - 1]} ${year}`;
}
