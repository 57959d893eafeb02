import "server-only";
import { Op } from "sequelize";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { recordAudit } from "@/lib/data/audit";
import { rigSettingsFor } from "@/lib/data/fleet";
import { assertAllowed, canManageFleet, type Actor } from "@/lib/auth/permissions";
import { NotFoundError, ValidationError } from "@/lib/http/errors";
import { cleaningDueState, type CleaningDueState } from "@/lib/care/cleaning-due";
import { dueStatus, type DueStatus } from "@/lib/care/due-status";
import { isoDateInZone } from "@/lib/care/calendar";
import type { CleaningMethod } from "@/lib/care/methods";
import type { OarType } from "@/lib/rigging/types";
import { readClubSettings } from "@/lib/validations/club-settings";
import type { CleaningRecordInput } from "@/lib/validations/cleaning";
import { CleaningRecord, Club, OarSet, User } from "@/models";

export interface OarSetCleaning {
  oarSetId: number;
  name: string;
  oarType: OarType;
  lastCleanedOn: string | null;
  lastCleanedBy: string | null;
  state: CleaningDueState;
  status: DueStatus;
}

export interface CleaningLogEntry {
  id: number;
  oarSetName: string;
  cleanedOn: string;
  cleanedBy: string;
  method: CleaningMethod;
  note: string;
}

export interface CleaningOverview {
  today: string;
  oarSets: OarSetCleaning[];
  recent: CleaningLogEntry[];
  raceDays: string[];
  humidSpell: boolean;
}

/**
 * Every active oar set of the club with its last cleaning and whether it is due (cleaningDueState with
 * the club's race days and humid spell), due ones first; plus the latest log entries. Any member.
 * `today` is the club's day at `now`, in its time zone.
 */
export async function cleaningOverview(actor: Actor, now: Date = new Date()): Promise<CleaningOverview> {
  await databaseReady();
  const settings = await rigSettingsFor(actor);
  const today = isoDateInZone(settings.timeZone, now);
  const sets = await OarSet.findAll({ where: { clubId: actor.clubId, archivedAt: null } });
  const oarSets = await Promise.all(
    sets.map(async (set): Promise<OarSetCleaning> => {
      const last = await CleaningRecord.findOne({
        where: { oarSetId: set.id, cleanedOn: { [Op.lte]: today } },
        include: [{ model: User, as: "cleanedBy", attributes: ["name"] }],
        order: [
          ["cleanedOn", "DESC"],
          ["id", "DESC"],
        ],
      });
      const lastCleanedOn = last?.cleanedOn ?? null;
      const state = cleaningDueState({ lastCleanedOn, today, raceDays: settings.raceDays, humidSpell: settings.humidSpell });
      return {
        oarSetId: set.id,
        name: set.name,
        oarType: set.oarType,
        lastCleanedOn,
        lastCleanedBy: last?.cleanedBy?.name ?? null,
        state,
        status: dueStatus(state, today, lastCleanedOn),
      };
    }),
  );
  oarSets.sort(
    (a, b) =>
      Number(b.state.due) - Number(a.state.due) ||
      (a.state.nextDueOn ?? "").localeCompare(b.state.nextDueOn ?? "") ||
      a.name.localeCompare(b.name, "en-GB"),
  );
  const records = await CleaningRecord.findAll({
    where: { clubId: actor.clubId },
    include: [
      { model: User, as: "cleanedBy", attributes: ["name"] },
      { model: OarSet, as: "oarSet", attributes: ["name"] },
    ],
    order: [
      ["cleanedOn", "DESC"],
      ["id", "DESC"],
    ],
    limit: 20,
  });
  return {
    today,
    oarSets,
    recent: records.map((record) => ({
      id: record.id,
      oarSetName: record.oarSet?.name ?? "",
      cleanedOn: record.cleanedOn,
      cleanedBy: record.cleanedBy?.name ?? "(former member)",
      method: record.method,
      note: record.note,
    })),
    raceDays: [...settings.raceDays].sort(),
    humidSpell: settings.humidSpell,
  };
}

export interface MemberName {
  id: number;
  name: string;
}

