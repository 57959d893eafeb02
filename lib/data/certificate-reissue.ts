import "server-only";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { recordAudit } from "@/lib/data/audit";
import { issueCertificate } from "@/lib/data/certificate-issue";
import { clubCertificationContext } from "@/lib/data/certification-facts";
import { clubToday } from "@/lib/data/club-settings";
import { assertAllowed, assertVisible, canManageClub, canViewAthlete, type Actor } from "@/lib/auth/permissions";
import { certificatesUnderEarlierName, replacementReason, sameName } from "@/lib/certificates/reissue";
import { ConflictError } from "@/lib/http/errors";
import { Certificate, User } from "@/models";
import type { Transaction } from "sequelize";

export interface Reissued {
  /** Serial of the revoked certificate → serial of its replacement, in issue order. */
  replaced: { from: string; to: string }[];
}

/**
 * How many of the member's certificates still hold under another spelling than `name` on the club's day
 * `today`: after a rename, the page says so and where to reissue them.
 */
export async function countUnderEarlierName(athleteId: number, name: string, today: string, transaction?: Transaction): Promise<number> {
  const held = await Certificate.findAll({
    where: { athleteId, revokedAt: null },
    attributes: ["athleteName", "expiresOn"],
    transaction,
  });
  return certificatesUnderEarlierName(
    held.map((certificate) => ({ athleteName: certificate.athleteName, expiresOn: certificate.expiresOn, revoked: false })),
    name,
    today,
  ).length;
}

/**
 * 404 unless the athlete is someone the actor may see (no hint that another club's exists), then 403
 * unless the actor is an admin of their club. The action checks this before it reads its input.
 */
export async function assertMayReissueCertificates(actor: Actor, athleteId: number): Promise<User> {
  await databaseReady();
  const athlete = await User.findByPk(athleteId);
  assertVisible(!!athlete && canViewAthlete(actor, athlete));
  assertAllowed(canManageClub(actor, athlete.clubId), "Only club administrators can reissue certificates.");
  return athlete;
}

/**
 * An admin reissues an athlete's certificates that still hold but carry an earlier spelling of their
 * name (see lib/certificates/reissue.ts). `expectedName` is the name the admin saw on the page: if it
 * was corrected again meanwhile, nothing is reissued (409) rather than printed under a name they did
 * not confirm. 404 for anyone outside the admin's club, 403 for coaches and athletes.
 */
export async function reissueUnderCurrentName(actor: Actor, athleteId: number, expectedName: string): Promise<Reissued> {
  const visible = await assertMayReissueCertificates(actor, athleteId);
  const now = new Date();
  const today = await clubToday(visible.clubId, now);
  return writeTransaction(async (transaction) => {
    const athlete = await User.findByPk(athleteId, { transaction });
    if (!athlete) throw new ConflictError("This member is gone.");
    if (!sameName(athlete.name, expectedName.trim())) {
      throw new ConflictError(`The name was changed again meanwhile: it is now ${athlete.name}. Reload the page and check it first.`);
    }
    const held = await Certificate.findAll({
      where: { athleteId, revokedAt: null },
      order: [
        ["issuedAt", "ASC"],
        ["serialNumber", "ASC"],
      ],
      transaction,
    });
    const outdated = certificatesUnderEarlierName(
      held.map((certificate) => ({ certificate, athleteName: certificate.athleteName, expiresOn: certificate.expiresOn, revoked: false })),
      athlete.name,
      today,
    ).map((entry) => entry.certificate);
    if (outdated.length === 0) throw new ConflictError(`Every current certificate already carries the name ${athlete.name}.`);
    const context = await clubCertificationContext(athlete.clubId, transaction);
    const replaced: Reissued["replaced"] = [];
    for (const old of outdated) {
      const replacement = await issueCertificate(
        {
          context,
          athlete: { id: athlete.id, name: athlete.name },
          kind: old.kind,
          moduleSlug: old.moduleSlug,
          assessmentId: old.assessmentId,
          coveredModules: old.coveredModules,
          title: old.title,
          signedOffBy: { id: old.signedOffById, name: old.signedOffByName },
          issuedOn: old.issuedOn,
          expiresOn: old.expiresOn,
          now,
          reissue: { byId: actor.id, replacesSerial: old.serial },
        },
        transaction,
      );
      const reason = replacementReason(replacement.serial, athlete.name);
      await old.update({ revokedAt: now, revokedById: actor.id, revokeReason: reason, replacedById: replacement.id }, { transaction });
      await recordAudit(
        {
          clubId: athlete.clubId,
          actorId: actor.id,
          action: "certificate.revoked",
          subjectType: "certificate",
          subjectId: old.id,
          details: { athleteId, serial: old.serial, reason, replacedBy: replacement.serial },
        },
        transaction,
      );
      replaced.push({ from: old.serial, to: replacement.serial });
    }
    return { replaced };
  });
}
