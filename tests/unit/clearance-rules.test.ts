import { describe, expect, it } from "vitest";
import { addMonthsIso, daysUntil, expiryVerb, formatLongDate, isoDateOf, lastValidDay } from "@/lib/clearance/dates";
import {
  clearanceFor,
  expiresWithin,
  isPassCurrent,
  latestPasses,
  moduleStatus,
  passExpiresOn,
  signOffRequestProblem,
  type ModulePass,
} from "@/lib/clearance/rules";
import { assessmentOutcome } from "@/lib/clearance/checklist";
import { athleteStanding, type AthleteFacts } from "@/lib/clearance/athlete-summary";
import { certificateStatus } from "@/lib/certificates/status";

const required = ["overall-length", "setting-inboard"];

function pass(moduleSlug: string, signedOffOn: string, months = 12): ModulePass {
  return { moduleSlug, signedOffOn, expiresOn: passExpiresOn(signedOffOn, months) };
}

describe("dates", () => {
  it("adds calendar months, clamping to the end of a shorter month", () => {
    expect(addMonthsIso("2026-03-14", 12)).toBe("2027-03-14");
    expect(addMonthsIso("2026-01-31", 1)).toBe("2026-02-28");
    expect(addMonthsIso("2027-01-31", 13)).toBe("2028-02-29");
    expect(addMonthsIso("2026-11-30", 3)).toBe("2027-02-28");
    expect(addMonthsIso("2026-12-15", 1)).toBe("2027-01-15");
    expect(() => addMonthsIso("2026-02-30", 1)).toThrow(RangeError);
    expect(() => addMonthsIso("2026-02-01", 1.5)).toThrow(RangeError);
  });

  it("counts days and formats dates as written", () => {
    expect(daysUntil("2026-12-31", "2027-01-30")).toBe(30);
    expect(isoDateOf(new Date("2026-06-30T23:59:59Z"), "UTC")).toBe("2026-06-30");
    expect(formatLongDate("2027-03-14")).toBe("14 March 2027");
  });

  it("names the last day a pass counts: the day before it expires", () => {
    const pass = { moduleSlug: "overall-length", signedOffOn: "2025-12-16", expiresOn: "2026-12-16" };
    expect(lastValidDay(pass.expiresOn)).toBe("2026-12-15");
    expect(isPassCurrent(pass, lastValidDay(pass.expiresOn))).toBe(true);
    expect(isPassCurrent(pass, pass.expiresOn)).toBe(false);
    expect(lastValidDay("2027-03-01")).toBe("2027-02-28");
    expect(lastValidDay("2027-01-01")).toBe("2026-12-31");
  });

  it("says a pass expires up to its last valid day, and expired from its expiry day on", () => {
    expect(expiryVerb("2026-12-16", lastValidDay("2026-12-16"))).toBe("expires");
    expect(expiryVerb("2026-12-16", "2026-12-16")).toBe("expired");
    expect(expiryVerb("2026-12-16", "2027-01-02")).toBe("expired");
  });
});

describe("the club's day of an instant", () => {
  // Offsets from the IANA Time Zone Database (tzdata, IANA, 2025): New Zealand UTC+13 in its summer
  // (December) and UTC+12 in winter (July), New South Wales UTC+10 in June, California UTC-8 in January.
  it.each([
    ["2026-12-02T17:00:00Z", "Pacific/Auckland", "2026-12-03"], // 06:00 on 3 December there
    ["2026-12-02T17:00:00Z", "UTC", "2026-12-02"],
    ["2026-06-14T20:30:00Z", "Australia/Sydney", "2026-06-15"], // 06:30 on 15 June
    ["2027-01-01T05:00:00Z", "America/Los_Angeles", "2026-12-31"], // 21:00 on New Year's Eve
    ["2026-07-01T11:59:00Z", "Pacific/Auckland", "2026-07-01"], // 23:59
    ["2026-07-01T12:00:00Z", "Pacific/Auckland", "2026-07-02"], // midnight: the club's new day
  ])("%s is %s's %s", (instant, zone, day) => {
    expect(isoDateOf(new Date(instant), zone)).toBe(day);
  });

  it("dates a sign-off on the club's day, so the pass expires on that day a year later", () => {
    const signedOffOn = isoDateOf(new Date("2026-12-02T17:00:00Z"), "Pacific/Auckland");
    expect(passExpiresOn(signedOffOn, 12)).toBe("2027-12-03");
  });

  it("lets a certificate expire when the club's expiry day begins, not UTC's", () => {
    const certificate = { kind: "module" as const, expiresOn: "2027-12-03", revoked: false };
    const lastMinute = new Date("2027-12-02T10:59:00Z"); // 23:59 on 2 December in Auckland
    const midnight = new Date("2027-12-02T11:00:00Z"); // 00:00 on 3 December in Auckland
    expect(certificateStatus(certificate, isoDateOf(lastMinute, "Pacific/Auckland"), false)).toBe("valid");
    expect(certificateStatus(certificate, isoDateOf(midnight, "Pacific/Auckland"), false)).toBe("expired");
    expect(certificateStatus(certificate, isoDateOf(midnight, "UTC"), false)).toBe("valid");
  });
});