/** Active members of the actor's club by name, for "who cleaned" (any member; names only). */
export async function clubMemberNames(actor: Actor): Promise<MemberName[]> {
  await databaseReady();
  const users = await User.findAll({
    where: { clubId: actor.clubId, status: "active" },
    attributes: ["id", "name"],
    order: [["name", "ASC"]],
  });
  return users.map((user) => ({ id: user.id, name: user.name }));
}

/** Anyone signed in records a cleaning of one of the club's active oar sets, by themselves or a club-mate. */
export async function recordCleaning(actor: Actor, input: CleaningRecordInput): Promise<{ id: number }> {
  await databaseReady();
  const set = await OarSet.findByPk(input.oarSetId);
  if (!set || set.clubId !== actor.clubId) throw new NotFoundError();
  if (set.archivedAt !== null) {
    throw new ValidationError("That oar set is archived.", { oarSetId: ["That oar set is archived: choose another."] });
  }
  const cleanedById = input.cleanedById ?? actor.id;
  if (cleanedById !== actor.id) {
    const who = await User.findByPk(cleanedById);
    if (!who || who.clubId !== actor.clubId || who.status !== "active") {
      throw new ValidationError("Choose a member of your club.", { cleanedById: ["Choose a member of your club."] });
    }
  }
  const record = await writeTransaction(async (transaction) => {
    const created = await CleaningRecord.create(
      {
        clubId: actor.clubId,
        oarSetId: set.id,
        cleanedById,
        recordedById: actor.id,
        cleanedOn: input.cleanedOn,
        method: input.method,
        note: input.note,
      },
      { transaction },
    );
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: "oar-set.cleaned",
        subjectType: "oar_set",
        subjectId: set.id,
        details: { cleanedOn: input.cleanedOn, cleanedById, method: input.method },
      },
      transaction,
    );
    return created;
  });
  return { id: record.id };
}

async function updateCalendar(
  actor: Actor,
  change: (current: { raceDays: string[]; humidSpell: boolean }) => { raceDays: string[]; humidSpell: boolean },
  action: string,
): Promise<{ raceDays: string[]; humidSpell: boolean; changed: boolean }> {
  await databaseReady();
  assertAllowed(canManageFleet(actor, actor.clubId), "Only coaches and administrators change the race days and humid spell.");
  return writeTransaction(async (transaction) => {
    const club = await Club.findByPk(actor.clubId, { transaction });
    if (!club) throw new NotFoundError();
    const settings = readClubSettings(club.settings);
    const next = change({ raceDays: settings.raceDays, humidSpell: settings.humidSpell });
    const raceDays = [...new Set(next.raceDays)].sort();
    const unchanged = next.humidSpell === settings.humidSpell && raceDays.join() === [...settings.raceDays].sort().join();
    // Adding a day already there, removing one that is not, or setting the spell as it is: nothing to write or audit.
    if (unchanged) return { raceDays, humidSpell: next.humidSpell, changed: false };
    // Only these two keys change; every other stored setting is kept as it was.
    await club.update({ settings: { ...club.settings, raceDays, humidSpell: next.humidSpell } }, { transaction });
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action,
        subjectType: "club",
        subjectId: club.id,
        details: { raceDays, humidSpell: next.humidSpell },
      },
      transaction,
    );
    return { raceDays, humidSpell: next.humidSpell, changed: true };
  });
}

/** Adds a race day to the club calendar (coaches and admins): the day before it, every set falls due. */
export async function addRaceDay(actor: Actor, raceDay: string) {
  return updateCalendar(actor, (current) => ({ ...current, raceDays: [...current.raceDays, raceDay] }), "club.race-day-added");
}

/** Removes a race day from the club calendar (coaches and admins). */
export async function removeRaceDay(actor: Actor, raceDay: string) {
  return updateCalendar(
    actor,
    (current) => ({ ...current, raceDays: current.raceDays.filter((day) => day !== raceDay) }),
    "club.race-day-removed",
  );
}

/** Switches the humid spell on (every set due daily) or off (coaches and admins). */
export async function setHumidSpell(actor: Actor, humidSpell: boolean) {
  return updateCalendar(actor, (current) => ({ ...current, humidSpell }), "club.humid-spell");
}
