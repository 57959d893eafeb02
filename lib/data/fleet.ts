import "server-only";
import { Op, type Transaction } from "sequelize";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { recordAudit } from "@/lib/data/audit";
import { assertAllowed, assertVisible, canManageFleet, type Actor } from "@/lib/auth/permissions";
import { NotFoundError, ValidationError } from "@/lib/http/errors";
import { oarTypeOfClass, type BoatClass, type HandleMechanism } from "@/lib/fleet/catalogue";
import { boatWarnings, oarSetWarnings } from "@/lib/fleet/warnings";
import { roundCm } from "@/lib/rigging/round";
import type { OarType } from "@/lib/rigging/types";
import { readClubSettings, type ClubSettings } from "@/lib/validations/club-settings";
import type { BoatInput, OarSetInput } from "@/lib/validations/fleet";
import { Boat, BoatOarSet, Club, OarSet } from "@/models";

export interface BoatSummary {
  id: number;
  name: string;
  boatClass: BoatClass;
  oarType: OarType;
  spanCm: number | null;
  spreadCm: number | null;
  notes: string;
  archived: boolean;
  /** Linked oar sets that the caller can see (active ones, plus archived ones for fleet managers). */
  oarSetIds: number[];
}

export interface OarSetSummary {
  id: number;
  name: string;
  oarType: OarType;
  oarCount: number;
  targetLengthCm: number;
  targetInboardCm: number;
  clickCm: number;
  handleMechanism: HandleMechanism;
  notes: string;
  archived: boolean;
  boatIds: number[];
}

export interface Fleet {
  boats: BoatSummary[];
  oarSets: OarSetSummary[];
}

/** What a saved boat or oar set answers: its id and the warnings that did not stop it being saved. */
export interface SavedFleetRecord {
  id: number;
  warnings: string[];
}

/** The settings the rig pages need from the club: limits, click, half swivel, race days, humid spell. */
export type RigSettings = Pick<ClubSettings, "limits" | "clickCm" | "halfSwivelCm" | "raceDays" | "humidSpell" | "timeZone">;

function toBoatSummary(boat: Boat, oarSetIds: number[]): BoatSummary {
  return {
    id: boat.id,
    name: boat.name,
    boatClass: boat.boatClass,
    oarType: oarTypeOfClass(boat.boatClass),
    spanCm: boat.spanCm ?? null,
    spreadCm: boat.spreadCm ?? null,
    notes: boat.notes,
    archived: boat.archivedAt !== null,
    oarSetIds,
  };
}

function toOarSetSummary(set: OarSet, boatIds: number[]): OarSetSummary {
  return {
    id: set.id,
    name: set.name,
    oarType: set.oarType,
    oarCount: set.oarCount,
    targetLengthCm: set.targetLengthCm,
    targetInboardCm: set.targetInboardCm,
    clickCm: set.clickCm,
    handleMechanism: set.handleMechanism,
    notes: set.notes,
    archived: set.archivedAt !== null,
    boatIds,
  };
}

function byName<T extends { name: string }>(a: T, b: T): number {
  return a.name.localeCompare(b.name, "en-GB", { sensitivity: "base" });
}

/** The rig settings of the actor's club (any member). */
export async function rigSettingsFor(actor: Actor): Promise<RigSettings> {
  await databaseReady();
  const club = await Club.findByPk(actor.clubId);
  const { limits, clickCm, halfSwivelCm, raceDays, humidSpell, timeZone } = readClubSettings(club?.settings);
  return { limits, clickCm, halfSwivelCm, raceDays, humidSpell, timeZone };
}

/**
 * The club's boats and oar sets with the links between them. Every member sees the active ones;
 * `includeArchived` (fleet managers only) adds the archived ones.
 */
export async function listFleet(actor: Actor, options: { includeArchived?: boolean } = {}): Promise<Fleet> {
  await databaseReady();
  const includeArchived = options.includeArchived ?? false;
  if (includeArchived) assertAllowed(canManageFleet(actor, actor.clubId), "Only coaches and administrators see archived boats.");
  const where = { clubId: actor.clubId, ...(includeArchived ? {} : { archivedAt: null }) };
  const [boats, oarSets] = await Promise.all([Boat.findAll({ where }), OarSet.findAll({ where })]);
  const boatIds = new Set(boats.map((boat) => boat.id));
  const setIds = new Set(oarSets.map((set) => set.id));
  const links = boatIds.size === 0 ? [] : await BoatOarSet.findAll({ where: { boatId: { [Op.in]: [...boatIds] } } });
  const visible = links.filter((link) => setIds.has(link.oarSetId));
  return {
    boats: boats
      .map((boat) =>
        toBoatSummary(
          boat,
          visible.filter((link) => link.boatId === boat.id).map((link) => link.oarSetId),
        ),
      )
      .sort(byName),
    oarSets: oarSets
      .map((set) =>
        toOarSetSummary(
          set,
          visible.filter((link) => link.oarSetId === set.id).map((link) => link.boatId),
        ),
      )
      .sort(byName),
  };
}

