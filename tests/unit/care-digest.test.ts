import { describe, expect, it } from "vitest";

import {
  canonicalTimeZone,
  formatInstantInZone,
  formatIsoDate,
  isoDateInZone,
  isTimeZone,
  isoWeekOf,
  localIsoDate,
  midnightInZone,
  timeZoneChoices,
} from "@/lib/care/calendar";
import { cleaningDueState } from "@/lib/care/cleaning-due";
import { addDaysIso } from "@/lib/care/dates";
import { buildCleaningDigest, cleaningCautions } from "@/lib/care/digest";
import { dueStatus } from "@/lib/care/due-status";

describe("isoWeekOf (ISO 8601 week dates; values checked against Python's date.isocalendar)", () => {
  it.each([
    ["2026-01-01", "2026-W01"], // a Thursday: week 1 is the week of the year's first Thursday
    ["2021-01-03", "2020-W53"], // a Sunday still in the previous ISO year
    ["2024-12-30", "2025-W01"], // a Monday already in the next ISO year
    ["2026-12-31", "2026-W53"],
    ["2027-01-03", "2026-W53"],
    ["2027-01-04", "2027-W01"],
    ["2030-01-07", "2030-W02"],
    ["2030-01-13", "2030-W02"], // Sunday ends the week
    ["2030-01-14", "2030-W03"],
    ["1969-12-29", "1970-W01"], // before day 0 of the day numbers
    ["2026-12-02", "2026-W49"],
  ])("%s is in %s", (date, week) => {
    expect(isoWeekOf(date)).toBe(week);
  });

  it("reads today in local time and formats dates as written", () => {
    expect(localIsoDate(new Date(2026, 11, 2, 23, 59))).toBe("2026-12-02");
    expect(localIsoDate(new Date(2026, 0, 5, 0, 1))).toBe("2026-01-05");
    expect(formatIsoDate("2026-12-02")).toBe("Wed 2 Dec 2026");
  });
});

