import "server-only";
import { Op } from "sequelize";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { recordAudit } from "@/lib/data/audit";
import { readClubLogo } from "@/lib/data/club-logo";
import { clubToday, settingsForClub, todayOfClub } from "@/lib/data/club-settings";
import { assertAllowed, assertVisible, canManageClub, canViewAthlete, type Actor } from "@/lib/auth/permissions";
import { ConflictError } from "@/lib/http/errors";
import { publicBaseUrl } from "@/lib/env";
import { getModule } from "@/lib/content/modules";
import { isoDateOf } from "@/lib/clearance/dates";
import { certificateStatus, type CertificateStatus } from "@/lib/certificates/status";
import { looksLikeVerificationCode } from "@/lib/certificates/verification-code";
import { pdfFonts } from "@/lib/pdf/fonts";
import { renderCertificatePdf } from "@/lib/pdf/certificate";
import { readClubSettings } from "@/lib/validations/club-settings";
import { Certificate, ClearanceSuspension, Club, PracticalAssessment, User } from "@/models";
import type { CertificateKind } from "@/models/Certificate";

/** A certificate as pages and APIs show it (plain data). */
export interface CertificateSummary {
  id: string;
  kind: CertificateKind;
  moduleSlug: string | null;
  serial: string;
  title: string;
  athleteId: number;
  athleteName: string;
  signedOffByName: string;
  issuedOn: string;
  expiresOn: string;
  status: CertificateStatus;
  revokedAt: string | null;
  revokeReason: string | null;
  /** Set when it was reissued under a corrected name: the id of the certificate that replaced it. */
  replacedById: string | null;
  verifyUrl: string;
  pdfUrl: string;
}

export function verifyUrlFor(code: string): string {
  return `${publicBaseUrl()}/verify/${code}`;
}

/** Athletes whose clearance a coach has suspended and not lifted, among `athleteIds`. */
export async function suspendedAthletes(athleteIds: readonly number[]): Promise<Set<number>> {
  if (athleteIds.length === 0) return new Set();
  const active = await ClearanceSuspension.findAll({
    where: { athleteId: [...new Set(athleteIds)], liftedAt: null },
    attributes: ["athleteId"],
  });
  return new Set(active.map((suspension) => suspension.athleteId));
}

/** Internal: the summary of a stored certificate. */
export function summarise(certificate: Certificate, today: string, suspended: boolean): CertificateSummary {
  return {
    id: certificate.id,
    kind: certificate.kind,
    moduleSlug: certificate.moduleSlug,
    serial: certificate.serial,
    title: certificate.title,
    athleteId: certificate.athleteId,
    athleteName: certificate.athleteName,
    signedOffByName: certificate.signedOffByName,
    issuedOn: certificate.issuedOn,
    expiresOn: certificate.expiresOn,
    status: certificateStatus(
      { kind: certificate.kind, expiresOn: certificate.expiresOn, revoked: certificate.revokedAt !== null },
      today,
      suspended,
    ),
    revokedAt: certificate.revokedAt?.toISOString() ?? null,
    revokeReason: certificate.revokeReason,
    replacedById: certificate.replacedById,
    verifyUrl: verifyUrlFor(certificate.verificationCode),
    pdfUrl: `/api/certificates/${certificate.id}/pdf`,
  };
}

/** An athlete's certificates, newest first: their own, or any athlete of a coach's or admin's club. */
export async function certificatesOfAthlete(actor: Actor, athleteId: number): Promise<CertificateSummary[]> {
  await databaseReady();
  const athlete = await User.findByPk(athleteId);
  assertVisible(!!athlete && canViewAthlete(actor, athlete));
  const certificates = await Certificate.findAll({
    where: { athleteId },
    order: [
      ["issuedAt", "DESC"],
      ["serialNumber", "DESC"],
    ],
  });
  const [suspended, { timeZone }] = await Promise.all([suspendedAthletes([athleteId]), settingsForClub(athlete.clubId)]);
  const today = isoDateOf(new Date(), timeZone);
  return certificates.map((certificate) => summarise(certificate, today, suspended.has(athleteId)));
}

