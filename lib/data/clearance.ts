import "server-only";
import { Op } from "sequelize";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { versionedReadCache } from "@/lib/data/read-cache";
import { recordAudit } from "@/lib/data/audit";
import { clubCertificationContext, factsForAthletes, standingOf } from "@/lib/data/certification-facts";
import { clubToday } from "@/lib/data/club-settings";
import { issueClearanceIfNewlyHeld } from "@/lib/data/certificate-issue";
import { summarise, suspendedAthletes, type CertificateSummary } from "@/lib/data/certificates";
import { attemptsOf, type AttemptListEntry } from "@/lib/data/learning";
import {
  assertAllowed,
  assertMaySeeRoster,
  assertVisible,
  canSuspendClearance,
  canViewAthlete,
  isAdmin,
  isCoach,
  type Actor,
} from "@/lib/auth/permissions";
import { ConflictError } from "@/lib/http/errors";
import { getModule } from "@/lib/content/modules";
import { isoDateOf } from "@/lib/clearance/dates";
import { athleteStanding, type AthleteStanding } from "@/lib/clearance/athlete-summary";
import type { Clearance } from "@/lib/clearance/rules";
import type { RosterMatrix, RosterRow } from "@/lib/clearance/roster";
import { Certificate, ClearanceSuspension, PracticalAssessment, User } from "@/models";

/**
 * An athlete's clearance today: their own, or one of a coach's or admin's club. `today` is the day it
 * was worked out for, so the page says "expires" or "expired" against the same day.
 */
export async function clearanceOf(
  actor: Actor,
  athleteId = actor.id,
): Promise<{ standing: AthleteStanding; requiredTitles: string[]; today: string }> {
  await databaseReady();
  const athlete = await User.findByPk(athleteId);
  assertVisible(!!athlete && canViewAthlete(actor, athlete));
  const context = await clubCertificationContext(athlete.clubId);
  const today = isoDateOf(new Date(), context.settings.timeZone);
  const standing = await standingOf(athlete.id, context, today);
  return {
    standing,
    requiredTitles: context.requiredModules.map((slug) => getModule(slug)?.meta.title ?? slug),
    today,
  };
}

async function visibleAthleteForSuspension(actor: Actor, athleteId: number): Promise<User> {
  const athlete = await User.findByPk(athleteId);
  assertVisible(!!athlete && canViewAthlete(actor, athlete));
  assertAllowed(canSuspendClearance(actor, athlete), "Only a coach of the club can suspend or lift a clearance, never their own.");
  return athlete;
}

/** A coach suspends an athlete's clearance with a reason (audited); it stays until a coach lifts it. */
export async function suspendClearance(actor: Actor, athleteId: number, reason: string): Promise<void> {
  await databaseReady();
  const athlete = await visibleAthleteForSuspension(actor, athleteId);
  await writeTransaction(async (transaction) => {
    const active = await ClearanceSuspension.findOne({ where: { athleteId, liftedAt: null }, transaction });
    if (active) throw new ConflictError("This clearance is already suspended.");
    const suspension = await ClearanceSuspension.create(
      { clubId: athlete.clubId, athleteId, reason, suspendedById: actor.id, suspendedAt: new Date() },
      { transaction },
    );
    await recordAudit(
      {
        clubId: athlete.clubId,
        actorId: actor.id,
        action: "clearance.suspended",
        subjectType: "athlete",
        subjectId: athleteId,
        details: { reason, suspensionId: suspension.id },
      },
      transaction,
    );
  });
}

/**
 * A coach lifts the suspension (audited). If the clearance then holds and the athlete has no current
 * clearance certificate, one is issued.
 */
export async function liftSuspension(actor: Actor, athleteId: number, note: string): Promise<void> {
  await databaseReady();
  const athlete = await visibleAthleteForSuspension(actor, athleteId);
  const context = await clubCertificationContext(athlete.clubId);
  const now = new Date();
  await writeTransaction(async (transaction) => {
    const active = await ClearanceSuspension.findOne({ where: { athleteId, liftedAt: null }, transaction });
    if (!active) throw new ConflictError("This clearance is not suspended.");
    await active.update({ liftedAt: now, liftedById: actor.id, liftNote: note || null }, { transaction });
    await recordAudit(
      {
        clubId: athlete.clubId,
        actorId: actor.id,
        action: "clearance.lifted",
        subjectType: "athlete",
        subjectId: athleteId,
        details: { note, suspensionId: active.id },
      },
      transaction,
    );
    await issueClearanceIfNewlyHeld(
      {
        context,
        athlete: { id: athlete.id, name: athlete.name },
        signedOffBy: { id: actor.id, name: actor.name },
        today: isoDateOf(now, context.settings.timeZone),
        now,
      },
      transaction,
    );
  });
}

const rosterMatrices = versionedReadCache<RosterMatrix>(32);