export interface BoatDetails {
  boat: BoatSummary;
  oarSets: OarSetSummary[];
  settings: RigSettings;
}

/** One boat with its oar sets, for its settings page; another club's boat, or an archived one for an athlete, is not found. */
export async function getBoatDetails(actor: Actor, boatId: number): Promise<BoatDetails> {
  await databaseReady();
  const boat = await Boat.findByPk(boatId);
  assertVisible(boat !== null && boat.clubId === actor.clubId);
  const manager = canManageFleet(actor, actor.clubId);
  assertVisible(boat.archivedAt === null || manager);
  const links = await BoatOarSet.findAll({ where: { boatId } });
  const sets = links.length
    ? await OarSet.findAll({
        where: { id: { [Op.in]: links.map((link) => link.oarSetId) }, clubId: actor.clubId, ...(manager ? {} : { archivedAt: null }) },
      })
    : [];
  return {
    boat: toBoatSummary(
      boat,
      sets.map((set) => set.id),
    ),
    oarSets: sets.map((set) => toOarSetSummary(set, [boatId])).sort(byName),
    settings: await rigSettingsFor(actor),
  };
}

async function boatOfClub(actor: Actor, boatId: number, transaction?: Transaction): Promise<Boat> {
  const boat = await Boat.findByPk(boatId, { transaction });
  if (!boat || boat.clubId !== actor.clubId) throw new NotFoundError();
  return boat;
}

async function oarSetOfClub(actor: Actor, oarSetId: number, transaction?: Transaction): Promise<OarSet> {
  const set = await OarSet.findByPk(oarSetId, { transaction });
  if (!set || set.clubId !== actor.clubId) throw new NotFoundError();
  return set;
}

/** Refuses a second active boat (or oar set) of the same name in a club, ignoring case. */
async function assertNameFree(
  kind: "boat" | "oar set",
  actor: Actor,
  name: string,
  exceptId: number | null,
  transaction: Transaction,
): Promise<void> {
  const options = { where: { clubId: actor.clubId, archivedAt: null }, attributes: ["id", "name"], transaction };
  const rows: { id: number; name: string }[] = kind === "boat" ? await Boat.findAll(options) : await OarSet.findAll(options);
  const wanted = name.toLocaleLowerCase("en-GB");
  if (rows.some((row) => row.id !== exceptId && row.name.toLocaleLowerCase("en-GB") === wanted)) {
    const message = `Another ${kind} of the club is already called "${name}".`;
    throw new ValidationError(message, { name: [message] });
  }
}

function boatColumns(input: BoatInput) {
  const sculling = oarTypeOfClass(input.boatClass) === "sculling";
  return {
    name: input.name,
    boatClass: input.boatClass,
    spanCm: sculling && input.spanCm !== undefined ? roundCm(input.spanCm) : null,
    spreadCm: !sculling && input.spreadCm !== undefined ? roundCm(input.spreadCm) : null,
    notes: input.notes,
  };
}

async function linkedActiveSets(boatId: number, transaction?: Transaction): Promise<OarSet[]> {
  const links = await BoatOarSet.findAll({ where: { boatId }, transaction });
  if (links.length === 0) return [];
  return OarSet.findAll({ where: { id: { [Op.in]: links.map((link) => link.oarSetId) }, archivedAt: null }, transaction });
}

/** A coach or admin adds a boat; warnings (unusual span or spread) do not stop it. */
export async function createBoat(actor: Actor, input: BoatInput): Promise<SavedFleetRecord> {
  await databaseReady();
  assertAllowed(canManageFleet(actor, actor.clubId), "Only coaches and administrators can add boats.");
  const boat = await writeTransaction(async (transaction) => {
    await assertNameFree("boat", actor, input.name, null, transaction);
    const created = await Boat.create({ clubId: actor.clubId, ...boatColumns(input) }, { transaction });
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: "boat.created",
        subjectType: "boat",
        subjectId: created.id,
        details: { name: created.name },
      },
      transaction,
    );
    return created;
  });
  const { halfSwivelCm } = await rigSettingsFor(actor);
  return { id: boat.id, warnings: boatWarnings(boat, [], halfSwivelCm) };
}

