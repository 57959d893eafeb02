import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTempDataDir } from "@/tests/support/temp-data-dir";
import { closeDatabase, getSequelize, writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { seedDemoClub } from "@/lib/seed/demo-club";
import {
  attemptReview,
  attemptsOf,
  courseProgressFor,
  markLessonRead,
  quizStandingFor,
  startOrResumeAttempt,
  submitAttempt,
} from "@/lib/data/learning";
import { Club, QuizAttempt, User } from "@/models";
import type { Actor } from "@/lib/auth/permissions";
import { ConflictError, NotFoundError } from "@/lib/http/errors";
import { listModules } from "@/lib/content/modules";
import { isoDateOf } from "@/lib/clearance/dates";
import { machineTimeZone } from "@/lib/care/calendar";

createTempDataDir("learning");

async function actorFor(email: string): Promise<Actor> {
  const user = await User.findOne({ where: { email } });
  return { id: user!.id, clubId: user!.clubId, role: user!.role, name: user!.name, email: user!.email };
}

function rightAnswers(attempt: QuizAttempt): Record<string, unknown> {
  return Object.fromEntries(attempt.questions.map((question) => [question.id, question.answer]));
}

let athlete: Actor;
let otherAthlete: Actor;
let coach: Actor;

beforeAll(async () => {
  await databaseReady();
  await seedDemoClub(getSequelize());
  athlete = await actorFor("ada@lantern-reach.example");
  otherAthlete = await actorFor("bilal@lantern-reach.example");
  coach = await actorFor("coach.ines@lantern-reach.example");
});

afterAll(async () => {
  await closeDatabase();
});

describe("attempts", () => {
  it("starts an attempt whose public questions carry no answers, and resumes it until submitted", async () => {
    const opening = await startOrResumeAttempt(athlete, "overall-length");
    expect(opening.resumed).toBe(false);
    expect(opening.questions.length).toBeGreaterThanOrEqual(6);
    expect(JSON.stringify(opening.questions)).not.toMatch(/"answer"|"explanation"|"tolerance"/);
    const again = await startOrResumeAttempt(athlete, "overall-length");
    expect(again).toMatchObject({ attemptId: opening.attemptId, resumed: true });
    expect(again.questions).toEqual(opening.questions);
  });

  it("grades on the server, stores the result, and refuses a second submission with the stored result", async () => {
    const { attemptId } = await startOrResumeAttempt(athlete, "overall-length");
    const attempt = (await QuizAttempt.findByPk(attemptId))!;
    const result = await submitAttempt(athlete, attemptId, rightAnswers(attempt));
    expect(result).toMatchObject({ score: 1, passed: true, passMark: 0.8 });
    expect(result.results.every((entry) => entry.correct && entry.explanation.length > 0)).toBe(true);

    const replay = submitAttempt(athlete, attemptId, {});
    await expect(replay).rejects.toBeInstanceOf(ConflictError);
    await replay.catch((error: ConflictError) => {
      expect(error.status).toBe(409);
      expect((error.extra?.result as { score: number }).score).toBe(1);
    });
    // Stored with plain SQL, read back through the model: the same values and types.
    const stored = (await QuizAttempt.findByPk(attemptId))!;
    expect(stored.score).toBe(1);
    expect(stored.passed).toBe(true);
    expect(stored.submittedAt?.toISOString()).toBe(result.submittedAt);
    expect(stored.results).toEqual(result.results);
    expect(stored.answers).toEqual(rightAnswers(attempt));
  });

  it("stores exactly one of many submissions racing for the same attempt; the rest get that stored result", async () => {
    const racer = await actorFor("kit@lantern-reach.example");
    const { attemptId } = await startOrResumeAttempt(racer, "setting-inboard");
    const attempt = (await QuizAttempt.findByPk(attemptId))!;
    const right = rightAnswers(attempt);
    // Half send the right answers, half send none: whichever is stored, every loser must report it.
    const outcomes = await Promise.allSettled(
      Array.from({ length: 20 }, (_, index) => submitAttempt(racer, attemptId, index % 2 === 0 ? right : {})),
    );
    const stored = outcomes.filter((outcome) => outcome.status === "fulfilled");
    const refused = outcomes.filter((outcome): outcome is PromiseRejectedResult => outcome.status === "rejected");
    expect(stored).toHaveLength(1);
    expect(refused).toHaveLength(19);
    const row = (await QuizAttempt.findByPk(attemptId))!;
    expect((stored[0] as PromiseFulfilledResult<{ score: number }>).value.score).toBe(row.score);
    for (const outcome of refused) {
      expect(outcome.reason).toBeInstanceOf(ConflictError);
      expect(((outcome.reason as ConflictError).extra?.result as { score: number }).score).toBe(row.score);
    }
  });

  it("answers 404 for another athlete's attempt and for unknown modules", async () => {
    const { attemptId } = await startOrResumeAttempt(otherAthlete, "setting-inboard");
    await expect(submitAttempt(athlete, attemptId, {})).rejects.toBeInstanceOf(NotFoundError);
    await expect(startOrResumeAttempt(athlete, "no-such-module")).rejects.toBeInstanceOf(NotFoundError);
    await expect(attemptReview(athlete, attemptId)).rejects.toBeInstanceOf(NotFoundError);
  });

  it("counts a wrong submission as a failed attempt and keeps the best score", async () => {
    const { attemptId } = await startOrResumeAttempt(athlete, "grip-cleaning");
    const failed = await submitAttempt(athlete, attemptId, {});
    expect(failed).toMatchObject({ score: 0, passed: false });
    await markLessonRead(athlete, "grip-cleaning");
    await markLessonRead(athlete, "grip-cleaning");
    const course = await courseProgressFor(athlete);
    expect(course.map((entry) => entry.meta.slug)).toEqual(listModules().map((meta) => meta.slug));
    expect(course.find((entry) => entry.meta.slug === "grip-cleaning")?.progress).toMatchObject({
      stage: "quiz-failed",
      lessonRead: true,
      attempts: 1,
      bestScore: 0,
      passed: false,
    });
    expect(course.find((entry) => entry.meta.slug === "overall-length")?.progress).toMatchObject({ stage: "quiz-passed", bestScore: 1 });
  });

  it("keeps the pass mark an attempt started with when the club's setting changes later", async () => {
    const { attemptId } = await startOrResumeAttempt(otherAthlete, "changing-boats");
    await writeTransaction(async (transaction) => {
      const club = (await Club.findByPk(otherAthlete.clubId, { transaction }))!;
      await club.update({ settings: { passMark: 0.5 } }, { transaction });
    });
    const result = await submitAttempt(otherAthlete, attemptId, {});
    expect(result.passMark).toBe(0.8);
    const next = await startOrResumeAttempt(otherAthlete, "changing-boats");
    expect((await QuizAttempt.findByPk(next.attemptId))!.passMark).toBe(0.5);
  });

  it("lets a coach of the club read an athlete's attempts and reviews, and nobody else", async () => {
    const list = await attemptsOf(coach, athlete.id);
    expect(list.length).toBe(2);
    const review = await attemptReview(coach, list[0]!.attemptId);
    expect(review.results.length).toBe(review.questions.length);
    await expect(attemptsOf(otherAthlete, athlete.id)).rejects.toBeInstanceOf(NotFoundError);
  });
});

describe("the quiz page's standing", () => {
  it("says when the quiz was first passed and with what, whatever practice follows, and whether an attempt is open", async () => {
    const elin = await actorFor("elin@lantern-reach.example");
    expect(await quizStandingFor(elin, "secure-and-check")).toEqual({
      pass: null,
      bestScore: null,
      hasOpenAttempt: false,
      status: "not-started",
    });

    const missed = await startOrResumeAttempt(elin, "secure-and-check");
    expect(await quizStandingFor(elin, "secure-and-check")).toMatchObject({ pass: null, hasOpenAttempt: true });
    await submitAttempt(elin, missed.attemptId, {});
    expect(await quizStandingFor(elin, "secure-and-check")).toMatchObject({ pass: null, bestScore: 0, status: "quiz-failed" });

    const passing = await startOrResumeAttempt(elin, "secure-and-check");
    const passed = await submitAttempt(elin, passing.attemptId, rightAnswers((await QuizAttempt.findByPk(passing.attemptId))!));
    const afterPass = {
      pass: {
        passedAt: passed.submittedAt,
        // The demo club sets no time zone: its day is the machine's.
        passedOn: isoDateOf(new Date(passed.submittedAt), machineTimeZone()),
        score: 1,
      },
      bestScore: 1,
      hasOpenAttempt: false,
      status: "ready-for-sign-off",
    };
    expect(await quizStandingFor(elin, "secure-and-check")).toEqual(afterPass);

    // A practice attempt is open until handed in; a poor practice score leaves the pass as it was.
    const practice = await startOrResumeAttempt(elin, "secure-and-check");
    expect(practice.resumed).toBe(false);
    expect(await quizStandingFor(elin, "secure-and-check")).toEqual({ ...afterPass, hasOpenAttempt: true });
    await submitAttempt(elin, practice.attemptId, {});
    expect(await quizStandingFor(elin, "secure-and-check")).toEqual(afterPass);
  });

  it("answers 404 for a module the course does not have", async () => {
    await expect(quizStandingFor(athlete, "no-such-module")).rejects.toBeInstanceOf(NotFoundError);
  });
});