/** Internal: renders a stored certificate to PDF (called after the issuing transaction has committed). */
export async function renderStoredCertificate(certificate: Certificate): Promise<Uint8Array> {
  const [club, logo, fonts] = await Promise.all([Club.findByPk(certificate.clubId), readClubLogo(certificate.clubId), pdfFonts()]);
  // A PDF made after expiry (from the club's day on), or of a clearance while a coach's suspension
  // stands, says so on the page.
  const suspended = certificate.kind === "clearance" && (await suspendedAthletes([certificate.athleteId])).has(certificate.athleteId);
  const status = certificateStatus(
    { kind: certificate.kind, expiresOn: certificate.expiresOn, revoked: certificate.revokedAt !== null },
    todayOfClub(club),
    suspended,
  );
  let lines: string[];
  if (certificate.kind === "module") {
    const assessment = certificate.assessmentId ? await PracticalAssessment.findByPk(certificate.assessmentId) : null;
    const checklist = assessment?.checklist ?? getModule(certificate.moduleSlug ?? "")?.meta.checklist ?? [];
    lines = checklist.map((item) => item.label);
  } else {
    lines = certificate.coveredModules.map((slug) => getModule(slug)?.meta.title ?? slug);
  }
  return renderCertificatePdf(
    {
      kind: certificate.kind,
      clubName: club?.name ?? "",
      athleteName: certificate.athleteName,
      title: certificate.title,
      lines,
      coachName: certificate.signedOffByName,
      issuedOn: certificate.issuedOn,
      expiresOn: certificate.expiresOn,
      serial: certificate.serial,
      verifyUrl: verifyUrlFor(certificate.verificationCode),
      logo,
      status,
    },
    fonts,
  );
}

export function certificateFileName(certificate: { serial: string }): string {
  return `slipway-certificate-${certificate.serial}.pdf`;
}

/** The PDF of one certificate, for its athlete and for coaches and admins of their club (404 otherwise). */
export async function certificatePdfFor(actor: Actor, certificateId: string): Promise<{ bytes: Uint8Array; fileName: string }> {
  await databaseReady();
  const certificate = await Certificate.findByPk(certificateId);
  const athlete = certificate ? await User.findByPk(certificate.athleteId) : null;
  assertVisible(!!certificate && !!athlete && canViewAthlete(actor, athlete));
  return { bytes: await renderStoredCertificate(certificate), fileName: certificateFileName(certificate) };
}

/** One certificate as its club's admin manages it. */
export interface AdminCertificate extends CertificateSummary {
  revokedByName: string | null;
  revokedOn: string | null;
  /** The member's name today, which may differ from the one the certificate was issued to. */
  athleteCurrentName: string;
  /** The certificate that replaced this one, when it was reissued under a corrected name. */
  replacedBy: { id: string; serial: string } | null;
  /** The club's day, for deciding whether the certificate still holds. */
  today: string;
}

/** One certificate for an admin of its club, with who revoked it, on which day and why. */
export async function certificateForAdmin(actor: Actor, certificateId: string): Promise<AdminCertificate> {
  await databaseReady();
  const certificate = await Certificate.findByPk(certificateId);
  assertVisible(!!certificate && canManageClub(actor, certificate.clubId));
  const [suspended, revoker, athlete, replacement, { timeZone }] = await Promise.all([
    suspendedAthletes([certificate.athleteId]),
    certificate.revokedById ? User.findByPk(certificate.revokedById) : null,
    User.findByPk(certificate.athleteId, { attributes: ["id", "name"] }),
    certificate.replacedById ? Certificate.findByPk(certificate.replacedById, { attributes: ["id", "serial"] }) : null,
    settingsForClub(certificate.clubId),
  ]);
  const today = isoDateOf(new Date(), timeZone);
  return {
    ...summarise(certificate, today, suspended.has(certificate.athleteId)),
    revokedByName: revoker?.name ?? null,
    revokedOn: certificate.revokedAt ? isoDateOf(certificate.revokedAt, timeZone) : null,
    athleteCurrentName: athlete?.name ?? certificate.athleteName,
    replacedBy: replacement ? { id: replacement.id, serial: replacement.serial } : null,
    today,
  };
}

/**
 * 404 unless the certificate is of the actor's club (no hint that another club's exists), then 403
 * unless the actor is its admin. The revoke action checks this before it reads the reason.
 */
