import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { Op } from "sequelize";
import { createTempDataDir } from "@/tests/support/temp-data-dir";
import { installNextHeadersStandIn } from "@/tests/support/request-scope";
import { asCookie, sessionCookieFor } from "@/tests/support/call-route";

vi.mock("next/headers", async () => (await import("@/tests/support/request-scope")).nextHeadersStandIn);
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

createTempDataDir("certificate-reissue");
installNextHeadersStandIn();

const { closeDatabase, getSequelize } = await import("@/lib/db");
const { databaseReady } = await import("@/lib/data/database");
const { seedDemoClub, demoPassword } = await import("@/lib/seed/demo-club");
const { seedSecondClub } = await import("@/lib/seed/second-club");
const { seedDemoCertification } = await import("@/lib/seed/demo-certification");
const { renameMember } = await import("@/lib/data/member-admin");
const { reissueUnderCurrentName } = await import("@/lib/data/certificate-reissue");
const { athleteRecordFor } = await import("@/lib/data/clearance");
const { certificateForAdmin, verifyCode } = await import("@/lib/data/certificates");
const { clubToday } = await import("@/lib/data/club-settings");
const { AuditEvent, Certificate, User } = await import("@/models");
const { ConflictError, ForbiddenError, NotFoundError } = await import("@/lib/http/errors");
const { reissueCertificatesAction } = await import("@/app/(coach)/roster/athletes/[id]/actions");
const { renameMemberAction } = await import("@/app/(club)/club/members/actions");

type Actor = import("@/lib/auth/permissions").Actor;

beforeAll(async () => {
  await databaseReady();
  await seedDemoClub(getSequelize());
  await seedSecondClub(getSequelize());
  await seedDemoCertification(getSequelize());
});

afterAll(async () => {
  await closeDatabase();
});

async function userFor(email: string) {
  return (await User.findOne({ where: { email } }))!;
}

async function actorFor(email: string): Promise<Actor> {
  const user = await userFor(email);
  return { id: user.id, clubId: user.clubId, role: user.role, name: user.name, email: user.email };
}

const admin = "admin@lantern-reach.example";

