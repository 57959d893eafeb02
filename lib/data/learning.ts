import "server-only";
import { randomUUID } from "node:crypto";
import { Op } from "sequelize";
import { writeKeyedUpdate, writeTransaction, type KeyedUpdate } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { rawBoolean, rawDate, rawJson, selectRows, sqliteDateTime } from "@/lib/data/sql";
import { settingsForClub } from "@/lib/data/club-settings";
import { clubCertificationContext, factsForAthletes } from "@/lib/data/certification-facts";
import { assertVisible, canViewAthlete, type Actor } from "@/lib/auth/permissions";
import { ConflictError, NotFoundError } from "@/lib/http/errors";
import { getModule, listModules } from "@/lib/content/modules";
import type { ModuleMeta } from "@/lib/content/module-schema";
import { buildQuiz, toPublicQuestion } from "@/lib/quiz/build";
import { gradeQuiz } from "@/lib/quiz/grade";
import type { PublicQuestion, Question } from "@/lib/quiz/types";
import { moduleProgress, type ModuleProgress } from "@/lib/learning/progress";
import { firstQuizPass } from "@/lib/learning/quiz-pass";
import { athleteStanding } from "@/lib/clearance/athlete-summary";
import { isoDateOf } from "@/lib/clearance/dates";
import type { ModuleStatus } from "@/lib/clearance/rules";
import { LessonRead, QuizAttempt, User } from "@/models";
import type { StoredResult } from "@/models/QuizAttempt";

export interface CourseModule {
  meta: ModuleMeta;
  progress: ModuleProgress;
}

export interface AttemptOpening {
  attemptId: string;
  moduleSlug: string;
  questions: PublicQuestion[];
  resumed: boolean;
  startedAt: string;
}

export interface AttemptResult {
  attemptId: string;
  score: number;
  passed: boolean;
  passMark: number;
  results: StoredResult[];
  submittedAt: string;
}

function requireModule(slug: string): ModuleMeta {
  const lesson = getModule(slug);
  if (!lesson) throw new NotFoundError("There is no module with that name.");
  return lesson.meta;
}

/** Every module in course order with the athlete's progress. */
export async function courseProgressFor(actor: Actor, athleteId = actor.id): Promise<CourseModule[]> {
  await databaseReady();
  const athlete = await User.findByPk(athleteId);
  assertVisible(!!athlete && canViewAthlete(actor, athlete));
  const [reads, attempts] = await Promise.all([
    LessonRead.findAll({ where: { userId: athleteId } }),
    QuizAttempt.findAll({ where: { userId: athleteId }, attributes: ["moduleSlug", "score", "passed", "submittedAt"] }),
  ]);
  const readSlugs = new Set(reads.map((read) => read.moduleSlug));
  return listModules().map((meta) => ({ meta, progress: moduleProgress(meta.slug, readSlugs.has(meta.slug), attempts) }));
}

export interface QuizStanding {
  /** The first passing submission (ISO time, its day, score 0–1), or null while the quiz is not passed. */
  pass: { passedAt: string; passedOn: string; score: number | null } | null;
  /** Best submitted score 0–1, or null before the first submission. */
  bestScore: number | null;
  /** An attempt started and not yet submitted: the quiz page resumes it. */
  hasOpenAttempt: boolean;
  /** The module's status, quiz and practical together. */
  status: ModuleStatus;
}

/** The signed-in athlete's standing with one module's quiz: passed when and with what, an open attempt, the module's status. */
export async function quizStandingFor(actor: Actor, slug: string): Promise<QuizStanding> {
  await databaseReady();
  requireModule(slug);
  const [context, facts] = await Promise.all([
    clubCertificationContext(actor.clubId),
    factsForAthletes([actor.id]).then((byAthlete) => byAthlete.get(actor.id)!),
  ]);
  const { timeZone } = context.settings;
  const standing = athleteStanding(
    context.modules.map((meta) => meta.slug),
    context.requiredModules,
    facts,
    { today: isoDateOf(new Date(), timeZone), timeZone },
  ).modules.find((entry) => entry.slug === slug)!;
  const pass = firstQuizPass(slug, facts.attempts);
  return {
    pass: pass && {
      passedAt: pass.submittedAt.toISOString(),
      passedOn: isoDateOf(pass.submittedAt, timeZone),
      score: pass.score,
    },
    bestScore: standing.progress.bestScore,
    hasOpenAttempt: standing.progress.hasOpenAttempt,
    status: standing.status,
  };
}

