import "server-only";
import { Op, UniqueConstraintError } from "sequelize";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { recordAudit } from "@/lib/data/audit";
import { assertAllowed, canManageFleet, type Actor } from "@/lib/auth/permissions";
import { NotFoundError } from "@/lib/http/errors";
import { consumeOrRefuse, namedLimiter } from "@/lib/auth/throttle";
import { isoWeekOf } from "@/lib/care/calendar";
import { todayOfClub } from "@/lib/data/club-settings";
import { cleaningDueState } from "@/lib/care/cleaning-due";
import { buildCleaningDigest } from "@/lib/care/digest";
import { publicBaseUrl } from "@/lib/env";
import { sendMail } from "@/lib/mail/send";
import { readClubSettings } from "@/lib/validations/club-settings";
import { CleaningDigest, CleaningRecord, Club, OarSet, User } from "@/models";

/** The digest of one club for one day: subject, text, and the active coaches and admins it goes to. */
async function composeDigest(club: Club, today: string) {
  const settings = readClubSettings(club.settings);
  const sets = await OarSet.findAll({ where: { clubId: club.id, archivedAt: null } });
  const oarSets = await Promise.all(
    sets.map(async (set) => {
      const last = await CleaningRecord.findOne({
        where: { oarSetId: set.id, cleanedOn: { [Op.lte]: today } },
        order: [["cleanedOn", "DESC"]],
        attributes: ["cleanedOn"],
      });
      const lastCleanedOn = last?.cleanedOn ?? null;
      return {
        name: set.name,
        lastCleanedOn,
        state: cleaningDueState({ lastCleanedOn, today, raceDays: settings.raceDays, humidSpell: settings.humidSpell }),
      };
    }),
  );
  const mail = buildCleaningDigest({
    clubName: club.name,
    today,
    isoWeek: isoWeekOf(today),
    oarSets,
    raceDays: settings.raceDays,
    humidSpell: settings.humidSpell,
    careUrl: `${publicBaseUrl()}/roster/fleet/care`,
  });
  const recipients = await User.findAll({
    where: { clubId: club.id, status: "active", role: { [Op.in]: ["coach", "admin"] } },
    attributes: ["email"],
    order: [["email", "ASC"]],
  });
  return { ...mail, recipients: recipients.map((user) => user.email) };
}

async function deliver(mail: { subject: string; text: string; recipients: string[] }): Promise<void> {
  for (const to of mail.recipients) await sendMail({ to, subject: mail.subject, text: mail.text });
}

const abandonedClaimMs = 2 * 60 * 60 * 1000;

/** Claims a club's week for the weekly digest; null when it is already sent, or being sent by another check. */
async function claimWeek(clubId: number, isoWeek: string): Promise<CleaningDigest | null> {
  try {
    return await writeTransaction(async (transaction) => {
      const existing = await CleaningDigest.findOne({ where: { clubId, isoWeek }, transaction });
      if (existing) {
        // A claim left "sending" for hours belongs to a process that died mid-send: take it over.
        const abandoned = existing.state === "sending" && Date.now() - existing.updatedAt.getTime() > abandonedClaimMs;
        if (!abandoned) return null;
        await existing.destroy({ transaction });
      }
      return CleaningDigest.create({ clubId, isoWeek, state: "sending", kind: "weekly" }, { transaction });
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) return null;
    throw error;
  }
}

export interface DigestRun {
  /** The ISO weeks ("2026-W49") of the digests sent: each club's own, in its time zone. */
  isoWeeks: string[];
  /** Clubs whose digest went out in this run. */
  sentToClubs: number[];
}

/**
 * The weekly digest: for each club that has not had this ISO week's digest (the week of the club's own
 * today), claim the week in the database (unique per club and week), mail every active coach and admin,
 * then mark it sent. A claim is dropped when mailing fails, so the next hourly check tries again; a
 * restart never sends twice.
 */
export async function sendWeeklyCleaningDigests(now: Date = new Date()): Promise<DigestRun> {
  await databaseReady();
  const clubs = await Club.findAll();
  const sentToClubs: number[] = [];
  const isoWeeks = new Set<string>();
  for (const club of clubs) {
    const today = todayOfClub(club, now);
    const isoWeek = isoWeekOf(today);
    const claimed = await claimWeek(club.id, isoWeek);
    if (claimed === null) continue;
    try {
      const mail = await composeDigest(club, today);
      await deliver(mail);
      await writeTransaction(async (transaction) => {
        await claimed.update({ state: "sent", recipients: mail.recipients.length, sentAt: new Date() }, { transaction });
        await recordAudit(
          {
            clubId: club.id,
            actorId: null,
            action: "cleaning.digest-sent",
            subjectType: "club",
            subjectId: club.id,
            details: { isoWeek, recipients: mail.recipients.length },
          },
          transaction,
        );
      });
      sentToClubs.push(club.id);
      isoWeeks.add(isoWeek);
    } catch (error) {
      console.error(`Cleaning digest for club ${club.id} failed; it will be tried again at the next check`, error);
      await writeTransaction((transaction) => claimed.destroy({ transaction }));
    }
  }
  return { isoWeeks: [...isoWeeks], sentToClubs };
}

/** Digests sent by hand per club an hour: enough to resend after fixing a record, not to flood inboxes. */
export const manualDigestsPerHour = 3;

async function throttleManualDigest(clubId: number): Promise<void> {
  await consumeOrRefuse(namedLimiter("manual-digest", manualDigestsPerHour, 3600), String(clubId), (msBeforeNext) => {
    const minutes = Math.max(1, Math.ceil(msBeforeNext / 60_000));
    return `The digest was sent ${manualDigestsPerHour} times in the last hour. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`;
  });
}

/**
 * A coach or admin sends their club's digest at once. It counts as this week's digest, so the weekly
 * check does not send another one the same week. At most three an hour per club (every coach and admin
 * gets each one).
 */
export async function sendCleaningDigestNow(actor: Actor, now: Date = new Date()): Promise<{ recipients: number; isoWeek: string }> {
  await databaseReady();
  assertAllowed(canManageFleet(actor, actor.clubId), "Only coaches and administrators send the cleaning digest.");
  const club = await Club.findByPk(actor.clubId);
  if (!club) throw new NotFoundError();
  await throttleManualDigest(club.id);
  const today = todayOfClub(club, now);
  const isoWeek = isoWeekOf(today);
  const mail = await composeDigest(club, today);
  await deliver(mail);
  try {
    await writeTransaction(async (transaction) => {
      const existing = await CleaningDigest.findOne({ where: { clubId: club.id, isoWeek }, transaction });
      if (existing) {
        await existing.update({ state: "sent", recipients: mail.recipients.length, sentAt: new Date() }, { transaction });
      } else {
        await CleaningDigest.create(
          { clubId: club.id, isoWeek, state: "sent", kind: "manual", recipients: mail.recipients.length, sentAt: new Date() },
          { transaction },
        );
      }
      await recordAudit(
        {
          clubId: club.id,
          actorId: actor.id,
          action: "cleaning.digest-sent",
          subjectType: "club",
          subjectId: club.id,
          details: { isoWeek, recipients: mail.recipients.length, manual: true },
        },
        transaction,
      );
    });
  } catch (error) {
    // The weekly check claimed the week at the same moment: its row already stops a second weekly send.
    if (!(error instanceof UniqueConstraintError)) throw error;
  }
  return { recipients: mail.recipients.length, isoWeek };
}