describe("a module pass", () => {
  it("expires clearanceMonths after its sign-off day", () => {
    expect(passExpiresOn("2026-03-14", 12)).toBe("2027-03-14");
    expect(passExpiresOn("2026-03-14", 6)).toBe("2026-09-14");
    expect(() => passExpiresOn("2026-03-14", 0)).toThrow(RangeError);
  });

  it("still counts the day before it expires and no longer on the expiry day (the boundary)", () => {
    const held = pass("overall-length", "2026-03-14");
    expect(isPassCurrent(held, "2026-03-14")).toBe(true);
    expect(isPassCurrent(held, "2027-03-13")).toBe(true);
    expect(isPassCurrent(held, "2027-03-14")).toBe(false);
    expect(isPassCurrent(held, "2027-03-15")).toBe(false);
    expect(isPassCurrent(held, "2026-03-13")).toBe(false);
  });

  it("keeps the longest-lasting pass of each module", () => {
    const latest = latestPasses([
      pass("overall-length", "2025-01-01"),
      pass("overall-length", "2026-02-01"),
      pass("setting-inboard", "2025-06-01"),
    ]);
    expect(latest.get("overall-length")?.signedOffOn).toBe("2026-02-01");
    expect(latest.get("setting-inboard")?.signedOffOn).toBe("2025-06-01");
  });
});

describe("clearance to rig unsupervised", () => {
  const passes = [pass("overall-length", "2026-03-14"), pass("setting-inboard", "2026-05-02")];

  it("holds when every required module has a current pass, and expires with the first pass to run out", () => {
    const clearance = clearanceFor({
      requiredModules: required,
      passes,
      suspension: null,
      today: "2026-06-01",
    });
    expect(clearance).toMatchObject({
      state: "cleared",
      cleared: true,
      expiresOn: "2027-03-14",
      missingModules: [],
      expiredModules: [],
    });
  });

  it("holds on the day before the first expiry and not on the expiry day itself", () => {
    expect(clearanceFor({ requiredModules: required, passes, suspension: null, today: "2027-03-13" }).cleared).toBe(true);
    const onTheDay = clearanceFor({
      requiredModules: required,
      passes,
      suspension: null,
      today: "2027-03-14",
    });
    expect(onTheDay).toMatchObject({
      state: "expired",
      cleared: false,
      expiredModules: ["overall-length"],
      expiresOn: null,
    });
  });

  it("does not hold while a required module is missing, whatever else is passed", () => {
    const clearance = clearanceFor({
      requiredModules: [...required, "grip-cleaning"],
      passes: [...passes, pass("changing-boats", "2026-05-02")],
      suspension: null,
      today: "2026-06-01",
    });
    expect(clearance).toMatchObject({ state: "not-cleared", missingModules: ["grip-cleaning"] });
  });

  it("ignores passes of modules the club does not require", () => {
    const clearance = clearanceFor({
      requiredModules: ["setting-inboard"],
      passes,
      suspension: null,
      today: "2027-04-01",
    });
    expect(clearance).toMatchObject({ state: "cleared", expiresOn: "2027-05-02" });
  });

  it("is suspended by a coach whatever the passes say", () => {
    const suspension = { reason: "Collar left loose on the water", since: "2026-06-01" };
    const clearance = clearanceFor({ requiredModules: required, passes, suspension, today: "2026-06-02" });
    expect(clearance).toMatchObject({ state: "suspended", cleared: false, suspension });
  });

  it("clears nobody when the club requires no modules", () => {
    expect(clearanceFor({ requiredModules: [], passes, suspension: null, today: "2026-06-01" }).state).toBe("not-cleared");
  });

  it("counts a pass signed off in the future as missing (clock skew never clears early)", () => {
    expect(clearanceFor({ requiredModules: required, passes, suspension: null, today: "2026-04-01" }).missingModules).toEqual([
      "setting-inboard",
    ]);
  });

  it("says when it runs out within a window, counting the last day", () => {
    const clearance = clearanceFor({
      requiredModules: required,
      passes,
      suspension: null,
      today: "2027-02-12",
    });
    expect(expiresWithin(clearance, "2027-02-12", 30)).toBe(true);
    const earlier = clearanceFor({
      requiredModules: required,
      passes,
      suspension: null,
      today: "2027-02-11",
    });
    expect(expiresWithin(earlier, "2027-02-11", 30)).toBe(false);
  });
});

