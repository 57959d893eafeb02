import { randomUUID } from "node:crypto";
import { closeDatabase, getSequelize, writeTransaction } from "@/lib/db";
import { migrateToLatest } from "@/lib/migrate";
import { demoClub, demoPassword, seedDemoClub } from "@/lib/seed/demo-club";
import { hashPassword } from "@/lib/auth/password";
import { listModules } from "@/lib/content/modules";
import type { ModuleMeta } from "@/lib/content/module-schema";
import { buildQuiz } from "@/lib/quiz/build";
import { gradeQuiz } from "@/lib/quiz/grade";
import { createRng } from "@/lib/quiz/random";
import type { Question, QuizSettings, Rng } from "@/lib/quiz/types";
import { readClubSettings } from "@/lib/validations/club-settings";
import { Club, LessonRead, QuizAttempt, User, initModels } from "@/models";
import type { InferCreationAttributes } from "sequelize";

/** An open attempt made for the load tests: who owns it and the submission body to send. */
export interface PoolAttempt {
  attemptId: string;
  email: string;
  body: string;
}

export interface Dataset {
  athletes: number;
  modules: string[];
  lessonReads: number;
  submittedAttempts: number;
  /** Bench athletes: the owners of the open attempts; they sign in with the demo password. */
  benchEmails: string[];
  password: string;
  /** Open attempts for the submit run and for the writes running beside the roster run; disjoint. */
  submitPool: PoolAttempt[];
  writePool: PoolAttempt[];
  seconds: number;
}

export interface DatasetOptions {
  athletes: number;
  benchAthletes: number;
  submitPoolSize: number;
  writePoolSize: number;
}

const rowsPerInsert = 500;
const dayMs = 24 * 60 * 60 * 1000;

// Invented name parts; combined at random they name no real person.
const givenStarts = [
  "Al",
  "Bren",
  "Cor",
  "Da",
  "El",
  "Fen",
  "Gar",
  "Hal",
  "Is",
  "Jor",
  "Kae",
  "Lu",
  "Mor",
  "Nel",
  "Or",
  "Pel",
  "Ri",
  "Sol",
  "Tam",
  "Vey",
];
const givenEnds = ["ra", "ric", "lin", "mo", "na", "dan", "wyn", "sa", "thel", "lo"];
const familyStarts = [
  "Ash",
  "Brack",
  "Cold",
  "Dun",
  "Fern",
  "Glim",
  "Holl",
  "Kest",
  "Lark",
  "Marl",
  "Nettle",
  "Quill",
  "Reed",
  "Skel",
  "Thorn",
  "Wend",
];
const familyEnds = ["by", "combe", "ford", "ley", "mere", "ridge", "ton", "wick", "well", "hallow"];

function pick<T>(rng: Rng, list: readonly T[]): T {
  return list[Math.floor(rng() * list.length)]!;
}

function inventedName(rng: Rng): string {
  return `${pick(rng, givenStarts)}${pick(rng, givenEnds)} ${pick(rng, familyStarts)}${pick(rng, familyEnds)}`;
}

/** An answer to one question: right with probability `pRight`, otherwise a plausible wrong one. */
function answerFor(question: Question, rng: Rng, pRight: number): unknown {
  const right = rng() < pRight;
  const { answer } = question;
  const choices = (question.choices ?? []).map((choice) => choice.id);
  if (question.kind === "numeric") return right ? answer : Number(answer) + 3;
  if (question.kind === "single") return right ? answer : (choices.find((id) => id !== answer) ?? answer);
  if (!Array.isArray(answer)) return answer;
  if (right) return answer;
  return question.kind === "order" ? [...answer].reverse() : answer.slice(0, Math.max(1, answer.length - 1));
}

function answersFor(questions: readonly Question[], rng: Rng, pRight: number): Record<string, unknown> {
  return Object.fromEntries(questions.map((question) => [question.id, answerFor(question, rng, pRight)]));
}

async function insertInChunks<T>(rows: T[], insert: (chunk: T[]) => Promise<unknown>): Promise<void> {
  for (let start = 0; start < rows.length; start += rowsPerInsert) {
    await insert(rows.slice(start, start + rowsPerInsert));
  }
}

type AttemptRow = InferCreationAttributes<QuizAttempt>;

/**
 * Migrates a fresh database (the data dir in SLIPWAY_DATA_DIR), seeds the demo club, then adds a large
 * invented club to it: `athletes` athletes, each with history in every module of the course (a lesson
 * read and one to three submitted attempts built and graded with the real quiz code), plus open
 * attempts owned by the first `benchAthletes` athletes for the submit load tests. Inserts in bulk.
 */
