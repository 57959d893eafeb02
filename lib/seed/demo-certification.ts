import { randomUUID } from "node:crypto";
import type { Sequelize, Transaction } from "sequelize";
import { writeTransaction } from "@/lib/db";
import { clubCertificationContext, type ClubCertificationContext } from "@/lib/data/certification-facts";
import { issueCertificate, issueClearanceIfNewlyHeld } from "@/lib/data/certificate-issue";
import { recordAudit } from "@/lib/data/audit";
import { listModules } from "@/lib/content/modules";
import type { ModuleMeta } from "@/lib/content/module-schema";
import { buildQuiz } from "@/lib/quiz/build";
import { gradeQuiz } from "@/lib/quiz/grade";
import { addDaysIso } from "@/lib/care/dates";
import { isoDateOf } from "@/lib/clearance/dates";
import { passExpiresOn } from "@/lib/clearance/rules";
import { demoClub } from "@/lib/seed/demo-club";
import { Certificate, ClearanceSuspension, Club, LessonRead, PracticalAssessment, QuizAttempt, User, initModels } from "@/models";

type Plan = {
  email: string;
  /** Modules whose lesson was read (quiz attempts read the lesson too). */
  reads?: string[];
  /** Modules with one failed attempt, and whether a later attempt passed. */
  failedFirst?: string[];
  passedQuizzes?: string[];
  /** Practical sign-offs: module → days ago, by coach e-mail. */
  signedOff?: { slug: string; daysAgo: number; coach: string }[];
  notYet?: { slug: string; daysAgo: number; coach: string; note: string }[];
  waiting?: { slug: string; daysAgo: number; coach: string | null }[];
  suspend?: { daysAgo: number; coach: string; reason: string };
  revoke?: { slug: string; daysAgo: number; reason: string };
};

const tobias = "coach.tobias@lantern-reach.example";
const ines = "coach.ines@lantern-reach.example";
const all = ["overall-length", "setting-inboard", "changing-boats", "secure-and-check", "grip-cleaning"];
const everyModule = (daysAgo: number, coach: string) => all.map((slug, index) => ({ slug, daysAgo: daysAgo - index, coach }));

/**
 * Athletes at every stage, all invented. ada@ and bilal@ stay untouched ("nothing done yet") because
 * other tests start from there; carys@ has passed every quiz and waits for no sign-off yet.
 */
export const demoCertificationPlans: Plan[] = [
  { email: "carys@lantern-reach.example", passedQuizzes: all, failedFirst: ["setting-inboard"] },
  {
    email: "dev@lantern-reach.example",
    reads: ["overall-length", "setting-inboard"],
    failedFirst: ["overall-length"],
  },
  {
    email: "elin@lantern-reach.example",
    passedQuizzes: ["overall-length", "setting-inboard", "changing-boats"],
    signedOff: [
      { slug: "overall-length", daysAgo: 41, coach: tobias },
      { slug: "setting-inboard", daysAgo: 40, coach: ines },
    ],
    waiting: [{ slug: "changing-boats", daysAgo: 2, coach: tobias }],
  },
  { email: "femi@lantern-reach.example", passedQuizzes: all, signedOff: everyModule(64, tobias) },
  { email: "greta@lantern-reach.example", passedQuizzes: all, signedOff: everyModule(352, ines) },
  {
    email: "hamish@lantern-reach.example",
    passedQuizzes: all,
    signedOff: everyModule(104, tobias),
    suspend: {
      daysAgo: 6,
      coach: ines,
      reason: "Launched with a collar not seated in a click; re-check the securing steps with a coach first.",
    },
  },
  {
    email: "iris@lantern-reach.example",
    passedQuizzes: ["overall-length", "setting-inboard"],
    signedOff: [{ slug: "overall-length", daysAgo: 30, coach: tobias }],
    revoke: {
      slug: "overall-length",
      daysAgo: 28,
      reason: "Recorded against the wrong athlete; to be observed again.",
    },
    notYet: [
      {
        slug: "setting-inboard",
        daysAgo: 9,
        coach: ines,
        note: "Count the clicks before loosening the collar, and measure again once it is seated.",
      },
    ],
  },
  {
    email: "jonah@lantern-reach.example",
    passedQuizzes: ["overall-length", "grip-cleaning"],
    notYet: [
      {
        slug: "overall-length",
        daysAgo: 12,
        coach: tobias,
        note: "Keep the tape straight along the shaft; it sagged by the button.",
      },
    ],
    waiting: [{ slug: "grip-cleaning", daysAgo: 1, coach: null }],
  },
  { email: "kit@lantern-reach.example", reads: ["overall-length", "setting-inboard", "changing-boats"] },
  { email: "lena@lantern-reach.example", passedQuizzes: all, signedOff: everyModule(410, ines) },
];

