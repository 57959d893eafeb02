import "server-only";
import fs from "node:fs/promises";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { Op } from "sequelize";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { recordAudit } from "@/lib/data/audit";
import { clubCertificationContext, standingOf } from "@/lib/data/certification-facts";
import { settingsForClub } from "@/lib/data/club-settings";
import { issueCertificate, issueClearanceIfNewlyHeld } from "@/lib/data/certificate-issue";
import { certificateFileName, renderStoredCertificate, verifyUrlFor } from "@/lib/data/certificates";
import { assertAllowed, assertVisible, canRequestSignOff, canSignOff, canViewAthlete, isCoach, type Actor } from "@/lib/auth/permissions";
import { ConflictError, NotFoundError, ValidationError } from "@/lib/http/errors";
import { getModule } from "@/lib/content/modules";
import type { ChecklistItem, ModuleMeta } from "@/lib/content/module-schema";
import { sendMail } from "@/lib/mail/send";
import { publicBaseUrl, uploadsDir } from "@/lib/env";
import { isoDateOf, formatLongDate } from "@/lib/clearance/dates";
import { moduleStatusLabels, passExpiresOn, type ModuleStatus } from "@/lib/clearance/rules";
import { assessmentOutcome, type AssessmentOutcome, type ChecklistVerdict } from "@/lib/clearance/checklist";
import { assessmentSchemaFor } from "@/lib/validations/certification";
import { validationErrorFrom } from "@/lib/validations/issues";
import { Certificate, EvidencePhoto, PracticalAssessment, QuizAttempt, User } from "@/models";
import type { AssessmentStatus } from "@/models/PracticalAssessment";

function requireModule(slug: string): ModuleMeta {
  const lesson = getModule(slug);
  if (!lesson) throw new NotFoundError("There is no module with that name.");
  return lesson.meta;
}

export interface CoachOption {
  id: number;
  name: string;
}

/** Coaches (not admins) of the club who can be asked for a sign-off, by name. */
async function coachesOf(clubId: number, exceptId: number): Promise<CoachOption[]> {
  const coaches = await User.findAll({
    where: { clubId, role: "coach", status: "active", id: { [Op.ne]: exceptId } },
    order: [["name", "ASC"]],
  });
  return coaches.map((coach) => ({ id: coach.id, name: coach.name }));
}

export interface PracticalView {
  athlete: { id: number; name: string };
  module: { slug: string; title: string; checklist: ChecklistItem[] };
  status: ModuleStatus;
  statusLabel: string;
  /** Why the athlete cannot ask now, or null when the request button should show. */
  requestProblem: string | null;
  /** `requestedOn`: the day it was asked for, as the club's certification dates go. */
  openRequest: { id: string; requestedAt: string; requestedOn: string; coachName: string | null } | null;
  latestDecision: {
    outcome: AssessmentOutcome;
    note: string;
    assessedAt: string;
    /** The day the coach recorded it. */
    assessedOn: string;
    assessorName: string;
  } | null;
  currentPass: { signedOffOn: string; expiresOn: string } | null;
  certificate: { id: string; serial: string; pdfUrl: string; verifyUrl: string } | null;
  coaches: CoachOption[];
}