export async function generateDataset(options: DatasetOptions): Promise<Dataset> {
  const started = Date.now();
  const sequelize = getSequelize();
  await migrateToLatest(sequelize);
  await seedDemoClub(sequelize);
  initModels(sequelize);

  const club = await Club.findOne({ where: { slug: demoClub.slug } });
  if (!club) throw new Error("the demo club was not seeded");
  const settings = readClubSettings(club.settings);
  const quizSettings: QuizSettings = { clickCm: settings.clickCm, halfSwivelCm: settings.halfSwivelCm };
  const modules: ModuleMeta[] = listModules();
  const rng = createRng("slipway-bench-club");
  const now = Date.now();
  const passwordHash = await hashPassword(demoPassword);

  const userRows = Array.from({ length: options.athletes }, (_, index) => ({
    clubId: club.id,
    email: `rower.${String(index + 1).padStart(4, "0")}@lantern-reach.example`,
    name: inventedName(rng),
    role: "athlete" as const,
    passwordHash,
    lastSignInAt: new Date(now - Math.floor(rng() * 60) * dayMs),
  }));
  await writeTransaction(async (transaction) => {
    await insertInChunks(userRows, (chunk) => User.bulkCreate(chunk, { transaction }));
  });
  const users = await User.findAll({
    where: { email: userRows.map((row) => row.email) },
    attributes: ["id", "email"],
    order: [["id", "ASC"]],
  });
  const idByEmail = new Map(users.map((user) => [user.email, user.id]));

  const readRows: { userId: number; moduleSlug: string; readAt: Date }[] = [];
  const attemptRows: AttemptRow[] = [];
  const attemptFor = (userId: number, meta: ModuleMeta, startedAt: Date): AttemptRow => {
    const id = randomUUID();
    return {
      id,
      userId,
      clubId: club.id,
      moduleSlug: meta.slug,
      seed: id,
      questions: buildQuiz({ recipe: meta.quiz, seed: id, settings: quizSettings }),
      passMark: meta.passMark ?? settings.passMark,
      quizSettings,
      answers: null,
      score: null,
      passed: null,
      results: null,
      startedAt,
      submittedAt: null,
    };
  };

  for (const row of userRows) {
    const userId = idByEmail.get(row.email)!;
    let day = 90 + Math.floor(rng() * 90);
    for (const meta of modules) {
      day -= 1 + Math.floor(rng() * 10);
      readRows.push({ userId, moduleSlug: meta.slug, readAt: new Date(now - day * dayMs) });
      const tries = rng() < 0.6 ? 1 : rng() < 0.75 ? 2 : 3;
      for (let attempt = 1; attempt <= tries; attempt += 1) {
        const startedAt = new Date(now - day * dayMs + attempt * 3_600_000);
        const open = attemptFor(userId, meta, startedAt);
        const isLast = attempt === tries;
        const answers = answersFor(open.questions, rng, isLast && rng() < 0.85 ? 0.97 : 0.5);
        const grade = gradeQuiz(open.questions, answers, open.passMark);
        attemptRows.push({
          ...open,
          answers,
          score: grade.score,
          passed: grade.passed,
          results: grade.results.map(({ id, correct, expected, explanation }) => ({ id, correct, expected, explanation })),
          submittedAt: new Date(startedAt.getTime() + 6 * 60_000),
        });
      }
    }
  }
  const submittedAttempts = attemptRows.length;

  const benchEmails = userRows.slice(0, options.benchAthletes).map((row) => row.email);
  const makePool = (size: number): PoolAttempt[] =>
    Array.from({ length: size }, (_, index) => {
      const email = benchEmails[index % benchEmails.length]!;
      const meta = modules[index % modules.length]!;
      const open = attemptFor(idByEmail.get(email)!, meta, new Date(now - 60_000));
      attemptRows.push(open);
      return { attemptId: open.id, email, body: JSON.stringify({ answers: answersFor(open.questions, rng, 0.8) }) };
    });
  const submitPool = makePool(options.submitPoolSize);
  const writePool = makePool(options.writePoolSize);

  await writeTransaction(async (transaction) => {
    await insertInChunks(readRows, (chunk) => LessonRead.bulkCreate(chunk, { transaction }));
    await insertInChunks(attemptRows, (chunk) => QuizAttempt.bulkCreate(chunk, { transaction }));
  });
  await closeDatabase();

  return {
    athletes: options.athletes,
    modules: modules.map((meta) => meta.slug),
    lessonReads: readRows.length,
    submittedAttempts,
    benchEmails,
    password: demoPassword,
    submitPool,
    writePool,
    seconds: (Date.now() - started) / 1000,
  };
}