describe("the club's today, in its time zone", () => {
  // Offsets from the IANA Time Zone Database (tzdata, IANA, 2025): New Zealand keeps daylight time
  // (UTC+13) in December, California standard time (UTC-8), Kiribati's Line Islands UTC+14 all year.
  const lateEvening = new Date("2026-12-02T23:30:00Z");
  it.each([
    ["UTC", "2026-12-02"],
    ["Pacific/Auckland", "2026-12-03"],
    ["America/Los_Angeles", "2026-12-02"],
    ["Pacific/Kiritimati", "2026-12-03"],
  ])("23:30 UTC on 2 December is %s's %s", (zone, day) => {
    expect(isoDateInZone(zone, lateEvening)).toBe(day);
  });

  it("crosses a year and a week boundary with the zone, not with UTC", () => {
    const newYear = new Date("2026-12-31T11:30:00Z"); // 00:30 on 1 January 2027 in Auckland
    expect(isoDateInZone("Pacific/Auckland", newYear)).toBe("2027-01-01");
    expect(isoDateInZone("UTC", newYear)).toBe("2026-12-31");
    expect(isoDateInZone("America/Los_Angeles", new Date("2027-01-04T07:59:00Z"))).toBe("2027-01-03");
  });

  it("agrees with Intl's own date at every instant of a year, clock-change days included", () => {
    // Zones with daylight time both ways, half- and quarter-hour offsets, and a half-hour clock change
    // (Lord Howe): the reference is Intl's date for each instant (en-CA writes YYYY-MM-DD).
    const zones = [
      "UTC",
      "Pacific/Auckland",
      "America/Los_Angeles",
      "Europe/London",
      "Asia/Kathmandu",
      "America/St_Johns",
      "Australia/Lord_Howe",
      "Pacific/Chatham",
    ];
    const start = Date.UTC(2026, 0, 1);
    for (const zone of zones) {
      const reference = new Intl.DateTimeFormat("en-CA", { timeZone: zone, year: "numeric", month: "2-digit", day: "2-digit" });
      // Every 37 minutes for a year: about 14,000 instants a zone, never twice at the same time of day.
      for (let instant = start; instant < start + 366 * 86_400_000; instant += 37 * 60_000) {
        const date = new Date(instant);
        expect(isoDateInZone(zone, date), `${zone} at ${date.toISOString()}`).toBe(reference.format(date));
      }
    }
    // Either side of a clock change at the club's midnight hour: Auckland's clocks went back at
    // 03:00 NZDT on 5 April 2026 (14:00 UTC on the 4th), and forward at 02:00 NZST on 27 September.
    for (const instant of [
      "2026-04-04T10:59:59Z",
      "2026-04-04T11:00:00Z",
      "2026-04-04T13:59:59Z",
      "2026-04-04T14:00:00Z",
      "2026-09-26T11:59:59Z",
      "2026-09-26T12:00:00Z",
      "2026-09-26T13:59:59Z",
      "2026-09-26T14:00:00Z",
    ]) {
      const reference = new Intl.DateTimeFormat("en-CA", { timeZone: "Pacific/Auckland" });
      expect(isoDateInZone("Pacific/Auckland", new Date(instant)), instant).toBe(reference.format(new Date(instant)));
    }
    expect(() => isoDateInZone("UTC", new Date(Number.NaN))).toThrow(RangeError);
  });

  it("finds the instant a day starts in a zone, with the offset of that moment, as Intl reads it", () => {
    const zones = [
      "UTC",
      "Pacific/Auckland",
      "America/Los_Angeles",
      "Asia/Kathmandu",
      "America/St_Johns",
      "Australia/Lord_Howe",
      "America/Santiago",
    ];
    for (const zone of zones) {
      const reference = new Intl.DateTimeFormat("en-CA", { timeZone: zone });
      for (let day = Date.UTC(2026, 0, 1); day < Date.UTC(2027, 0, 1); day += 86_400_000) {
        const isoDate = new Date(day).toISOString().slice(0, 10);
        const start = new Date(midnightInZone(isoDate, zone));
        // The day has begun there, and a second earlier it had not.
        expect(reference.format(start), `${zone} ${isoDate}`).toBe(isoDate);
        expect(reference.format(new Date(start.getTime() - 1000)), `${zone} ${isoDate}`).not.toBe(isoDate);
      }
    }
    expect(midnightInZone("2026-12-03", "UTC")).toBe("2026-12-03T00:00:00+00:00");
    expect(midnightInZone("2026-12-03", "Asia/Kathmandu")).toBe("2026-12-03T00:00:00+05:45");
    // Chile's clocks go from 24:00 to 01:00 on 6 September 2026: that day starts at 01:00.
    expect(midnightInZone("2026-09-06", "America/Santiago")).toBe("2026-09-06T01:00:00-03:00");
    expect(() => midnightInZone("2026-02-30", "UTC")).toThrow(RangeError);
  });

  it("writes a moment on the club's clock and names the clock", () => {
    // Offsets from the IANA Time Zone Database (tzdata, IANA, 2025): London keeps summer time (UTC+1,
    // "BST") in July and GMT in December; Auckland is UTC+12 in July and UTC+13 in December; India is
    // UTC+5:30 all year. Abbreviations as Intl writes them for en-GB.
    const summerNoon = "2026-07-01T12:34:00Z";
    const winterNight = new Date("2026-12-01T23:34:00Z");
    expect(formatInstantInZone(summerNoon, "UTC")).toBe("1 Jul 2026, 12:34 UTC");
    expect(formatInstantInZone(summerNoon, "Europe/London")).toBe("1 Jul 2026, 13:34 BST");
    expect(formatInstantInZone(winterNight, "Europe/London")).toBe("1 Dec 2026, 23:34 GMT");
    // The next day already, on the club's clock: the date moves with the zone, not with UTC.
    expect(formatInstantInZone(summerNoon, "Pacific/Auckland")).toBe("2 Jul 2026, 00:34 GMT+12");
    expect(formatInstantInZone(winterNight, "Pacific/Auckland")).toBe("2 Dec 2026, 12:34 GMT+13");
    expect(formatInstantInZone(winterNight, "Asia/Kolkata")).toBe("2 Dec 2026, 05:04 GMT+5:30");
    // Just after midnight is 00:04, not 24:04.
    expect(formatInstantInZone("2026-07-01T00:04:00Z", "UTC")).toBe("1 Jul 2026, 00:04 UTC");
    expect(() => formatInstantInZone("not a date", "UTC")).toThrow(RangeError);
  });

  it("knows time zone names, and offers UTC first with the club's own kept", () => {
    expect(isTimeZone("Europe/Oslo")).toBe(true);
    expect(isTimeZone("UTC")).toBe(true);
    expect(canonicalTimeZone("europe/oslo")).toBe("Europe/Oslo");
    for (const bad of ["", "Mars/Olympus_Mons", "Europe/Oslo; DROP", "x".repeat(65)]) expect(isTimeZone(bad)).toBe(false);
    const choices = timeZoneChoices("Etc/GMT-3");
    expect(choices[0]).toBe("UTC");
    expect(choices).toContain("Etc/GMT-3");
    expect(choices).toContain("Pacific/Auckland");
    expect(new Set(choices).size).toBe(choices.length);
    expect(choices.every(isTimeZone)).toBe(true);
  });
});

const today = "2026-12-02";