/** One module's practical for the athlete (or a coach of their club): status, checklist, coach's last word. */
export async function practicalViewFor(actor: Actor, slug: string, athleteId = actor.id): Promise<PracticalView> {
  await databaseReady();
  const meta = requireModule(slug);
  const athlete = await User.findByPk(athleteId);
  assertVisible(!!athlete && canViewAthlete(actor, athlete));
  const context = await clubCertificationContext(athlete.clubId);
  const { timeZone } = context.settings;
  const today = isoDateOf(new Date(), timeZone);
  const standing = (await standingOf(athlete.id, context, today)).modules.find((entry) => entry.slug === slug)!;
  const [open, decided, certificate, coaches] = await Promise.all([
    PracticalAssessment.findOne({ where: { athleteId, moduleSlug: slug, status: "waiting" } }),
    PracticalAssessment.findOne({
      where: { athleteId, moduleSlug: slug, status: ["passed", "not-yet"] },
      order: [["assessedAt", "DESC"]],
    }),
    Certificate.findOne({
      where: { athleteId, kind: "module", moduleSlug: slug, revokedAt: null },
      order: [["expiresOn", "DESC"]],
    }),
    coachesOf(athlete.clubId, athlete.id),
  ]);
  const names = await namesOf([open?.coachId, decided?.assessorId]);
  return {
    athlete: { id: athlete.id, name: athlete.name },
    module: { slug, title: meta.title, checklist: meta.checklist },
    status: standing.status,
    statusLabel: moduleStatusLabels[standing.status].label,
    requestProblem: standing.requestProblem,
    openRequest: open
      ? {
          id: open.id,
          requestedAt: open.requestedAt.toISOString(),
          requestedOn: isoDateOf(open.requestedAt, timeZone),
          coachName: open.coachId ? (names.get(open.coachId) ?? null) : null,
        }
      : null,
    latestDecision:
      decided && decided.assessedAt
        ? {
            outcome: decided.status === "passed" ? "passed" : "not-yet",
            note: decided.note ?? "",
            assessedAt: decided.assessedAt.toISOString(),
            assessedOn: isoDateOf(decided.assessedAt, timeZone),
            assessorName: names.get(decided.assessorId ?? 0) ?? "a coach",
          }
        : null,
    currentPass:
      standing.status === "passed" && standing.latestPass
        ? { signedOffOn: standing.latestPass.signedOffOn, expiresOn: standing.latestPass.expiresOn }
        : null,
    certificate: certificate
      ? {
          id: certificate.id,
          serial: certificate.serial,
          pdfUrl: `/api/certificates/${certificate.id}/pdf`,
          verifyUrl: verifyUrlFor(certificate.verificationCode),
        }
      : null,
    coaches,
  };
}

async function namesOf(ids: readonly (number | null | undefined)[]): Promise<Map<number, string>> {
  const wanted = [...new Set(ids.filter((id): id is number => typeof id === "number"))];
  if (wanted.length === 0) return new Map();
  const users = await User.findAll({ where: { id: wanted }, attributes: ["id", "name"] });
  return new Map(users.map((user) => [user.id, user.name]));
}

/**
 * An athlete who passed a module's quiz asks for the practical sign-off, of one coach or of any coach;
 * the coach (or every coach of the club) gets an e-mail with a link to the sign-off form.
 */
export async function requestSignOff(
  actor: Actor,
  input: { moduleSlug: string; coachId: number | null },
): Promise<{ assessmentId: string }> {
  await databaseReady();
  const meta = requireModule(input.moduleSlug);
  const athlete = await User.findByPk(actor.id);
  assertAllowed(!!athlete && canRequestSignOff(actor, athlete), "Only the athlete can ask for their own sign-off.");
  let chosenCoach: User | null = null;
  if (input.coachId !== null) {
    chosenCoach = await User.findByPk(input.coachId);
    if (
      !chosenCoach ||
      chosenCoach.clubId !== actor.clubId ||
      chosenCoach.role === "athlete" ||
      chosenCoach.status !== "active" ||
      chosenCoach.id === actor.id
    ) {
      throw new ValidationError("coachId: choose a coach of your club", {
        coachId: ["choose a coach of your club"],
      });
    }
  }
  const now = new Date();
  const context = await clubCertificationContext(actor.clubId);
  const today = isoDateOf(now, context.settings.timeZone);
  const assessmentId = await writeTransaction(async (transaction) => {
    const standing = (await standingOf(actor.id, context, today, transaction)).modules.find((entry) => entry.slug === meta.slug)!;
    if (standing.requestProblem) {
      throw new ConflictError(standing.requestProblem, {
        fieldErrors: { moduleSlug: [standing.requestProblem] },
      });
    }
    const created = await PracticalAssessment.create(
      {
        id: randomUUID(),
        clubId: actor.clubId,
        athleteId: actor.id,
        moduleSlug: meta.slug,
        requestedById: actor.id,
        coachId: chosenCoach?.id ?? null,
        requestedAt: now,
      },
      { transaction },
    );
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: "practical.requested",
        subjectType: "practical-assessment",
        subjectId: created.id,
        details: { moduleSlug: meta.slug, coachId: chosenCoach?.id ?? null },
      },
      transaction,
    );
    return created.id;
  });
  const recipients = chosenCoach ? [chosenCoach] : await User.findAll({ where: { clubId: actor.clubId, role: "coach", status: "active" } });
  for (const coach of recipients) {
    await sendMailSafely({
      to: coach.email,
      subject: `Sign-off asked: ${athlete!.name}, ${meta.title}`,
      text: [
        `Hello ${coach.name},`,
        "",
        `${athlete!.name} passed the quiz for "${meta.title}" and asks ${chosenCoach ? "you" : "a coach"} to watch the practical.`,
        "Open the checklist on a tablet at the boat rack and record what you see:",
        `${publicBaseUrl()}/roster/sign-offs/${assessmentId}`,
      ].join("\n"),
    });
  }
  return { assessmentId };
}