/** Records the first time the athlete finished reading a lesson; later reads change nothing. */
export async function markLessonRead(actor: Actor, slug: string): Promise<void> {
  await databaseReady();
  requireModule(slug);
  await writeTransaction(async (transaction) => {
    const existing = await LessonRead.findOne({ where: { userId: actor.id, moduleSlug: slug }, transaction });
    if (!existing) await LessonRead.create({ userId: actor.id, moduleSlug: slug, readAt: new Date() }, { transaction });
  });
}

function opening(attempt: QuizAttempt, resumed: boolean): AttemptOpening {
  return {
    attemptId: attempt.id,
    moduleSlug: attempt.moduleSlug,
    questions: attempt.questions.map(toPublicQuestion),
    resumed,
    startedAt: attempt.startedAt.toISOString(),
  };
}

/**
 * Resumes the athlete's open attempt at a module's quiz, or starts a new one from a fresh seed with the
 * club's current click size, half swivel width and pass mark (stored with the attempt, so later changes
 * to the settings never rewrite it).
 */
export async function startOrResumeAttempt(actor: Actor, slug: string): Promise<AttemptOpening> {
  await databaseReady();
  const meta = requireModule(slug);
  const settings = await settingsForClub(actor.clubId);
  return writeTransaction(async (transaction) => {
    const open = await QuizAttempt.findOne({
      where: { userId: actor.id, moduleSlug: slug, submittedAt: null },
      order: [["startedAt", "DESC"]],
      transaction,
    });
    if (open) return opening(open, true);
    const id = randomUUID();
    const quizSettings = { clickCm: settings.clickCm, halfSwivelCm: settings.halfSwivelCm };
    const questions = buildQuiz({ recipe: meta.quiz, seed: id, settings: quizSettings });
    const attempt = await QuizAttempt.create(
      {
        id,
        userId: actor.id,
        clubId: actor.clubId,
        moduleSlug: slug,
        seed: id,
        questions,
        passMark: meta.passMark ?? settings.passMark,
        quizSettings,
        startedAt: new Date(),
      },
      { transaction },
    );
    return opening(attempt, false);
  });
}

function resultOf(attempt: QuizAttempt): AttemptResult {
  return {
    attemptId: attempt.id,
    score: attempt.score ?? 0,
    passed: attempt.passed ?? false,
    passMark: attempt.passMark,
    results: attempt.results ?? [],
    submittedAt: attempt.submittedAt?.toISOString() ?? "",
  };
}

interface AttemptRow {
  id: string;
  user_id: number;
  questions: string;
  pass_mark: number;
  score: number | null;
  passed: number | null;
  results: string | null;
  submitted_at: string | null;
}

function storedResultOf(row: AttemptRow): AttemptResult {
  return {
    attemptId: row.id,
    score: row.score ?? 0,
    passed: rawBoolean(row.passed) ?? false,
    passMark: row.pass_mark,
    results: rawJson<StoredResult[]>(row.results) ?? [],
    submittedAt: rawDate(row.submitted_at)?.toISOString() ?? "",
  };
}

function alreadySubmitted(row: AttemptRow): ConflictError {
  return new ConflictError("This attempt was already submitted; here is its stored result.", { extra: { result: storedResultOf(row) } });
}

const selectAttempt = "SELECT id, user_id, questions, pass_mark, score, passed, results, submitted_at FROM quiz_attempts WHERE id = ?";

/** Stores a grade only while the attempt is open (the write queue merges these, see writeKeyedUpdate). */
const storeGrade: KeyedUpdate = {
  table: "quiz_attempts",
  key: "id",
  columns: ["answers", "score", "passed", "results", "submitted_at"],
  condition: "target.submitted_at IS NULL",
};

