import type { Sequelize } from "sequelize";
import { localIsoDate } from "@/lib/care/calendar";
import { addDaysIso } from "@/lib/care/dates";
import type { CleaningMethod } from "@/lib/care/methods";
import type { BoatClass, HandleMechanism } from "@/lib/fleet/catalogue";
import type { OarType } from "@/lib/rigging/types";
import { readClubSettings } from "@/lib/validations/club-settings";
import { demoClub } from "@/lib/seed/demo-club";
import { Boat, BoatOarSet, CleaningRecord, Club, initModels, OarSet, User } from "@/models";

/** Invented demo boats: names of water birds, settings inside the usual ranges. */
export const demoBoats: { name: string; boatClass: BoatClass; spanCm?: number; spreadCm?: number; notes: string }[] = [
  { name: "Heron", boatClass: "1x", spanCm: 160, notes: "Learn-to-scull single, wide and stable." },
  { name: "Kittiwake", boatClass: "2x", spanCm: 159, notes: "" },
  { name: "Tern", boatClass: "4x", spanCm: 158, notes: "Rigged for the junior squad." },
  { name: "Grebe", boatClass: "8+", spreadCm: 84, notes: "" },
  { name: "Moorhen", boatClass: "2-", spreadCm: 86, notes: "Stroke side rigged at bow." },
];

/** Invented demo oar sets and the boats they are used in. */
export const demoOarSets: {
  name: string;
  oarType: OarType;
  oarCount: number;
  targetLengthCm: number;
  targetInboardCm: number;
  clickCm: number;
  handleMechanism: HandleMechanism;
  boats: string[];
  /** Days before the seed day of the last cleaning; null for none on record. */
  cleanedDaysAgo: number | null;
  cleanedBy: string;
  method: CleaningMethod;
}[] = [
  {
    name: "Green-band sculls",
    oarType: "sculling",
    oarCount: 8,
    targetLengthCm: 288,
    targetInboardCm: 88,
    clickCm: 0.5,
    handleMechanism: "clamped-slide",
    boats: ["Heron", "Kittiwake", "Tern"],
    cleanedDaysAgo: 1,
    cleanedBy: "ada@lantern-reach.example",
    method: "detergent-brush",
  },
  {
    name: "Short-loom sculls",
    oarType: "sculling",
    oarCount: 2,
    targetLengthCm: 286,
    targetInboardCm: 87,
    clickCm: 0.5,
    handleMechanism: "end-screw",
    boats: ["Heron"],
    cleanedDaysAgo: 3,
    cleanedBy: "carys@lantern-reach.example",
    method: "wipe-down",
  },
  {
    name: "Eight sweeps",
    oarType: "sweep",
    oarCount: 8,
    targetLengthCm: 374,
    targetInboardCm: 116,
    clickCm: 0.5,
    handleMechanism: "clamped-slide",
    boats: ["Grebe"],
    cleanedDaysAgo: 12,
    cleanedBy: "bilal@lantern-reach.example",
    method: "detergent-brush",
  },
  {
    name: "Pair sweeps",
    oarType: "sweep",
    oarCount: 2,
    targetLengthCm: 372,
    targetInboardCm: 115,
    clickCm: 1,
    handleMechanism: "end-screw",
    boats: ["Moorhen"],
    cleanedDaysAgo: null,
    cleanedBy: "dev@lantern-reach.example",
    method: "wipe-down",
  },
];

/** Days after the seed day of the demo race day. */
export const demoRaceDayInDays = 5;

/**
 * Adds the demo club's boats, oar sets, cleaning records and a race day when they are missing; running it
 * again changes nothing (boats and sets are matched by name, cleanings are added only to sets with none,
 * the race day only when no race day lies ahead). Run after seedDemoClub.
 */
export async function seedDemoFleet(sequelize: Sequelize, now: Date = new Date()): Promise<{ boats: number; oarSets: number }> {
  initModels(sequelize);
  const today = localIsoDate(now);
  return sequelize.transaction(async (transaction) => {
    const club = await Club.findOne({ where: { slug: demoClub.slug }, transaction });
    if (!club) throw new Error("Seed the demo club first (seedDemoClub).");
    let boatsCreated = 0;
    let setsCreated = 0;
    const boatIds = new Map<string, number>();
    for (const boat of demoBoats) {
      const [row, created] = await Boat.findOrCreate({
        where: { clubId: club.id, name: boat.name },
        defaults: {
          clubId: club.id,
          name: boat.name,
          boatClass: boat.boatClass,
          spanCm: boat.spanCm ?? null,
          spreadCm: boat.spreadCm ?? null,
          notes: boat.notes,
        },
        transaction,
      });
      boatIds.set(boat.name, row.id);
      if (created) boatsCreated += 1;
    }
    for (const set of demoOarSets) {
      const { boats, cleanedDaysAgo, cleanedBy, method, ...columns } = set;
      const [row, created] = await OarSet.findOrCreate({
        where: { clubId: club.id, name: set.name },
        defaults: { clubId: club.id, ...columns },
        transaction,
      });
      if (created) setsCreated += 1;
      for (const boatName of boats) {
        const boatId = boatIds.get(boatName);
        if (boatId !== undefined) await BoatOarSet.findOrCreate({ where: { boatId, oarSetId: row.id }, transaction });
      }
      if (cleanedDaysAgo !== null && (await CleaningRecord.count({ where: { oarSetId: row.id }, transaction })) === 0) {
        const member = await User.findOne({ where: { email: cleanedBy }, transaction });
        if (member) {
          await CleaningRecord.create(
            {
              clubId: club.id,
              oarSetId: row.id,
              cleanedById: member.id,
              recordedById: member.id,
              cleanedOn: addDaysIso(today, -cleanedDaysAgo),
              method,
            },
            { transaction },
          );
        }
      }
    }
    const settings = readClubSettings(club.settings);
    if (!settings.raceDays.some((day) => day >= today)) {
      const raceDays = [...settings.raceDays, addDaysIso(today, demoRaceDayInDays)].sort();
      await club.update({ settings: { ...club.settings, raceDays } }, { transaction });
    }
    return { boats: boatsCreated, oarSets: setsCreated };
  });
}