async function sendMailSafely(mail: Parameters<typeof sendMail>[0]): Promise<boolean> {
  try {
    await sendMail(mail);
    return true;
  } catch (error) {
    // The record is already saved; a mail server hiccup must not turn it into an error for the user.
    console.error("Could not send certification e-mail", error);
    return false;
  }
}

export interface QueueEntry {
  id: string;
  athleteId: number;
  athleteName: string;
  moduleSlug: string;
  moduleTitle: string;
  requestedAt: string;
  /** The day it was asked for. */
  requestedOn: string;
  askedCoachName: string | null;
  /** Asked of the viewing coach or of any coach. */
  forMe: boolean;
}

/** Sign-offs the club's athletes wait for, oldest first (coaches and admins; never their own). */
export async function signOffQueue(actor: Actor): Promise<QueueEntry[]> {
  await databaseReady();
  assertAllowed(isCoach(actor), "Only coaches and administrators see the sign-off queue.");
  const [waiting, { timeZone }] = await Promise.all([
    PracticalAssessment.findAll({
      where: { clubId: actor.clubId, status: "waiting", athleteId: { [Op.ne]: actor.id } },
      order: [["requestedAt", "ASC"]],
    }),
    settingsForClub(actor.clubId),
  ]);
  const names = await namesOf(waiting.flatMap((entry) => [entry.athleteId, entry.coachId]));
  return waiting.map((entry) => ({
    id: entry.id,
    athleteId: entry.athleteId,
    athleteName: names.get(entry.athleteId) ?? "",
    moduleSlug: entry.moduleSlug,
    moduleTitle: getModule(entry.moduleSlug)?.meta.title ?? entry.moduleSlug,
    requestedAt: entry.requestedAt.toISOString(),
    requestedOn: isoDateOf(entry.requestedAt, timeZone),
    askedCoachName: entry.coachId ? (names.get(entry.coachId) ?? null) : null,
    forMe: entry.coachId === null || entry.coachId === actor.id,
  }));
}

export interface EvidenceSummary {
  id: string;
  url: string;
  mediaType: string;
  byteSize: number;
}

export interface AssessmentDetail {
  id: string;
  status: AssessmentStatus;
  athlete: { id: number; name: string };
  module: { slug: string; title: string };
  checklist: ChecklistItem[];
  requestedAt: string;
  /** The days it was asked for and recorded. */
  requestedOn: string;
  askedCoachName: string | null;
  assessedAt: string | null;
  assessedOn: string | null;
  assessorName: string | null;
  verdicts: Record<string, ChecklistVerdict> | null;
  note: string | null;
  photos: EvidenceSummary[];
  bestQuizScore: number | null;
}

function evidenceSummary(photo: EvidencePhoto): EvidenceSummary {
  return {
    id: photo.id,
    url: `/api/evidence/${photo.id}`,
    mediaType: photo.mediaType,
    byteSize: photo.byteSize,
  };
}

/** Loads an assessment the actor may see (404 otherwise) together with its athlete. */
async function visibleAssessment(actor: Actor, assessmentId: string): Promise<{ assessment: PracticalAssessment; athlete: User }> {
  const assessment = await PracticalAssessment.findByPk(assessmentId);
  const athlete = assessment ? await User.findByPk(assessment.athleteId) : null;
  assertVisible(!!assessment && !!athlete && canViewAthlete(actor, athlete));
  return { assessment, athlete };
}