/** A coach or admin edits a boat. Its class may not move to the other oar type while oar sets of the old type are linked. */
export async function updateBoat(actor: Actor, boatId: number, input: BoatInput): Promise<SavedFleetRecord> {
  await databaseReady();
  assertAllowed(canManageFleet(actor, actor.clubId), "Only coaches and administrators can change boats.");
  const { boat, sets } = await writeTransaction(async (transaction) => {
    const existing = await boatOfClub(actor, boatId, transaction);
    await assertNameFree("boat", actor, input.name, boatId, transaction);
    const linked = await linkedActiveSets(boatId, transaction);
    const newType = oarTypeOfClass(input.boatClass);
    const clash = linked.filter((set) => set.oarType !== newType);
    if (clash.length > 0) {
      const message = `Unlink ${clash.map((set) => `"${set.name}"`).join(", ")} from this boat before making it a ${newType} boat.`;
      throw new ValidationError(message, { boatClass: [message] });
    }
    await existing.update(boatColumns(input), { transaction });
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: "boat.updated",
        subjectType: "boat",
        subjectId: boatId,
        details: { name: input.name },
      },
      transaction,
    );
    return { boat: existing, sets: linked };
  });
  const { halfSwivelCm } = await rigSettingsFor(actor);
  return { id: boat.id, warnings: boatWarnings(boat, sets, halfSwivelCm) };
}

/** Archives or restores a boat; nothing is deleted, so saved plans keep pointing to it. */
export async function setBoatArchived(actor: Actor, boatId: number, archived: boolean): Promise<void> {
  await databaseReady();
  assertAllowed(canManageFleet(actor, actor.clubId), "Only coaches and administrators can archive boats.");
  await writeTransaction(async (transaction) => {
    const boat = await boatOfClub(actor, boatId, transaction);
    // Already so: the archive date and the audit trail stay as they are.
    if ((boat.archivedAt !== null) === archived) return;
    if (!archived) await assertNameFree("boat", actor, boat.name, boatId, transaction);
    await boat.update({ archivedAt: archived ? new Date() : null }, { transaction });
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: archived ? "boat.archived" : "boat.restored",
        subjectType: "boat",
        subjectId: boatId,
      },
      transaction,
    );
  });
}

function oarSetColumns(input: OarSetInput) {
  return {
    name: input.name,
    oarType: input.oarType,
    oarCount: input.oarCount,
    targetLengthCm: roundCm(input.targetLengthCm),
    targetInboardCm: roundCm(input.targetInboardCm),
    clickCm: roundCm(input.clickCm),
    handleMechanism: input.handleMechanism,
    notes: input.notes,
  };
}

/**
 * Sets the boats an oar set is used in: each chosen boat must be an active boat of the club for the same
 * oar type; links to archived boats are kept, since the form does not show them.
 */
async function linkBoats(actor: Actor, set: OarSet, boatIds: number[], transaction: Transaction): Promise<void> {
  const chosen = boatIds.length
    ? await Boat.findAll({ where: { id: { [Op.in]: boatIds }, clubId: actor.clubId, archivedAt: null }, transaction })
    : [];
  if (chosen.length !== boatIds.length) {
    throw new ValidationError("One of the chosen boats is not an active boat of your club.", { boatIds: ["Choose boats from the list."] });
  }
  const wrongType = chosen.filter((boat) => oarTypeOfClass(boat.boatClass) !== set.oarType);
  if (wrongType.length > 0) {
    const message = `${set.oarType === "sculling" ? "Sculls" : "Sweep oars"} cannot be used in ${wrongType.map((boat) => `${boat.name} (${boat.boatClass})`).join(", ")}.`;
    throw new ValidationError(message, { boatIds: [message] });
  }
  const existing = await BoatOarSet.findAll({ where: { oarSetId: set.id }, transaction });
  const archivedBoatIds = existing.length
    ? (
        await Boat.findAll({
          where: { id: { [Op.in]: existing.map((link) => link.boatId) }, archivedAt: { [Op.ne]: null } },
          attributes: ["id"],
          transaction,
        })
      ).map((boat) => boat.id)
    : [];
  const keep = new Set([...boatIds, ...archivedBoatIds]);
  const current = new Set(existing.map((link) => link.boatId));
  const removed = [...current].filter((id) => !keep.has(id));
  if (removed.length) await BoatOarSet.destroy({ where: { oarSetId: set.id, boatId: { [Op.in]: removed } }, transaction });
  const added = boatIds.filter((id) => !current.has(id));
  if (added.length)
    await BoatOarSet.bulkCreate(
      added.map((boatId) => ({ boatId, oarSetId: set.id })),
      { transaction },
    );
}