/**
 * Grades and stores a submission. The attempt id is the idempotency key: a second submission of the
 * same attempt changes nothing and is refused with 409, carrying the stored result.
 *
 * The attempt is read and graded outside the write queue (its questions never change once started);
 * inside, one conditional UPDATE stores the grade only if the attempt is still open, so of two
 * submissions racing for the same attempt exactly one is stored and the other gets the stored result.
 * Both statements are plain SQL (lib/data/sql.ts), and the UPDATE goes through `writeKeyedUpdate`,
 * which merges submissions that queue up together into one statement: this is the busiest write.
 */
export async function submitAttempt(actor: Actor, attemptId: string, answers: Record<string, unknown>): Promise<AttemptResult> {
  await databaseReady();
  const [attempt] = await selectRows<AttemptRow>(selectAttempt, [attemptId]);
  assertVisible(!!attempt && attempt.user_id === actor.id);
  if (attempt.submitted_at !== null) throw alreadySubmitted(attempt);
  const questions = rawJson<Question[]>(attempt.questions) ?? [];
  const known = new Set(questions.map((question) => question.id));
  const relevant = Object.fromEntries(Object.entries(answers).filter(([id]) => known.has(id)));
  const grade = gradeQuiz(questions, relevant, attempt.pass_mark);
  const results: StoredResult[] = grade.results.map(({ id, correct, expected, explanation }) => ({ id, correct, expected, explanation }));
  const submittedAt = new Date();
  const stored = await writeKeyedUpdate(storeGrade, attemptId, [
    JSON.stringify(relevant),
    grade.score,
    grade.passed ? 1 : 0,
    JSON.stringify(results),
    sqliteDateTime(submittedAt),
  ]);
  if (!stored) {
    const [winner] = await selectRows<AttemptRow>(selectAttempt, [attemptId]);
    throw alreadySubmitted(winner!);
  }
  return {
    attemptId,
    score: grade.score,
    passed: grade.passed,
    passMark: attempt.pass_mark,
    results,
    submittedAt: submittedAt.toISOString(),
  };
}

export interface AttemptReview extends AttemptResult {
  moduleSlug: string;
  questions: PublicQuestion[];
  answers: Record<string, unknown>;
}

/** A submitted attempt with its questions, the athlete's answers and the worked solutions. */
export async function attemptReview(actor: Actor, attemptId: string): Promise<AttemptReview> {
  await databaseReady();
  const attempt = await QuizAttempt.findByPk(attemptId);
  const athlete = attempt ? await User.findByPk(attempt.userId) : null;
  assertVisible(!!attempt && !!athlete && canViewAthlete(actor, athlete) && attempt.submittedAt !== null);
  return {
    ...resultOf(attempt),
    moduleSlug: attempt.moduleSlug,
    questions: attempt.questions.map(toPublicQuestion),
    answers: attempt.answers ?? {},
  };
}

export interface AttemptListEntry {
  attemptId: string;
  moduleSlug: string;
  score: number | null;
  passed: boolean | null;
  startedAt: string;
  submittedAt: string | null;
}

/** An athlete's attempts, newest first (the athlete themselves, or a coach of their club). */
export async function attemptsOf(actor: Actor, athleteId: number, moduleSlug?: string): Promise<AttemptListEntry[]> {
  await databaseReady();
  const athlete = await User.findByPk(athleteId);
  assertVisible(!!athlete && canViewAthlete(actor, athlete));
  const attempts = await QuizAttempt.findAll({
    where: { userId: athleteId, ...(moduleSlug ? { moduleSlug } : {}), submittedAt: { [Op.ne]: null } },
    attributes: ["id", "moduleSlug", "score", "passed", "startedAt", "submittedAt"],
    order: [["submittedAt", "DESC"]],
  });
  return attempts.map((attempt) => ({
    attemptId: attempt.id,
    moduleSlug: attempt.moduleSlug,
    score: attempt.score,
    passed: attempt.passed,
    startedAt: attempt.startedAt.toISOString(),
    submittedAt: attempt.submittedAt?.toISOString() ?? null,
  }));
}
