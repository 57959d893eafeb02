import "server-only";
import { randomUUID } from "node:crypto";
import { Op, type Transaction } from "sequelize";
import { formatSerial, nextSerialNumber, serialPrefixFor } from "@/lib/certificates/serial";
import { newVerificationCode } from "@/lib/certificates/verification-code";
import { recordAudit } from "@/lib/data/audit";
import { standingOf, type ClubCertificationContext } from "@/lib/data/certification-facts";
import { Certificate, type CertificateKind } from "@/models/Certificate";

export const clearanceCertificateTitle = "Rigging clearance: may rig unsupervised";

export interface IssueInput {
  context: ClubCertificationContext;
  athlete: { id: number; name: string };
  kind: CertificateKind;
  moduleSlug: string | null;
  assessmentId: string | null;
  coveredModules: string[];
  title: string;
  signedOffBy: { id: number | null; name: string };
  issuedOn: string;
  expiresOn: string;
  now: Date;
  /** Set when an admin reissues a certificate under a corrected name: they, not the coach, issue it. */
  reissue?: { byId: number; replacesSerial: string };
}

/**
 * Issues a certificate inside the caller's write transaction: the next serial of the club's run for
 * the issue year (the write queue makes the read-then-insert safe; the unique index backs it up) and a
 * fresh verification code.
 */
export async function issueCertificate(input: IssueInput, transaction: Transaction): Promise<Certificate> {
  const { context } = input;
  const year = Number(input.issuedOn.slice(0, 4));
  const highest = await Certificate.max<number | null, Certificate>("serialNumber", {
    where: { clubId: context.club.id, serialYear: year },
    transaction,
  });
  const serialNumber = nextSerialNumber(typeof highest === "number" ? highest : null);
  const certificate = await Certificate.create(
    {
      id: randomUUID(),
      clubId: context.club.id,
      athleteId: input.athlete.id,
      kind: input.kind,
      moduleSlug: input.moduleSlug,
      assessmentId: input.assessmentId,
      coveredModules: input.coveredModules,
      serial: formatSerial(serialPrefixFor(context.club.slug), year, serialNumber),
      serialYear: year,
      serialNumber,
      verificationCode: newVerificationCode(),
      athleteName: input.athlete.name,
      title: input.title,
      signedOffById: input.signedOffBy.id,
      signedOffByName: input.signedOffBy.name,
      issuedOn: input.issuedOn,
      expiresOn: input.expiresOn,
      issuedAt: input.now,
    },
    { transaction },
  );
  await recordAudit(
    {
      clubId: context.club.id,
      actorId: input.reissue ? input.reissue.byId : input.signedOffBy.id,
      action: "certificate.issued",
      subjectType: "certificate",
      subjectId: certificate.id,
      details: {
        athleteId: input.athlete.id,
        serial: certificate.serial,
        kind: input.kind,
        moduleSlug: input.moduleSlug,
        ...(input.reissue && { replaces: input.reissue.replacesSerial }),
      },
    },
    transaction,
  );
  return certificate;
}

/**
 * Issues the rigging clearance certificate when the clearance holds and the athlete has no current,
 * unrevoked one: the first time it holds, or again after the last one expired or was revoked. It
 * expires with the first required module pass to run out.
 */
export async function issueClearanceIfNewlyHeld(
  input: {
    context: ClubCertificationContext;
    athlete: { id: number; name: string };
    signedOffBy: { id: number | null; name: string };
    today: string;
    now: Date;
  },
  transaction: Transaction,
): Promise<Certificate | null> {
  const standing = await standingOf(input.athlete.id, input.context, input.today, transaction);
  if (!standing.clearance.cleared || !standing.clearance.expiresOn) return null;
  const current = await Certificate.findOne({
    where: {
      athleteId: input.athlete.id,
      kind: "clearance",
      revokedAt: null,
      expiresOn: { [Op.gt]: input.today },
    },
    transaction,
  });
  if (current) return null;
  return issueCertificate(
    {
      context: input.context,
      athlete: input.athlete,
      kind: "clearance",
      moduleSlug: null,
      assessmentId: null,
      coveredModules: standing.clearance.requiredModules,
      title: clearanceCertificateTitle,
      signedOffBy: input.signedOffBy,
      issuedOn: input.today,
      expiresOn: standing.clearance.expiresOn,
      now: input.now,
    },
    transaction,
  );
}