/**
 * The coach's roster: every active athlete of the club × every module, with clearance. Kept until the
 * next committed write (lib/data/read-cache.ts): for 1,000 athletes it costs about 90 ms to compute.
 * The result is shared between requests: callers read it and must not change it.
 */
export async function rosterMatrix(actor: Actor): Promise<RosterMatrix> {
  await databaseReady();
  assertMaySeeRoster(actor);
  // The club's today is in the key, so the matrix is worked out again when the club's day begins.
  const today = await clubToday(actor.clubId);
  // The coach's id is in the key: "waiting for me" differs between coaches.
  return rosterMatrices.read(`${actor.clubId}:${actor.id}:${today}`, () => computeRosterMatrix(actor, today));
}

async function computeRosterMatrix(actor: Actor, today: string): Promise<RosterMatrix> {
  const context = await clubCertificationContext(actor.clubId);
  const athletes = await User.findAll({
    where: { clubId: actor.clubId, role: "athlete", status: "active" },
    attributes: ["id", "name", "email"],
    order: [["name", "ASC"]],
    raw: true,
  });
  const ids = athletes.map((athlete) => athlete.id);
  const [facts, waiting] = await Promise.all([
    factsForAthletes(ids),
    PracticalAssessment.findAll({
      where: { clubId: actor.clubId, status: "waiting", [Op.or]: [{ coachId: null }, { coachId: actor.id }] },
      attributes: ["athleteId"],
    }),
  ]);
  const waitingCount = new Map<number, number>();
  for (const entry of waiting) waitingCount.set(entry.athleteId, (waitingCount.get(entry.athleteId) ?? 0) + 1);
  const slugs = context.modules.map((meta) => meta.slug);
  const rows = athletes.map((athlete): RosterRow => {
    const standing = athleteStanding(slugs, context.requiredModules, facts.get(athlete.id)!, {
      today,
      timeZone: context.settings.timeZone,
    });
    return {
      id: athlete.id,
      name: athlete.name,
      email: athlete.email,
      clearance: clearanceCell(standing.clearance),
      modules: Object.fromEntries(
        standing.modules.map((entry) => [
          entry.slug,
          {
            status: entry.status,
            expiresOn: entry.status === "passed" ? (entry.latestPass?.expiresOn ?? null) : null,
          },
        ]),
      ),
      waitingForMe: athlete.id === actor.id ? 0 : (waitingCount.get(athlete.id) ?? 0),
      passedCount: standing.modules.filter((entry) => entry.status === "passed").length,
    };
  });
  const required = new Set(context.requiredModules);
  return {
    today,
    modules: context.modules.map((meta) => ({
      slug: meta.slug,
      title: meta.title,
      requiredForClearance: required.has(meta.slug),
    })),
    athletes: rows,
  };
}

function clearanceCell(clearance: Clearance): RosterRow["clearance"] {
  return {
    state: clearance.state,
    expiresOn: clearance.expiresOn,
    suspendedReason: clearance.suspension?.reason ?? null,
  };
}

export interface HistoryEntry {
  at: string;
  text: string;
}

export interface AssessmentRecord {
  id: string;
  moduleSlug: string;
  moduleTitle: string;
  status: string;
  requestedAt: string;
  assessedAt: string | null;
  assessorName: string | null;
  note: string | null;
  verdicts: { label: string; verdict: string }[];
  photos: { id: string; url: string }[];
}

export interface AthleteRecord {
  athlete: { id: number; name: string; email: string; status: string };
  /** The day the record's statuses were worked out for. */
  today: string;
  /** The club's time zone: the clock the record's times are shown on. */
  timeZone: string;
  standing: AthleteStanding;
  moduleTitles: Record<string, string>;
  requiredModules: string[];
  attempts: AttemptListEntry[];
  assessments: AssessmentRecord[];
  certificates: CertificateSummary[];
  suspensions: {
    id: number;
    reason: string;
    suspendedAt: string;
    /** The day the suspension began. */
    suspendedOn: string;
    suspendedByName: string;
    liftedAt: string | null;
    liftedByName: string | null;
    liftNote: string | null;
  }[];
  history: HistoryEntry[];
  viewer: { canSuspend: boolean; isAdmin: boolean };
}