describe("dueStatus", () => {
  it("says why a set is due in words with an icon", () => {
    const never = cleaningDueState({ lastCleanedOn: null, today, raceDays: [], humidSpell: false });
    expect(dueStatus(never, today, null)).toEqual({ due: true, icon: "⚠", label: "Due now", detail: "No cleaning on record." });

    const weekAgo = addDaysIso(today, -7);
    expect(dueStatus(cleaningDueState({ lastCleanedOn: weekAgo, today, raceDays: [], humidSpell: false }), today, weekAgo)).toMatchObject({
      due: true,
      label: "Due today",
    });
    const longAgo = addDaysIso(today, -12);
    expect(dueStatus(cleaningDueState({ lastCleanedOn: longAgo, today, raceDays: [], humidSpell: false }), today, longAgo)).toMatchObject({
      label: "Overdue",
      detail: "A week since the last clean ran out on Fri 27 Nov 2026. Last cleaned Fri 20 Nov 2026.",
    });

    const race = addDaysIso(today, 1);
    const cleaned = addDaysIso(today, -2);
    expect(
      dueStatus(cleaningDueState({ lastCleanedOn: cleaned, today, raceDays: [race], humidSpell: false }), today, cleaned),
    ).toMatchObject({
      label: "Due before the race",
      detail: expect.stringContaining("Race day Thu 3 Dec 2026"),
    });
    const yesterday = addDaysIso(today, -1);
    expect(dueStatus(cleaningDueState({ lastCleanedOn: yesterday, today, raceDays: [], humidSpell: true }), today, yesterday).label).toBe(
      "Due today (humid spell)",
    );
  });

  it("says when a clean set falls due next", () => {
    const state = cleaningDueState({ lastCleanedOn: today, today, raceDays: [], humidSpell: false });
    expect(dueStatus(state, today, today)).toEqual({
      due: false,
      icon: "✓",
      label: "Clean",
      detail: "Next clean due Wed 9 Dec 2026. Last cleaned Wed 2 Dec 2026.",
    });
  });
});

describe("buildCleaningDigest", () => {
  const sets = [
    { name: "Eight sweeps", lastCleanedOn: "2026-11-20" },
    { name: "Pair sweeps", lastCleanedOn: null },
    { name: "Green-band sculls", lastCleanedOn: "2026-12-01" },
  ].map((set) => ({
    ...set,
    state: cleaningDueState({ lastCleanedOn: set.lastCleanedOn, today, raceDays: ["2026-12-07"], humidSpell: false }),
  }));

  const digest = buildCleaningDigest({
    clubName: "Test Reach RC",
    today,
    isoWeek: "2026-W49",
    oarSets: sets,
    raceDays: ["2026-11-01", "2026-12-07"],
    humidSpell: false,
    careUrl: "http://127.0.0.1:3000/roster/fleet/care",
  });

  it("names the overdue sets in the subject count and the body, never-cleaned first", () => {
    expect(digest.subject).toBe("Slipway: 2 oar sets due for cleaning at Test Reach RC (2026-W49)");
    const lines = digest.text.split("\n");
    const dueAt = lines.indexOf("Due for cleaning (2):");
    expect(dueAt).toBeGreaterThan(0);
    // Never cleaned has no due date and sorts before any date.
    expect(lines[dueAt + 1]).toBe("- Pair sweeps: due now. No cleaning on record.");
    expect(lines[dueAt + 2]).toMatch(/^- Eight sweeps: overdue\. A week since the last clean ran out on Fri 27 Nov 2026\./);
    expect(digest.text).toContain("Up to date (1):\n- Green-band sculls: next clean due Sun 6 Dec 2026.");
  });

  it("lists only race days ahead, the humid spell, the cautions and the link", () => {
    expect(digest.text).toContain("Race days ahead: Mon 7 Dec 2026.");
    expect(digest.text).not.toContain("1 Nov 2026");
    expect(digest.text).toContain("Humid spell: off.");
    for (const caution of cleaningCautions) expect(digest.text).toContain(caution);
    expect(digest.text).toContain("Trisodium phosphate burns skin and eyes: wear gloves and eye protection");
    expect(digest.text.endsWith("Record cleanings and see the list: http://127.0.0.1:3000/roster/fleet/care")).toBe(true);
  });

  it("says so when nothing is due", () => {
    const clean = buildCleaningDigest({
      clubName: "Test Reach RC",
      today,
      isoWeek: "2026-W49",
      oarSets: [sets[2]!],
      raceDays: [],
      humidSpell: true,
      careUrl: "http://x.example/roster/fleet/care",
    });
    expect(clean.subject).toBe("Slipway: no oar sets due for cleaning at Test Reach RC (2026-W49)");
    expect(clean.text).toContain("No oar set is due for cleaning.");
    expect(clean.text).toContain("Humid spell: on.");
    expect(clean.text).toContain("No race days ahead in the club calendar.");
  });
});
