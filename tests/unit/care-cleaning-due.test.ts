import { describe, expect, it } from "vitest";

import { addDaysIso, daysBetweenIso, isoDateToDayNumber } from "@/lib/care/dates";
import { cleaningDueState } from "@/lib/care/cleaning-due";

// The rules (common practice, no source): clean at least weekly, before every race, daily in hot humid weather.
const today = "2026-05-12";
const daysAgo = (days: number) => addDaysIso(today, -days);
const inDays = (days: number) => addDaysIso(today, days);

describe("dates", () => {
  it("adds days across month and year ends and leap days", () => {
    expect(addDaysIso("2026-01-31", 1)).toBe("2026-02-01");
    expect(addDaysIso("2026-12-31", 1)).toBe("2027-01-01");
    expect(addDaysIso("2028-02-28", 1)).toBe("2028-02-29");
    expect(addDaysIso("2026-03-01", -1)).toBe("2026-02-28");
    expect(daysBetweenIso("2026-05-05", "2026-05-12")).toBe(7);
  });

  it("refuses malformed and impossible dates", () => {
    expect(() => isoDateToDayNumber("12/05/2026")).toThrow(RangeError);
    expect(() => isoDateToDayNumber("2026-02-30")).toThrow(RangeError);
  });
});

describe("cleaningDueState", () => {
  it("is due when never cleaned, with no date on record", () => {
    expect(cleaningDueState({ lastCleanedOn: null, today, raceDays: [], humidSpell: false })).toEqual({
      due: true,
      reason: "never-cleaned",
      nextDueOn: null,
    });
  });

  it("weekly: cleaned 6 days ago is not due, and falls due tomorrow (day 7)", () => {
    expect(cleaningDueState({ lastCleanedOn: daysAgo(6), today, raceDays: [], humidSpell: false })).toEqual({
      due: false,
      reason: "ok",
      nextDueOn: inDays(1),
    });
  });

  it("weekly: cleaned exactly 7 days ago is due today", () => {
    expect(cleaningDueState({ lastCleanedOn: daysAgo(7), today, raceDays: [], humidSpell: false })).toEqual({
      due: true,
      reason: "over-7-days",
      nextDueOn: today,
    });
  });

  it("weekly: cleaned 9 days ago is overdue since 2 days ago", () => {
    expect(cleaningDueState({ lastCleanedOn: daysAgo(9), today, raceDays: [], humidSpell: false })).toEqual({
      due: true,
      reason: "over-7-days",
      nextDueOn: daysAgo(2),
    });
  });

  it("cleaned today is not due, next due in 7 days", () => {
    expect(cleaningDueState({ lastCleanedOn: today, today, raceDays: [], humidSpell: false })).toEqual({
      due: false,
      reason: "ok",
      nextDueOn: inDays(7),
    });
  });

  it("race tomorrow, cleaned yesterday: due today (the day before the race)", () => {
    expect(cleaningDueState({ lastCleanedOn: daysAgo(1), today, raceDays: [inDays(1)], humidSpell: false })).toEqual({
      due: true,
      reason: "race-day-next",
      nextDueOn: today,
    });
  });

  it("race tomorrow, cleaned today: not due", () => {
    const state = cleaningDueState({ lastCleanedOn: today, today, raceDays: [inDays(1)], humidSpell: false });
    expect(state).toEqual({ due: false, reason: "ok", nextDueOn: inDays(7) });
  });

  it("race today, cleaned yesterday (the day before): not due", () => {
    const state = cleaningDueState({
      lastCleanedOn: daysAgo(1),
      today,
      raceDays: [today],
      humidSpell: false,
    });
    expect(state.due).toBe(false);
    expect(state.reason).toBe("ok");
  });

  it("race today, cleaned 2 days ago: due, since yesterday", () => {
    expect(cleaningDueState({ lastCleanedOn: daysAgo(2), today, raceDays: [today], humidSpell: false })).toEqual({
      due: true,
      reason: "race-day-next",
      nextDueOn: daysAgo(1),
    });
  });

  it("race in 2 days, cleaned 3 days ago: not due today, due tomorrow", () => {
    expect(cleaningDueState({ lastCleanedOn: daysAgo(3), today, raceDays: [inDays(2)], humidSpell: false })).toEqual({
      due: false,
      reason: "ok",
      nextDueOn: inDays(1),
    });
  });

  it("ignores past races", () => {
    const state = cleaningDueState({
      lastCleanedOn: daysAgo(3),
      today,
      raceDays: [daysAgo(1)],
      humidSpell: false,
    });
    expect(state).toEqual({ due: false, reason: "ok", nextDueOn: inDays(4) });
  });

  it("humid spell: cleaned yesterday is due today", () => {
    expect(cleaningDueState({ lastCleanedOn: daysAgo(1), today, raceDays: [], humidSpell: true })).toEqual({
      due: true,
      reason: "humid-spell",
      nextDueOn: today,
    });
  });

  it("humid spell: cleaned today is not due, next due tomorrow", () => {
    expect(cleaningDueState({ lastCleanedOn: today, today, raceDays: [], humidSpell: true })).toEqual({
      due: false,
      reason: "ok",
      nextDueOn: inDays(1),
    });
  });

  it("the earliest rule wins: 8 days since cleaning beats a race tomorrow", () => {
    const state = cleaningDueState({
      lastCleanedOn: daysAgo(8),
      today,
      raceDays: [inDays(1)],
      humidSpell: true,
    });
    expect(state).toEqual({ due: true, reason: "over-7-days", nextDueOn: daysAgo(1) });
  });

  it("on the same day the weekly rule is named before a race or the weather", () => {
    const state = cleaningDueState({
      lastCleanedOn: daysAgo(7),
      today,
      raceDays: [inDays(1)],
      humidSpell: true,
    });
    expect(state.reason).toBe("over-7-days");
  });

  it("refuses a cleaning date after today", () => {
    expect(() => cleaningDueState({ lastCleanedOn: inDays(1), today, raceDays: [], humidSpell: false })).toThrow(RangeError);
  });
});