/** Everything a coach needs about one athlete: modules, attempts, sign-offs, certificates, history. */
export async function athleteRecordFor(actor: Actor, athleteId: number): Promise<AthleteRecord> {
  await databaseReady();
  assertAllowed(isCoach(actor), "Only coaches and administrators see an athlete's record.");
  const athlete = await User.findByPk(athleteId);
  assertVisible(!!athlete && canViewAthlete(actor, athlete) && athlete.clubId === actor.clubId);
  const context = await clubCertificationContext(athlete.clubId);
  const { timeZone } = context.settings;
  const today = isoDateOf(new Date(), timeZone);
  const [standing, attempts, assessments, certificates, suspensions, suspended] = await Promise.all([
    standingOf(athlete.id, context, today),
    attemptsOf(actor, athlete.id),
    PracticalAssessment.findAll({
      where: { athleteId },
      order: [["requestedAt", "DESC"]],
      include: [{ association: "photos" }],
    }),
    Certificate.findAll({
      where: { athleteId },
      order: [
        ["issuedAt", "DESC"],
        ["serialNumber", "DESC"],
      ],
    }),
    ClearanceSuspension.findAll({ where: { athleteId }, order: [["suspendedAt", "DESC"]] }),
    suspendedAthletes([athleteId]),
  ]);
  const people = await User.findAll({
    where: {
      id: [
        ...new Set([
          ...assessments.map((entry) => entry.assessorId ?? 0),
          ...suspensions.flatMap((entry) => [entry.suspendedById, entry.liftedById ?? 0]),
          ...certificates.map((entry) => entry.revokedById ?? 0),
        ]),
      ],
    },
    attributes: ["id", "name"],
  });
  const nameOf = (id: number | null | undefined) => (id ? (people.find((person) => person.id === id)?.name ?? null) : null);
  const moduleTitles = Object.fromEntries(context.modules.map((meta) => [meta.slug, meta.title]));
  const titleOf = (slug: string) => moduleTitles[slug] ?? slug;

  const assessmentRecords = assessments.map((entry): AssessmentRecord => {
    const photos = (entry as PracticalAssessment & { photos?: { id: string }[] }).photos ?? [];
    return {
      id: entry.id,
      moduleSlug: entry.moduleSlug,
      moduleTitle: titleOf(entry.moduleSlug),
      status: entry.status,
      requestedAt: entry.requestedAt.toISOString(),
      assessedAt: entry.assessedAt?.toISOString() ?? null,
      assessorName: nameOf(entry.assessorId),
      note: entry.note,
      verdicts: (entry.checklist ?? []).map((item) => ({
        label: item.label,
        verdict: entry.verdicts?.[item.id] ?? "—",
      })),
      photos: photos.map((photo) => ({ id: photo.id, url: `/api/evidence/${photo.id}` })),
    };
  });

  const history: HistoryEntry[] = [];
  for (const attempt of attempts) {
    if (attempt.submittedAt) {
      history.push({
        at: attempt.submittedAt,
        text: `Quiz "${titleOf(attempt.moduleSlug)}": ${Math.round((attempt.score ?? 0) * 100)} %, ${attempt.passed ? "passed" : "not passed"}`,
      });
    }
  }
  for (const entry of assessments) {
    history.push({
      at: entry.requestedAt.toISOString(),
      text: `Asked for a sign-off of "${titleOf(entry.moduleSlug)}"`,
    });
    if (entry.assessedAt) {
      history.push({
        at: entry.assessedAt.toISOString(),
        text: `${nameOf(entry.assessorId) ?? "A coach"} recorded "${titleOf(entry.moduleSlug)}" as ${entry.status === "passed" ? "signed off" : "not yet"}`,
      });
    }
  }
  for (const certificate of certificates) {
    history.push({
      at: certificate.issuedAt.toISOString(),
      text: `Certificate ${certificate.serial} issued: ${certificate.title}`,
    });
    if (certificate.revokedAt) {
      history.push({
        at: certificate.revokedAt.toISOString(),
        text: `Certificate ${certificate.serial} revoked by ${nameOf(certificate.revokedById) ?? "an administrator"}: ${certificate.revokeReason ?? ""}`,
      });
    }
  }
  for (const suspension of suspensions) {
    history.push({
      at: suspension.suspendedAt.toISOString(),
      text: `Clearance suspended by ${nameOf(suspension.suspendedById) ?? "a coach"}: ${suspension.reason}`,
    });
    if (suspension.liftedAt) {
      history.push({
        at: suspension.liftedAt.toISOString(),
        text: `Suspension lifted by ${nameOf(suspension.liftedById) ?? "a coach"}${suspension.liftNote ? `: ${suspension.liftNote}` : ""}`,
      });
    }
  }
  history.sort((a, b) => b.at.localeCompare(a.at));

  return {
    athlete: { id: athlete.id, name: athlete.name, email: athlete.email, status: athlete.status },
    today,
    timeZone,
    standing,
    moduleTitles,
    requiredModules: context.requiredModules,
    attempts,
    assessments: assessmentRecords,
    certificates: certificates.map((certificate) => summarise(certificate, today, suspended.has(athleteId))),
    suspensions: suspensions.map((entry) => ({
      id: entry.id,
      reason: entry.reason,
      suspendedAt: entry.suspendedAt.toISOString(),
      suspendedOn: isoDateOf(entry.suspendedAt, timeZone),
      suspendedByName: nameOf(entry.suspendedById) ?? "",
      liftedAt: entry.liftedAt?.toISOString() ?? null,
      liftedByName: nameOf(entry.liftedById),
      liftNote: entry.liftNote,
    })),
    history,
    viewer: { canSuspend: canSuspendClearance(actor, athlete), isAdmin: isAdmin(actor) },
  };
}