function at(today: string, daysAgo: number, hourUtc: number): Date {
  return new Date(`${addDaysIso(today, -daysAgo)}T${String(hourUtc).padStart(2, "0")}:00:00Z`);
}

/** One submitted attempt built and graded by the real quiz code, from a fixed seed (repeatable). */
async function seedAttempt(
  user: User,
  meta: ModuleMeta,
  passMark: number,
  pass: boolean,
  seed: string,
  submittedAt: Date,
  transaction: Transaction,
): Promise<void> {
  const quizSettings = { clickCm: 0.5, halfSwivelCm: 2 };
  const questions = buildQuiz({ recipe: meta.quiz, seed, settings: quizSettings });
  // Right answers throughout for a pass; for a miss, the first half left wrong.
  const answers = Object.fromEntries(
    questions.map((question, index) => [question.id, pass || index >= questions.length / 2 ? question.answer : "?"]),
  );
  const grade = gradeQuiz(questions, answers, passMark);
  if (grade.passed !== pass) throw new Error(`demo seed: ${seed} was meant to ${pass ? "pass" : "fail"}`);
  await QuizAttempt.create(
    {
      id: randomUUID(),
      userId: user.id,
      clubId: user.clubId,
      moduleSlug: meta.slug,
      seed,
      questions,
      passMark,
      quizSettings,
      answers,
      score: grade.score,
      passed: grade.passed,
      results: grade.results.map(({ id, correct, expected, explanation }) => ({
        id,
        correct,
        expected,
        explanation,
      })),
      startedAt: new Date(submittedAt.getTime() - 9 * 60_000),
      submittedAt,
    },
    { transaction },
  );
}

interface SignOffEvent {
  user: User;
  meta: ModuleMeta;
  coach: User;
  day: string;
  when: Date;
}

async function seedSignOff(context: ClubCertificationContext, event: SignOffEvent, transaction: Transaction): Promise<void> {
  const { user, meta, coach, day, when } = event;
  const assessment = await PracticalAssessment.create(
    {
      id: randomUUID(),
      clubId: user.clubId,
      athleteId: user.id,
      moduleSlug: meta.slug,
      requestedById: user.id,
      coachId: null,
      requestedAt: new Date(when.getTime() - 26 * 3_600_000),
      status: "passed",
      assessorId: coach.id,
      assessedAt: when,
      checklist: meta.checklist,
      verdicts: Object.fromEntries(meta.checklist.map((item) => [item.id, "met" as const])),
      note: "Careful and unhurried.",
    },
    { transaction },
  );
  const signedOffBy = { id: coach.id, name: coach.name };
  await issueCertificate(
    {
      context,
      athlete: { id: user.id, name: user.name },
      kind: "module",
      moduleSlug: meta.slug,
      assessmentId: assessment.id,
      coveredModules: [meta.slug],
      title: meta.title,
      signedOffBy,
      issuedOn: day,
      expiresOn: passExpiresOn(day, context.settings.clearanceMonths),
      now: when,
    },
    transaction,
  );
  await issueClearanceIfNewlyHeld({ context, athlete: { id: user.id, name: user.name }, signedOffBy, today: day, now: when }, transaction);
}

/**
 * Stages the demo athletes' lesson reads, quiz attempts, sign-offs, certificates, a suspension and a
 * revoked certificate, with dates relative to today. Idempotent: once any staged athlete has an
 * attempt or a sign-off, it changes nothing.
 */