describe("reissuing certificates under a corrected name", () => {
  it("replaces every certificate that still holds: new serial and code, same dates and sign-off; the old ones revoked as replaced", async () => {
    const femi = await userFor("femi@lantern-reach.example");
    const today = await clubToday(femi.clubId);
    const before = await Certificate.findAll({ where: { athleteId: femi.id }, order: [["serialNumber", "ASC"]] });
    const holding = before.filter((certificate) => certificate.revokedAt === null && certificate.expiresOn > today);
    // The demo seed signs Femi off in every module 64 days ago: module passes and the clearance all hold.
    expect(holding.map((certificate) => certificate.kind)).toContain("clearance");
    expect(holding.filter((certificate) => certificate.kind === "module").length).toBeGreaterThan(1);
    const standingBefore = (await athleteRecordFor(await actorFor(admin), femi.id)).standing.clearance;
    expect(standingBefore.cleared).toBe(true);

    const adminCookie = await sessionCookieFor(admin, demoPassword);
    const renamed = await asCookie(adminCookie, () => renameMemberAction({ memberId: femi.id, name: "Femi Adeyemi-Hart" }));
    expect(renamed).toMatchObject({
      ok: true,
      message: `Name saved: Femi Adeyemi-Hart. ${holding.length} current certificates still carry the earlier name: reissue them on the athlete's page.`,
      data: { reissueHref: `/roster/athletes/${femi.id}#certificates` },
    });

    const outcome = await asCookie(adminCookie, () => reissueCertificatesAction(femi.id, { name: "Femi Adeyemi-Hart" }));
    expect(outcome).toMatchObject({ ok: true, message: expect.stringContaining("Reissued under Femi Adeyemi-Hart: ") });

    const adminActor = await actorFor(admin);
    for (const old of holding) {
      const revoked = (await Certificate.findByPk(old.id))!;
      expect(revoked.revokedAt).not.toBeNull();
      expect(revoked.revokedById).toBe(adminActor.id);
      const replacement = (await Certificate.findByPk(revoked.replacedById!))!;
      expect(revoked.revokeReason).toBe(`Replaced by ${replacement.serial}, reissued under the corrected name Femi Adeyemi-Hart.`);
      expect(outcome.message).toContain(`${old.serial} → ${replacement.serial}`);
      expect(replacement).toMatchObject({
        athleteId: femi.id,
        athleteName: "Femi Adeyemi-Hart",
        kind: old.kind,
        moduleSlug: old.moduleSlug,
        assessmentId: old.assessmentId,
        coveredModules: old.coveredModules,
        title: old.title,
        signedOffById: old.signedOffById,
        signedOffByName: old.signedOffByName,
        issuedOn: old.issuedOn,
        expiresOn: old.expiresOn,
        revokedAt: null,
        replacedById: null,
      });
      expect(replacement.serial).not.toBe(old.serial);
      expect(replacement.verificationCode).not.toBe(old.verificationCode);

      const issued = await AuditEvent.findOne({ where: { action: "certificate.issued", subjectId: replacement.id } });
      expect(issued).toMatchObject({ actorId: adminActor.id, details: { serial: replacement.serial, replaces: old.serial } });
      const revokedEvent = await AuditEvent.findOne({ where: { action: "certificate.revoked", subjectId: old.id } });
      expect(revokedEvent).toMatchObject({ actorId: adminActor.id, details: { serial: old.serial, replacedBy: replacement.serial } });

      // The public check of the printed (old) code says replaced, without the new name; the new code is valid.
      const oldCheck = (await verifyCode(old.verificationCode))!;
      expect(oldCheck).toMatchObject({ status: "revoked", replaced: true, athleteName: old.athleteName });
      expect(await verifyCode(replacement.verificationCode)).toMatchObject({
        status: "valid",
        replaced: false,
        athleteName: "Femi Adeyemi-Hart",
      });
      expect(await certificateForAdmin(adminActor, old.id)).toMatchObject({
        replacedBy: { id: replacement.id, serial: replacement.serial },
        athleteCurrentName: "Femi Adeyemi-Hart",
      });
    }
    // Certificates that did not hold any more are left as they were.
    for (const old of before.filter((certificate) => !holding.includes(certificate))) {
      expect((await Certificate.findByPk(old.id))!.toJSON()).toEqual(old.toJSON());
    }
    // Reissuing changes nothing about what Femi may do.
    const record = await athleteRecordFor(adminActor, femi.id);
    expect(record.standing.clearance).toEqual(standingBefore);
    expect(record.certificates.filter((certificate) => certificate.status === "valid").map((entry) => entry.athleteName)).toEqual(
      holding.map(() => "Femi Adeyemi-Hart"),
    );

    // Again: nothing left to reissue.
    expect(await asCookie(adminCookie, () => reissueCertificatesAction(femi.id, { name: "Femi Adeyemi-Hart" }))).toMatchObject({
      ok: false,
      message: "Every current certificate already carries the name Femi Adeyemi-Hart.",
    });
    const replacements = await Certificate.count({ where: { athleteId: femi.id, revokedAt: null, expiresOn: { [Op.gt]: today } } });
    expect(replacements).toBe(holding.length);
  });

  it("refuses, changing nothing, when the name was corrected again after the admin looked", async () => {
    const greta = await userFor("greta@lantern-reach.example");
    const actor = await actorFor(admin);
    await renameMember(actor, greta.id, "Greta Quennel");
    await renameMember(actor, greta.id, "Greta Quennell");
    const before = await Certificate.count({ where: { athleteId: greta.id, revokedAt: null } });
    await expect(reissueUnderCurrentName(actor, greta.id, "Greta Quennel")).rejects.toThrow(
      "The name was changed again meanwhile: it is now Greta Quennell. Reload the page and check it first.",
    );
    await expect(reissueUnderCurrentName(actor, greta.id, "Greta Quennel")).rejects.toBeInstanceOf(ConflictError);
    expect(await Certificate.count({ where: { athleteId: greta.id, revokedAt: null } })).toBe(before);
  });

  it("leaves expired certificates alone: a member whose passes have all run out has nothing to reissue", async () => {
    // The demo seed signs Lena off 410 days ago, so every pass of hers has expired.
    const lena = await userFor("lena@lantern-reach.example");
    const actor = await actorFor(admin);
    const renamed = await renameMember(actor, lena.id, "Lena Fairbrother-Quist");
    expect(renamed.certificatesUnderEarlierName).toBe(0);
    await expect(reissueUnderCurrentName(actor, lena.id, "Lena Fairbrother-Quist")).rejects.toThrow(
      "Every current certificate already carries the name Lena Fairbrother-Quist.",
    );
  });

  it("is for the athlete's club admins only: coaches and the athlete 403, another club 404", async () => {
    const iris = await userFor("iris@lantern-reach.example");
    await expect(reissueUnderCurrentName(await actorFor("coach.tobias@lantern-reach.example"), iris.id, iris.name)).rejects.toBeInstanceOf(
      ForbiddenError,
    );
    await expect(reissueUnderCurrentName(await actorFor("iris@lantern-reach.example"), iris.id, iris.name)).rejects.toBeInstanceOf(
      ForbiddenError,
    );
    await expect(reissueUnderCurrentName(await actorFor("admin@brackwater.example"), iris.id, iris.name)).rejects.toBeInstanceOf(
      NotFoundError,
    );
    await expect(reissueUnderCurrentName(await actorFor(admin), 999_999, "Nobody")).rejects.toBeInstanceOf(NotFoundError);
  });
});