describe("module status", () => {
  const today = "2026-06-01";
  const base = { latestPass: null, openRequest: false, latestDecision: null, today };

  it("follows the quiz until the practical starts", () => {
    expect(moduleStatus({ ...base, quizStage: "not-started" })).toBe("not-started");
    expect(moduleStatus({ ...base, quizStage: "quiz-failed" })).toBe("quiz-failed");
    expect(moduleStatus({ ...base, quizStage: "quiz-passed" })).toBe("ready-for-sign-off");
  });

  it("is passed only with the quiz passed and a current sign-off", () => {
    const latestPass = pass("overall-length", "2026-02-01");
    expect(moduleStatus({ ...base, quizStage: "quiz-passed", latestPass })).toBe("passed");
    expect(moduleStatus({ ...base, quizStage: "quiz-passed", latestPass, today: "2027-02-01" })).toBe("expired");
    expect(moduleStatus({ ...base, quizStage: "quiz-passed", openRequest: true })).toBe("waiting-for-sign-off");
  });

  it("shows the coach's 'not yet' until a later pass", () => {
    const notYet = { outcome: "not-yet" as const, decidedOn: "2026-05-20" };
    expect(moduleStatus({ ...base, quizStage: "quiz-passed", latestDecision: notYet })).toBe("not-yet");
    expect(moduleStatus({ ...base, quizStage: "quiz-passed", latestDecision: notYet, openRequest: true })).toBe("waiting-for-sign-off");
  });
});

describe("asking for a sign-off", () => {
  const today = "2026-06-01";
  it("needs a passed quiz and no open request", () => {
    expect(signOffRequestProblem({ quizPassed: false, openRequest: false, latestPass: null, today })).toMatch(/quiz first/);
    expect(signOffRequestProblem({ quizPassed: true, openRequest: true, latestPass: null, today })).toMatch(/already asked/);
    expect(signOffRequestProblem({ quizPassed: true, openRequest: false, latestPass: null, today })).toBeNull();
  });

  it("allows a renewal only in the last 30 days of a pass", () => {
    const latestPass = pass("overall-length", "2025-07-01");
    expect(signOffRequestProblem({ quizPassed: true, openRequest: false, latestPass, today: "2026-05-31" })).toMatch(/renew/);
    expect(signOffRequestProblem({ quizPassed: true, openRequest: false, latestPass, today: "2026-06-01" })).toBeNull();
  });
});

describe("checklist outcome", () => {
  const checklist = [
    { id: "a", label: "A" },
    { id: "b", label: "B" },
  ];
  it("passes only when every item was met", () => {
    expect(assessmentOutcome(checklist, { a: "met", b: "met" })).toBe("passed");
    expect(assessmentOutcome(checklist, { a: "met", b: "not-yet" })).toBe("not-yet");
    expect(assessmentOutcome(checklist, { a: "met" })).toBe("not-yet");
    expect(assessmentOutcome([], {})).toBe("not-yet");
  });
});

describe("an athlete's standing on the club's calendar", () => {
  // New Zealand is UTC+13 in December (IANA Time Zone Database (tzdata), IANA, 2025).
  const auckland = "Pacific/Auckland";
  const quizPassed = {
    moduleSlug: "overall-length",
    score: 1,
    passed: true,
    submittedAt: new Date("2025-11-20T08:00:00Z"),
  };
  const facts = (overrides: Partial<AthleteFacts>): AthleteFacts => ({
    lessonReads: ["overall-length"],
    attempts: [quizPassed],
    assessments: [],
    passes: [],
    suspension: null,
    ...overrides,
  });

  it("dates a coach's suspension on the club's day", () => {
    // 07:00 on 3 December in Auckland.
    const suspendedAt = new Date("2026-12-02T18:00:00Z");
    const suspended = facts({ suspension: { reason: "Collar not seated", suspendedAt } });
    const clearance = (timeZone: string) =>
      athleteStanding(["overall-length"], ["overall-length"], suspended, { today: "2026-12-03", timeZone }).clearance;
    expect(clearance(auckland)).toMatchObject({
      state: "suspended",
      suspension: { reason: "Collar not seated", since: "2026-12-03" },
    });
    expect(clearance("UTC").suspension?.since).toBe("2026-12-02");
  });

  it("compares a coach's 'not yet' with the pass by the club's day of the decision", () => {
    // Signed off on 3 December 2025 (the club's day), so expired by December 2026. A 'not yet' recorded
    // at 09:00 on 3 December in Auckland (20:00 UTC on the 2nd) is on the pass's own day, not before it.
    const standing = (timeZone: string) =>
      athleteStanding(
        ["overall-length"],
        ["overall-length"],
        facts({
          passes: [pass("overall-length", "2025-12-03")],
          assessments: [
            {
              moduleSlug: "overall-length",
              status: "not-yet",
              requestedAt: new Date("2025-12-01T20:00:00Z"),
              assessedAt: new Date("2025-12-02T20:00:00Z"),
            },
          ],
        }),
        { today: "2026-12-10", timeZone },
      ).modules[0]!.status;
    expect(standing(auckland)).toBe("not-yet");
    expect(standing("UTC")).toBe("expired");
  });
});