export async function seedDemoCertification(sequelize: Sequelize, now = new Date()): Promise<{ staged: number }> {
  initModels(sequelize);
  const modules = new Map(listModules().map((meta) => [meta.slug, meta]));
  return writeTransaction(async (transaction) => {
    const club = await Club.findOne({ where: { slug: demoClub.slug }, transaction });
    if (!club) return { staged: 0 };
    const users = await User.findAll({ where: { clubId: club.id }, transaction });
    const byEmail = new Map(users.map((user) => [user.email, user]));
    const stagedIds = demoCertificationPlans.map((plan) => byEmail.get(plan.email)?.id).filter((id): id is number => id !== undefined);
    const existing =
      (await QuizAttempt.count({ where: { userId: stagedIds }, transaction })) +
      (await PracticalAssessment.count({ where: { athleteId: stagedIds }, transaction })) +
      (await LessonRead.count({ where: { userId: stagedIds }, transaction }));
    if (existing > 0) return { staged: 0 };

    const context = await clubCertificationContext(club.id, transaction);
    const { timeZone } = context.settings;
    const today = isoDateOf(now, timeZone);
    const passMark = context.settings.passMark;
    const events: SignOffEvent[] = [];
    let staged = 0;
    for (const plan of demoCertificationPlans) {
      const user = byEmail.get(plan.email);
      if (!user) continue;
      staged += 1;
      const quizSlugs = new Set([...(plan.passedQuizzes ?? []), ...(plan.failedFirst ?? [])]);
      for (const slug of new Set([...(plan.reads ?? []), ...quizSlugs])) {
        await LessonRead.create({ userId: user.id, moduleSlug: slug, readAt: at(today, 120, 18) }, { transaction });
      }
      // Quizzes a day before the earliest practical of the plan (or a fortnight ago).
      const firstPracticalDaysAgo = Math.max(
        14,
        ...[...(plan.signedOff ?? []), ...(plan.notYet ?? []), ...(plan.waiting ?? [])].map((entry) => entry.daysAgo + 2),
      );
      for (const slug of quizSlugs) {
        const meta = modules.get(slug)!;
        if (plan.failedFirst?.includes(slug)) {
          await seedAttempt(
            user,
            meta,
            meta.passMark ?? passMark,
            false,
            `demo|${plan.email}|${slug}|1`,
            at(today, firstPracticalDaysAgo + 1, 19),
            transaction,
          );
        }
        if (plan.passedQuizzes?.includes(slug)) {
          await seedAttempt(
            user,
            meta,
            meta.passMark ?? passMark,
            true,
            `demo|${plan.email}|${slug}|2`,
            at(today, firstPracticalDaysAgo, 19),
            transaction,
          );
        }
      }
      for (const entry of plan.signedOff ?? []) {
        const when = at(today, entry.daysAgo, 17);
        // The sign-off's day is the club's day of that moment, as recordAssessment would write it.
        const day = isoDateOf(when, timeZone);
        events.push({ user, meta: modules.get(entry.slug)!, coach: byEmail.get(entry.coach)!, day, when });
      }
    }

    // Certificates in date order, so serial numbers run with the calendar.
    events.sort((a, b) => a.when.getTime() - b.when.getTime());
    for (const event of events) await seedSignOff(context, event, transaction);

    for (const plan of demoCertificationPlans) {
      const user = byEmail.get(plan.email);
      if (!user) continue;
      for (const entry of plan.notYet ?? []) {
        const meta = modules.get(entry.slug)!;
        const coach = byEmail.get(entry.coach)!;
        const when = at(today, entry.daysAgo, 17);
        await PracticalAssessment.create(
          {
            id: randomUUID(),
            clubId: club.id,
            athleteId: user.id,
            moduleSlug: entry.slug,
            requestedById: user.id,
            coachId: coach.id,
            requestedAt: new Date(when.getTime() - 20 * 3_600_000),
            status: "not-yet",
            assessorId: coach.id,
            assessedAt: when,
            checklist: meta.checklist,
            verdicts: Object.fromEntries(
              meta.checklist.map((item, index) => [item.id, index === 0 ? ("not-yet" as const) : ("met" as const)]),
            ),
            note: entry.note,
          },
          { transaction },
        );
      }
      for (const entry of plan.waiting ?? []) {
        await PracticalAssessment.create(
          {
            id: randomUUID(),
            clubId: club.id,
            athleteId: user.id,
            moduleSlug: entry.slug,
            requestedById: user.id,
            coachId: entry.coach ? byEmail.get(entry.coach)!.id : null,
            requestedAt: at(today, entry.daysAgo, 16),
          },
          { transaction },
        );
      }
      if (plan.suspend) {
        const coach = byEmail.get(plan.suspend.coach)!;
        const suspension = await ClearanceSuspension.create(
          {
            clubId: club.id,
            athleteId: user.id,
            reason: plan.suspend.reason,
            suspendedById: coach.id,
            suspendedAt: at(today, plan.suspend.daysAgo, 8),
          },
          { transaction },
        );
        await recordAudit(
          {
            clubId: club.id,
            actorId: coach.id,
            action: "clearance.suspended",
            subjectType: "athlete",
            subjectId: user.id,
            details: { reason: plan.suspend.reason, suspensionId: suspension.id },
          },
          transaction,
        );
      }
      if (plan.revoke) {
        const admin = users.find((member) => member.role === "admin")!;
        const certificate = await Certificate.findOne({
          where: { athleteId: user.id, kind: "module", moduleSlug: plan.revoke.slug },
          transaction,
        });
        if (certificate) {
          await certificate.update(
            {
              revokedAt: at(today, plan.revoke.daysAgo, 10),
              revokedById: admin.id,
              revokeReason: plan.revoke.reason,
            },
            { transaction },
          );
          await recordAudit(
            {
              clubId: club.id,
              actorId: admin.id,
              action: "certificate.revoked",
              subjectType: "certificate",
              subjectId: certificate.id,
              details: { athleteId: user.id, serial: certificate.serial, reason: plan.revoke.reason },
            },
            transaction,
          );
        }
      }
    }
    return { staged };
  });
}