/** A sign-off for the coach's form (or the record of a decided one): coaches of the athlete's club only. */
export async function assessmentForCoach(actor: Actor, assessmentId: string): Promise<AssessmentDetail> {
  await databaseReady();
  const { assessment, athlete } = await visibleAssessment(actor, assessmentId);
  assertAllowed(canSignOff(actor, athlete), "Only a coach of the club can assess a practical, and never their own.");
  const meta = getModule(assessment.moduleSlug)?.meta;
  const [photos, names, best, { timeZone }] = await Promise.all([
    EvidencePhoto.findAll({ where: { assessmentId }, order: [["createdAt", "ASC"]] }),
    namesOf([assessment.coachId, assessment.assessorId]),
    QuizAttempt.max<number | null, QuizAttempt>("score", {
      where: { userId: athlete.id, moduleSlug: assessment.moduleSlug, submittedAt: { [Op.ne]: null } },
    }),
    settingsForClub(athlete.clubId),
  ]);
  return {
    id: assessment.id,
    status: assessment.status,
    athlete: { id: athlete.id, name: athlete.name },
    module: { slug: assessment.moduleSlug, title: meta?.title ?? assessment.moduleSlug },
    checklist: assessment.checklist ?? meta?.checklist ?? [],
    requestedAt: assessment.requestedAt.toISOString(),
    requestedOn: isoDateOf(assessment.requestedAt, timeZone),
    askedCoachName: assessment.coachId ? (names.get(assessment.coachId) ?? null) : null,
    assessedAt: assessment.assessedAt?.toISOString() ?? null,
    assessedOn: assessment.assessedAt ? isoDateOf(assessment.assessedAt, timeZone) : null,
    assessorName: assessment.assessorId ? (names.get(assessment.assessorId) ?? null) : null,
    verdicts: assessment.verdicts,
    note: assessment.note,
    photos: photos.map(evidenceSummary),
    bestQuizScore: typeof best === "number" ? best : null,
  };
}

export interface RecordedAssessment {
  outcome: AssessmentOutcome;
  certificates: { id: string; serial: string; kind: "module" | "clearance" }[];
  mailed: boolean;
}

/**
 * A coach records what they observed. Every checklist item met → the module is passed: its certificate
 * is issued on the club's today (expiring clearanceMonths after it) and, if the clearance now holds for
 * the first time, the clearance certificate too; the athlete gets them by e-mail. Anything not yet met →
 * the athlete is sent back with the note. Photos uploaded to this sign-off but not kept in the form are
 * deleted.
 */