/** A coach or admin adds an oar set and the boats it is used in; values outside the club's limits are saved with warnings. */
export async function createOarSet(actor: Actor, input: OarSetInput): Promise<SavedFleetRecord> {
  await databaseReady();
  assertAllowed(canManageFleet(actor, actor.clubId), "Only coaches and administrators can add oar sets.");
  const settings = await rigSettingsFor(actor);
  const set = await writeTransaction(async (transaction) => {
    await assertNameFree("oar set", actor, input.name, null, transaction);
    const created = await OarSet.create({ clubId: actor.clubId, ...oarSetColumns(input) }, { transaction });
    await linkBoats(actor, created, input.boatIds, transaction);
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: "oar-set.created",
        subjectType: "oar_set",
        subjectId: created.id,
        details: { name: created.name },
      },
      transaction,
    );
    return created;
  });
  return { id: set.id, warnings: oarSetWarnings(set, settings.limits) };
}

/** A coach or admin edits an oar set; its oar type may change only if every chosen boat suits the new type. */
export async function updateOarSet(actor: Actor, oarSetId: number, input: OarSetInput): Promise<SavedFleetRecord> {
  await databaseReady();
  assertAllowed(canManageFleet(actor, actor.clubId), "Only coaches and administrators can change oar sets.");
  const settings = await rigSettingsFor(actor);
  const set = await writeTransaction(async (transaction) => {
    const existing = await oarSetOfClub(actor, oarSetId, transaction);
    await assertNameFree("oar set", actor, input.name, oarSetId, transaction);
    await existing.update(oarSetColumns(input), { transaction });
    await linkBoats(actor, existing, input.boatIds, transaction);
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: "oar-set.updated",
        subjectType: "oar_set",
        subjectId: oarSetId,
        details: { name: input.name },
      },
      transaction,
    );
    return existing;
  });
  return { id: set.id, warnings: oarSetWarnings(set, settings.limits) };
}

/** Archives or restores an oar set; its plans and cleaning records stay. */
export async function setOarSetArchived(actor: Actor, oarSetId: number, archived: boolean): Promise<void> {
  await databaseReady();
  assertAllowed(canManageFleet(actor, actor.clubId), "Only coaches and administrators can archive oar sets.");
  await writeTransaction(async (transaction) => {
    const set = await oarSetOfClub(actor, oarSetId, transaction);
    if ((set.archivedAt !== null) === archived) return;
    if (!archived) await assertNameFree("oar set", actor, set.name, oarSetId, transaction);
    await set.update({ archivedAt: archived ? new Date() : null }, { transaction });
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: archived ? "oar-set.archived" : "oar-set.restored",
        subjectType: "oar_set",
        subjectId: oarSetId,
      },
      transaction,
    );
  });
}

/** One boat for its edit form (fleet managers; archived ones included). */
export async function getBoatForEdit(actor: Actor, boatId: number): Promise<BoatSummary> {
  await databaseReady();
  assertAllowed(canManageFleet(actor, actor.clubId), "Only coaches and administrators can change boats.");
  const boat = await boatOfClub(actor, boatId);
  const links = await BoatOarSet.findAll({ where: { boatId } });
  return toBoatSummary(
    boat,
    links.map((link) => link.oarSetId),
  );
}

/** One oar set for its edit form (fleet managers; archived ones included). */
export async function getOarSetForEdit(actor: Actor, oarSetId: number): Promise<OarSetSummary> {
  await databaseReady();
  assertAllowed(canManageFleet(actor, actor.clubId), "Only coaches and administrators can change oar sets.");
  const set = await oarSetOfClub(actor, oarSetId);
  const links = await BoatOarSet.findAll({ where: { oarSetId } });
  return toOarSetSummary(
    set,
    links.map((link) => link.boatId),
  );
}