export async function assertMayRevokeCertificate(actor: Actor, certificateId: string): Promise<void> {
  await databaseReady();
  const existing = await Certificate.findByPk(certificateId);
  assertVisible(!!existing && existing.clubId === actor.clubId);
  assertAllowed(canManageClub(actor, existing.clubId), "Only club administrators can revoke certificates.");
}

/**
 * An admin revokes a certificate with a reason (audited). A revoked module certificate no longer counts
 * as a pass, so a current clearance certificate standing on that module is revoked with it.
 */
export async function revokeCertificate(actor: Actor, certificateId: string, reason: string): Promise<{ revoked: string[] }> {
  await assertMayRevokeCertificate(actor, certificateId);
  const now = new Date();
  // The certificate is of the actor's club (asserted above): its clearances current on the club's day.
  const today = await clubToday(actor.clubId, now);
  return writeTransaction(async (transaction) => {
    const certificate = await Certificate.findByPk(certificateId, { transaction });
    if (!certificate) throw new ConflictError("The certificate is gone.");
    if (certificate.revokedAt) throw new ConflictError(`Certificate ${certificate.serial} is already revoked.`);
    const revoked = [certificate];
    if (certificate.kind === "module" && certificate.moduleSlug) {
      const clearances = await Certificate.findAll({
        where: {
          athleteId: certificate.athleteId,
          kind: "clearance",
          revokedAt: null,
          expiresOn: { [Op.gt]: today },
        },
        transaction,
      });
      revoked.push(...clearances.filter((clearance) => clearance.coveredModules.includes(certificate.moduleSlug!)));
    }
    for (const entry of revoked) {
      const entryReason = entry === certificate ? reason : `Module certificate ${certificate.serial} was revoked: ${reason}`;
      await entry.update({ revokedAt: now, revokedById: actor.id, revokeReason: entryReason }, { transaction });
      await recordAudit(
        {
          clubId: actor.clubId,
          actorId: actor.id,
          action: "certificate.revoked",
          subjectType: "certificate",
          subjectId: entry.id,
          details: { athleteId: entry.athleteId, serial: entry.serial, reason: entryReason },
        },
        transaction,
      );
    }
    return { revoked: revoked.map((entry) => entry.serial) };
  });
}

/** What anyone may learn from a verification code: status, athlete's name, what was certified, dates. */
export interface PublicVerification {
  status: CertificateStatus;
  kind: CertificateKind;
  athleteName: string;
  title: string;
  issuedOn: string;
  expiresOn: string;
  revokedOn: string | null;
  /** Revoked because the club reissued it under a corrected name (the new name is not shown). */
  replaced: boolean;
  code: string;
  /** For the Open Badges credential only; never shown on the page. */
  clubName: string;
  clubSlug: string;
  moduleSlug: string | null;
  /** The club's time zone, for the credential's start and end moments; never shown on the page. */
  timeZone: string;
}

/** The public check of a code; null for any code that is not exactly one certificate's (no hints). */
export async function verifyCode(code: string): Promise<PublicVerification | null> {
  if (!looksLikeVerificationCode(code)) return null;
  await databaseReady();
  const certificate = await Certificate.findOne({ where: { verificationCode: code } });
  if (!certificate || certificate.verificationCode !== code) return null;
  const [suspended, club] = await Promise.all([suspendedAthletes([certificate.athleteId]), Club.findByPk(certificate.clubId)]);
  // The certificate's own club decides the day, whoever asks and from wherever.
  const { timeZone } = readClubSettings(club?.settings);
  const today = isoDateOf(new Date(), timeZone);
  return {
    status: certificateStatus(
      { kind: certificate.kind, expiresOn: certificate.expiresOn, revoked: certificate.revokedAt !== null },
      today,
      suspended.has(certificate.athleteId),
    ),
    kind: certificate.kind,
    athleteName: certificate.athleteName,
    title: certificate.title,
    issuedOn: certificate.issuedOn,
    expiresOn: certificate.expiresOn,
    revokedOn: certificate.revokedAt ? isoDateOf(certificate.revokedAt, timeZone) : null,
    replaced: certificate.replacedById !== null,
    code,
    clubName: club?.name ?? "",
    clubSlug: club?.slug ?? "",
    moduleSlug: certificate.moduleSlug,
    timeZone,
  };
}