export async function recordAssessment(actor: Actor, assessmentId: string, input: unknown): Promise<RecordedAssessment> {
  await databaseReady();
  const { assessment: found, athlete } = await visibleAssessment(actor, assessmentId);
  assertAllowed(canSignOff(actor, athlete), "Only a coach of the club can sign off a practical, and never their own.");
  const meta = requireModule(found.moduleSlug);
  const parsed = assessmentSchemaFor(meta.checklist).safeParse(input);
  if (!parsed.success) throw validationErrorFrom(parsed.error);
  const verdicts = parsed.data.items as Record<string, ChecklistVerdict>;
  const outcome = assessmentOutcome(meta.checklist, verdicts);
  const now = new Date();
  const context = await clubCertificationContext(athlete.clubId);
  // The club's day, not UTC's: at UTC+12 a 6 a.m. sign-off would otherwise be dated the day before.
  const today = isoDateOf(now, context.settings.timeZone);

  const { issued, discarded } = await writeTransaction(async (transaction) => {
    const assessment = await PracticalAssessment.findByPk(assessmentId, { transaction });
    if (!assessment || assessment.status !== "waiting") {
      throw new ConflictError("This sign-off has already been recorded.");
    }
    const photos = await EvidencePhoto.findAll({ where: { assessmentId }, transaction });
    const keep = new Set(parsed.data.evidenceIds);
    for (const id of keep) {
      if (!photos.some((photo) => photo.id === id)) {
        throw new ValidationError("evidenceIds: a photo does not belong to this sign-off", {
          evidenceIds: ["a photo does not belong to this sign-off"],
        });
      }
    }
    const dropped = photos.filter((photo) => !keep.has(photo.id));
    for (const photo of dropped) await photo.destroy({ transaction });
    if (outcome === "passed") {
      const quizPassed = await QuizAttempt.count({
        where: { userId: athlete.id, moduleSlug: meta.slug, passed: true },
        transaction,
      });
      if (quizPassed === 0) throw new ConflictError("The athlete has not passed this module's quiz yet.");
    }
    await assessment.update(
      {
        status: outcome,
        assessorId: actor.id,
        assessedAt: now,
        checklist: meta.checklist,
        verdicts,
        note: parsed.data.note,
      },
      { transaction },
    );
    await recordAudit(
      {
        clubId: athlete.clubId,
        actorId: actor.id,
        action: outcome === "passed" ? "practical.signed-off" : "practical.not-yet",
        subjectType: "practical-assessment",
        subjectId: assessment.id,
        details: { athleteId: athlete.id, moduleSlug: meta.slug, photos: keep.size },
      },
      transaction,
    );
    const certificates: Certificate[] = [];
    if (outcome === "passed") {
      const signedOffBy = { id: actor.id, name: actor.name };
      certificates.push(
        await issueCertificate(
          {
            context,
            athlete: { id: athlete.id, name: athlete.name },
            kind: "module",
            moduleSlug: meta.slug,
            assessmentId: assessment.id,
            coveredModules: [meta.slug],
            title: meta.title,
            signedOffBy,
            issuedOn: today,
            expiresOn: passExpiresOn(today, context.settings.clearanceMonths),
            now,
          },
          transaction,
        ),
      );
      const clearance = await issueClearanceIfNewlyHeld(
        { context, athlete: { id: athlete.id, name: athlete.name }, signedOffBy, today, now },
        transaction,
      );
      if (clearance) certificates.push(clearance);
    }
    return { issued: certificates, discarded: dropped.map((photo) => photo.storedName) };
  });

  await Promise.all(discarded.map((name) => fs.rm(path.join(uploadsDir(), "evidence", name), { force: true })));
  const mailed =
    outcome === "passed"
      ? await mailCertificates(athlete, meta, issued, actor.name)
      : await mailNotYet(athlete, meta, parsed.data.note, actor.name);
  return {
    outcome,
    certificates: issued.map((certificate) => ({
      id: certificate.id,
      serial: certificate.serial,
      kind: certificate.kind,
    })),
    mailed,
  };
}

async function mailCertificates(athlete: User, meta: ModuleMeta, certificates: Certificate[], coachName: string): Promise<boolean> {
  const attachments = [];
  for (const certificate of certificates) {
    attachments.push({
      filename: certificateFileName(certificate),
      content: Buffer.from(await renderStoredCertificate(certificate)),
      contentType: "application/pdf",
    });
  }
  const clearance = certificates.find((certificate) => certificate.kind === "clearance");
  const moduleCertificate = certificates.find((certificate) => certificate.kind === "module");
  return sendMailSafely({
    to: athlete.email,
    subject: clearance ? `You may now rig unsupervised: ${meta.title} signed off` : `Signed off: ${meta.title}`,
    text: [
      `Hello ${athlete.name},`,
      "",
      `${coachName} watched your practical for "${meta.title}" and signed it off.`,
      moduleCertificate
        ? `Your certificate ${moduleCertificate.serial} is attached; it expires on ${formatLongDate(moduleCertificate.expiresOn)}.`
        : "",
      moduleCertificate ? `Anyone can check it here: ${verifyUrlFor(moduleCertificate.verificationCode)}` : "",
      ...(clearance
        ? [
            "",
            `You have now passed every module the club requires, so you may rig your own oars without a coach standing by (certificate ${clearance.serial}, also attached).`,
            "Keep to the club's limits, check every collar and screw before each outing, and ask a coach whenever a number looks wrong.",
          ]
        : []),
    ]
      .filter((line, index, lines) => line !== "" || lines[index - 1] !== "")
      .join("\n"),
    attachments,
  });
}

async function mailNotYet(athlete: User, meta: ModuleMeta, note: string, coachName: string): Promise<boolean> {
  return sendMailSafely({
    to: athlete.email,
    subject: `Not yet: ${meta.title}`,
    text: [
      `Hello ${athlete.name},`,
      "",
      `${coachName} watched your practical for "${meta.title}" and would like you to practise a little more first:`,
      "",
      note,
      "",
      `When you are ready, ask for a sign-off again: ${publicBaseUrl()}/learn/${meta.slug}/practical`,
    ].join("\n"),
  });
}
