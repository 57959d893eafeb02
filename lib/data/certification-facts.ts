import "server-only";
import { Op, type Transaction } from "sequelize";
import { listModules } from "@/lib/content/modules";
import { rawBoolean, rawDate } from "@/lib/data/sql";
import type { ModuleMeta } from "@/lib/content/module-schema";
import { readClubSettings, type ClubSettings } from "@/lib/validations/club-settings";
import { athleteStanding, type AssessmentFact, type AthleteFacts, type AthleteStanding } from "@/lib/clearance/athlete-summary";
import type { AttemptSummary } from "@/lib/learning/progress";
import type { ModulePass } from "@/lib/clearance/rules";
import { Certificate, ClearanceSuspension, Club, LessonRead, PracticalAssessment, QuizAttempt } from "@/models";

interface CollectedFacts extends AthleteFacts {
  lessonReads: string[];
  attempts: AttemptSummary[];
  assessments: AssessmentFact[];
  passes: ModulePass[];
}

/**
 * Internal to lib/data: loads what the clearance rules need for many athletes in five queries. Callers
 * have already checked permission. Pass the write transaction when inside one, so its writes are seen.
 */
export async function factsForAthletes(athleteIds: readonly number[], transaction?: Transaction): Promise<Map<number, AthleteFacts>> {
  const ids = [...new Set(athleteIds)];
  const facts = new Map<number, CollectedFacts>(
    ids.map((id) => [id, { lessonReads: [], attempts: [], assessments: [], passes: [], suspension: null }]),
  );
  if (ids.length === 0) return facts;
  // Plain rows (raw: true): model instances cost several times the queries for a 1,000-athlete roster.
  // SQLite hands back dates as text and booleans as 0/1; they are converted below.
  const [reads, attempts, assessments, certificates, suspensions] = await Promise.all([
    LessonRead.findAll({ where: { userId: ids }, attributes: ["userId", "moduleSlug"], transaction, raw: true }),
    QuizAttempt.findAll({
      where: { userId: ids },
      attributes: ["userId", "moduleSlug", "score", "passed", "submittedAt"],
      transaction,
      raw: true,
    }),
    PracticalAssessment.findAll({
      where: { athleteId: ids },
      attributes: ["athleteId", "moduleSlug", "status", "requestedAt", "assessedAt"],
      transaction,
      raw: true,
    }),
    Certificate.findAll({
      where: { athleteId: ids, kind: "module", revokedAt: null },
      attributes: ["athleteId", "moduleSlug", "issuedOn", "expiresOn"],
      transaction,
      raw: true,
    }),
    ClearanceSuspension.findAll({
      where: { athleteId: ids, liftedAt: null },
      attributes: ["athleteId", "reason", "suspendedAt"],
      order: [["suspendedAt", "ASC"]],
      transaction,
      raw: true,
    }),
  ]);
  for (const read of reads) facts.get(read.userId)!.lessonReads.push(read.moduleSlug);
  for (const attempt of attempts) {
    facts.get(attempt.userId)!.attempts.push({
      moduleSlug: attempt.moduleSlug,
      score: attempt.score,
      passed: rawBoolean(attempt.passed),
      submittedAt: rawDate(attempt.submittedAt),
    });
  }
  for (const assessment of assessments) {
    facts.get(assessment.athleteId)!.assessments.push({
      moduleSlug: assessment.moduleSlug,
      status: assessment.status,
      requestedAt: rawDate(assessment.requestedAt)!,
      assessedAt: rawDate(assessment.assessedAt),
    });
  }
  for (const certificate of certificates) {
    if (!certificate.moduleSlug) continue;
    facts.get(certificate.athleteId)!.passes.push({
      moduleSlug: certificate.moduleSlug,
      signedOffOn: certificate.issuedOn,
      expiresOn: certificate.expiresOn,
    });
  }
  for (const suspension of suspensions) {
    const entry = facts.get(suspension.athleteId)!;
    entry.suspension ??= { reason: suspension.reason, suspendedAt: rawDate(suspension.suspendedAt)! };
  }
  return facts;
}

export interface ClubCertificationContext {
  club: Club;
  /** With the club's `timeZone`: every certification date is a calendar date there (isoDateOf). */
  settings: ClubSettings;
  modules: ModuleMeta[];
  /** The club's clearance modules that exist in the course, in course order. */
  requiredModules: string[];
}

/** The club, its settings and the course's modules with the ones required for clearance. */
export async function clubCertificationContext(clubId: number, transaction?: Transaction): Promise<ClubCertificationContext> {
  const club = await Club.findByPk(clubId, { transaction });
  if (!club) throw new Error(`club ${clubId} is missing`);
  const settings = readClubSettings(club.settings);
  const modules = listModules();
  const wanted = new Set(settings.clearanceModules);
  return {
    club,
    settings,
    modules,
    requiredModules: modules.filter((meta) => wanted.has(meta.slug)).map((meta) => meta.slug),
  };
}

/** One athlete's modules and clearance on `today`, the club's day (isoDateOf in its time zone). */
export async function standingOf(
  athleteId: number,
  context: ClubCertificationContext,
  today: string,
  transaction?: Transaction,
): Promise<AthleteStanding> {
  const facts = (await factsForAthletes([athleteId], transaction)).get(athleteId)!;
  return athleteStanding(
    context.modules.map((meta) => meta.slug),
    context.requiredModules,
    facts,
    { today, timeZone: context.settings.timeZone },
  );
}

/** Active suspensions are those not lifted; at most one is created at a time. */
export function activeSuspensionWhere(athleteId: number) {
  return { athleteId, liftedAt: { [Op.is]: null } };
}
