import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTempDataDir } from "@/tests/support/temp-data-dir";
import { closeDatabase, getSequelize, writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { seedDemoClub } from "@/lib/seed/demo-club";
import { demoBoats, demoOarSets, demoRaceDayInDays, seedDemoFleet } from "@/lib/seed/demo-fleet";
import {
  createBoat,
  createOarSet,
  getBoatDetails,
  listFleet,
  setBoatArchived,
  setOarSetArchived,
  updateBoat,
  updateOarSet,
} from "@/lib/data/fleet";
import { listRigPlans, saveRigPlan } from "@/lib/data/rig-plans";
import { addRaceDay, cleaningOverview, recordCleaning, removeRaceDay, setHumidSpell } from "@/lib/data/cleaning";
import { sendCleaningDigestNow, sendWeeklyCleaningDigests } from "@/lib/data/cleaning-digest";
import { listOutbox } from "@/lib/mail/outbox";
import { clubToday } from "@/lib/data/club-settings";
import { localIsoDate } from "@/lib/care/calendar";
import { addDaysIso } from "@/lib/care/dates";
import { planRigChange } from "@/lib/rigging/plan";
import { POST as planRoute } from "@/app/api/rig/plan/route";
import { encode } from "next-auth/jwt";
import { authOptions } from "@/lib/auth/options";
import { AuditEvent, Boat, CleaningDigest, Club, OarSet, RigPlan, User } from "@/models";
import type { Actor } from "@/lib/auth/permissions";
import { ForbiddenError, NotFoundError, TooManyRequestsError, ValidationError } from "@/lib/http/errors";
import { boatSchema, oarSetSchema } from "@/lib/validations/fleet";
import { savedRigPlanSchema } from "@/lib/validations/rig-plans";
import { cleaningRecordSchemaFor } from "@/lib/validations/cleaning";

createTempDataDir("fleet");

let admin: Actor;
let coach: Actor;
let athlete: Actor;
let otherClubCoach: Actor;
let otherClubAthlete: Actor;

function actorOf(user: User): Actor {
  return { id: user.id, clubId: user.clubId, role: user.role, name: user.name, email: user.email };
}

async function actorFor(email: string): Promise<Actor> {
  const user = await User.findOne({ where: { email } });
  return actorOf(user!);
}

beforeAll(async () => {
  await databaseReady();
  const sequelize = getSequelize();
  await seedDemoClub(sequelize);
  await seedDemoFleet(sequelize);
  admin = await actorFor("admin@lantern-reach.example");
  coach = await actorFor("coach.tobias@lantern-reach.example");
  athlete = await actorFor("ada@lantern-reach.example");
  const { other, otherCoach, otherAthlete } = await writeTransaction(async (transaction) => {
    const other = await Club.create({ name: "Saltmarsh Test Club", slug: "saltmarsh-test", settings: {} }, { transaction });
    const otherCoach = await User.create(
      { clubId: other.id, email: "coach@saltmarsh.example", name: "Other Coach", role: "coach" },
      { transaction },
    );
    const otherAthlete = await User.create(
      { clubId: other.id, email: "rower@saltmarsh.example", name: "Other Rower", role: "athlete" },
      { transaction },
    );
    return { other, otherCoach, otherAthlete };
  });
  expect(other.id).not.toBe(admin.clubId);
  otherClubCoach = actorOf(otherCoach);
  otherClubAthlete = actorOf(otherAthlete);
});

afterAll(async () => {
  await closeDatabase();
});

const scullingBoat = boatSchema.parse({ name: "Osprey", boatClass: "2x", spanCm: 159 });
const sweepBoat = boatSchema.parse({ name: "Cormorant", boatClass: "4-", spreadCm: 85 });

describe("demo fleet seed", () => {
  it("adds the demo boats, oar sets, cleanings and a race day once", async () => {
    const club = await Club.findByPk(admin.clubId);
    expect(await Boat.count({ where: { clubId: admin.clubId } })).toBe(demoBoats.length);
    expect(await OarSet.count({ where: { clubId: admin.clubId } })).toBe(demoOarSets.length);
    const again = await seedDemoFleet(getSequelize());
    expect(again).toEqual({ boats: 0, oarSets: 0 });
    const settings = (await Club.findByPk(admin.clubId))!.settings as { raceDays: string[] };
    expect(settings.raceDays).toEqual([addDaysIso(localIsoDate(), demoRaceDayInDays)]);
    expect(club).not.toBeNull();
  });

  it("leaves one set overdue and one fine", async () => {
    const overview = await cleaningOverview(athlete);
    const byName = new Map(overview.oarSets.map((set) => [set.name, set]));
    expect(byName.get("Eight sweeps")?.state).toMatchObject({ due: true, reason: "over-7-days" });
    expect(byName.get("Green-band sculls")?.state).toMatchObject({ due: false, reason: "ok" });
    expect(byName.get("Pair sweeps")?.state).toMatchObject({ due: true, reason: "never-cleaned" });
  });
});

describe("boats and oar sets", () => {
  it("lets coaches and admins add boats, and refuses athletes with ForbiddenError", async () => {
    await expect(createBoat(athlete, scullingBoat)).rejects.toBeInstanceOf(ForbiddenError);
    const saved = await createBoat(admin, scullingBoat);
    expect(saved.warnings).toEqual([]);
    const sweep = await createBoat(coach, sweepBoat);
    expect(sweep.id).toBeGreaterThan(0);
    await expect(createBoat(coach, { ...scullingBoat, name: "osprey" })).rejects.toBeInstanceOf(ValidationError);
  });

  it("warns about an unusual span but saves the boat", async () => {
    const saved = await createBoat(coach, boatSchema.parse({ name: "Wide single", boatClass: "1x", spanCm: 170 }));
    expect(saved.warnings).toHaveLength(1);
    expect(saved.warnings[0]).toContain("outside the usual 157–161 cm");
  });

  it("hides another club's boat behind NotFoundError", async () => {
    const boat = await Boat.findOne({ where: { name: "Osprey" } });
    await expect(getBoatDetails(otherClubAthlete, boat!.id)).rejects.toBeInstanceOf(NotFoundError);
    await expect(updateBoat(otherClubCoach, boat!.id, scullingBoat)).rejects.toBeInstanceOf(NotFoundError);
    await expect(setBoatArchived(otherClubCoach, boat!.id, true)).rejects.toBeInstanceOf(NotFoundError);
    expect((await listFleet(otherClubAthlete)).boats).toEqual([]);
  });

  it("adds an oar set used in boats of its own type only, with limit warnings", async () => {
    const osprey = await Boat.findOne({ where: { name: "Osprey" } });
    const cormorant = await Boat.findOne({ where: { name: "Cormorant" } });
    const input = oarSetSchema.parse({
      name: "Test sculls",
      oarType: "sculling",
      oarCount: 4,
      targetLengthCm: 288,
      targetInboardCm: 88,
      clickCm: 0.5,
      handleMechanism: "clamped-slide",
      boatIds: [osprey!.id],
    });
    await expect(createOarSet(athlete, input)).rejects.toBeInstanceOf(ForbiddenError);
    await expect(createOarSet(coach, { ...input, boatIds: [cormorant!.id] })).rejects.toMatchObject({
      fieldErrors: { boatIds: [expect.stringContaining("cannot be used in Cormorant")] },
    });
    const saved = await createOarSet(coach, input);
    expect(saved.warnings).toEqual([]);
    const details = await getBoatDetails(athlete, osprey!.id);
    expect(details.oarSets.map((set) => set.name)).toEqual(["Test sculls"]);

    // Default limits (common practice, no source): sculls 280–292 cm long.
    const long = await updateOarSet(coach, saved.id, { ...input, targetLengthCm: 293 });
    expect(long.warnings).toEqual([expect.stringContaining("ask your coach before going afloat")]);
    await updateOarSet(coach, saved.id, input);
  });

  it("refuses to turn a boat with sculls linked into a sweep boat", async () => {
    const osprey = await Boat.findOne({ where: { name: "Osprey" } });
    await expect(updateBoat(coach, osprey!.id, boatSchema.parse({ name: "Osprey", boatClass: "2-", spreadCm: 85 }))).rejects.toMatchObject({
      fieldErrors: { boatClass: [expect.stringContaining("Unlink")] },
    });
  });

  it("archives instead of deleting: gone from athletes' lists, back when restored", async () => {
    const set = await OarSet.findOne({ where: { name: "Test sculls" } });
    await setOarSetArchived(coach, set!.id, true);
    expect((await listFleet(athlete)).oarSets.map((s) => s.name)).not.toContain("Test sculls");
    expect((await listFleet(coach, { includeArchived: true })).oarSets.find((s) => s.name === "Test sculls")?.archived).toBe(true);
    await expect(listFleet(athlete, { includeArchived: true })).rejects.toBeInstanceOf(ForbiddenError);
    // Archiving it again changes nothing: the archive date stays, and no second audit row is written.
    const archivedAt = (await OarSet.findByPk(set!.id))!.archivedAt;
    const audits = () => AuditEvent.count({ where: { subjectType: "oar_set", subjectId: String(set!.id) } });
    const auditsBefore = await audits();
    await new Promise((resolve) => setTimeout(resolve, 5));
    await setOarSetArchived(coach, set!.id, true);
    expect((await OarSet.findByPk(set!.id))!.archivedAt).toEqual(archivedAt);
    expect(await audits()).toBe(auditsBefore);
    await setOarSetArchived(coach, set!.id, false);
    expect(await audits()).toBe(auditsBefore + 1);
    expect(await OarSet.findByPk(set!.id)).not.toBeNull();
    expect((await listFleet(athlete)).oarSets.map((s) => s.name)).toContain("Test sculls");
  });
});

describe("saved rig plans", () => {
  it("keeps the plan with boat, oar set, measurements, result and time, once per phone id", async () => {
    const osprey = await Boat.findOne({ where: { name: "Osprey" } });
    const set = await OarSet.findOne({ where: { name: "Test sculls" } });
    const input = savedRigPlanSchema.parse({
      clientId: "0b6f3c1e-7a52-4c1e-9a0e-2f4b8d6a1c33",
      boatId: osprey!.id,
      oarSetId: set!.id,
      request: { oarType: "sculling", measured: { lengthCm: 287, inboardCm: 87 }, target: { lengthCm: 288, inboardCm: 88 }, spanCm: 159 },
      plannedAt: new Date().toISOString(),
    });
    const first = await saveRigPlan(athlete, input);
    expect(first.created).toBe(true);
    expect(await saveRigPlan(athlete, input)).toEqual({ id: first.id, created: false });
    const stored = await RigPlan.findByPk(first.id);
    // Handle out 1 cm takes the inboard 87 → 88 (the collar stays put): no clicks (common practice, no source).
    expect(stored!.result).toMatchObject({ length: { changeCm: 1, action: "lengthen" }, inboard: { clicks: 0, direction: "none" } });
    // Overlap (2 × (88 + 2) − 159 = 21 cm): FISA 2006 protocol.
    expect(stored!.result.overlapCm).toBe(21);

    await expect(listRigPlans(athlete)).rejects.toBeInstanceOf(ForbiddenError);
    const plans = await listRigPlans(coach, { boatId: osprey!.id });
    expect(plans).toHaveLength(1);
    expect(plans[0]).toMatchObject({
      athleteName: "Ada Whitcombe",
      boatName: "Osprey",
      oarSetName: "Test sculls",
      measured: { lengthCm: 287, inboardCm: 87 },
    });
    const grebe = await Boat.findOne({ where: { name: "Grebe" } });
    expect(await listRigPlans(coach, { boatId: grebe!.id })).toEqual([]);
    expect(await listRigPlans(otherClubCoach)).toEqual([]);
    // A boat that is not the club's is not found, rather than a boat without plans.
    await expect(listRigPlans(otherClubCoach, { boatId: osprey!.id })).rejects.toBeInstanceOf(NotFoundError);
    await expect(listRigPlans(coach, { boatId: 999_999 })).rejects.toBeInstanceOf(NotFoundError);
  });

  it("refuses another club's boat and a set that does not suit the boat", async () => {
    const osprey = await Boat.findOne({ where: { name: "Osprey" } });
    const sweeps = await OarSet.findOne({ where: { name: "Eight sweeps" } });
    const set = await OarSet.findOne({ where: { name: "Test sculls" } });
    const base = {
      clientId: "5d0c7e9a-1b2c-4d3e-8f4a-5b6c7d8e9f01",
      boatId: osprey!.id,
      oarSetId: set!.id,
      request: { oarType: "sculling", measured: { lengthCm: 287, inboardCm: 87 }, target: { lengthCm: 288, inboardCm: 88 } },
      plannedAt: new Date().toISOString(),
    };
    await expect(saveRigPlan(otherClubAthlete, savedRigPlanSchema.parse(base))).rejects.toBeInstanceOf(NotFoundError);
    await expect(saveRigPlan(athlete, savedRigPlanSchema.parse({ ...base, oarSetId: sweeps!.id }))).rejects.toBeInstanceOf(ValidationError);
    expect(savedRigPlanSchema.safeParse({ ...base, plannedAt: new Date(Date.now() + 86_400_000).toISOString() }).success).toBe(false);
  });
});

describe("grip-cleaning log", () => {
  it("records a cleaning that makes a due set not due", async () => {
    const today = localIsoDate();
    const sweeps = await OarSet.findOne({ where: { name: "Eight sweeps" } });
    const before = await cleaningOverview(athlete);
    expect(before.oarSets.find((set) => set.oarSetId === sweeps!.id)?.status).toMatchObject({ due: true, label: "Overdue" });
    await recordCleaning(
      athlete,
      cleaningRecordSchemaFor(today).parse({ oarSetId: sweeps!.id, cleanedOn: today, method: "detergent-brush" }),
    );
    const after = await cleaningOverview(athlete);
    const row = after.oarSets.find((set) => set.oarSetId === sweeps!.id);
    expect(row).toMatchObject({ lastCleanedOn: today, lastCleanedBy: "Ada Whitcombe", status: { due: false, icon: "✓" } });
    expect(after.recent[0]).toMatchObject({ oarSetName: "Eight sweeps", cleanedBy: "Ada Whitcombe" });
  });

  it("refuses future dates, other clubs' sets and members, and 'other' without a note", async () => {
    const today = localIsoDate();
    const sweeps = await OarSet.findOne({ where: { name: "Eight sweeps" } });
    expect(
      cleaningRecordSchemaFor(today).safeParse({ oarSetId: sweeps!.id, cleanedOn: addDaysIso(today, 1), method: "wipe-down" }).success,
    ).toBe(false);
    expect(cleaningRecordSchemaFor(today).safeParse({ oarSetId: sweeps!.id, cleanedOn: today, method: "other" }).success).toBe(false);
    const input = cleaningRecordSchemaFor(today).parse({ oarSetId: sweeps!.id, cleanedOn: today, method: "wipe-down" });
    await expect(recordCleaning(otherClubAthlete, input)).rejects.toBeInstanceOf(NotFoundError);
    await expect(recordCleaning(athlete, { ...input, cleanedById: otherClubAthlete.id })).rejects.toBeInstanceOf(ValidationError);
  });

  it("lets coaches, not athletes, change race days and the humid spell", async () => {
    const today = localIsoDate();
    const race = addDaysIso(today, 20);
    await expect(addRaceDay(athlete, race)).rejects.toBeInstanceOf(ForbiddenError);
    expect(await addRaceDay(coach, race)).toMatchObject({ changed: true, raceDays: expect.arrayContaining([race]) });
    // Adding it again changes nothing, and says so (the form answers "already a race day").
    expect(await addRaceDay(coach, race)).toMatchObject({ changed: false, raceDays: expect.arrayContaining([race]) });
    expect(await removeRaceDay(coach, race)).toMatchObject({ changed: true });
    // A day that is not there, and the humid spell as it already is: answered, but nothing written or audited.
    const calendarAudits = () =>
      AuditEvent.count({ where: { subjectType: "club", action: ["club.race-day-removed", "club.humid-spell"] } });
    const calendarAuditsBefore = await calendarAudits();
    expect(await removeRaceDay(coach, race)).toMatchObject({ changed: false });
    expect(await setHumidSpell(coach, false)).toMatchObject({ changed: false, humidSpell: false });
    expect(await calendarAudits()).toBe(calendarAuditsBefore);
    await setHumidSpell(coach, true);
    const humid = await cleaningOverview(athlete);
    // Cleaned today: during a humid spell still fine today, due again tomorrow.
    expect(humid.oarSets.find((set) => set.name === "Eight sweeps")?.state).toMatchObject({ due: false, nextDueOn: addDaysIso(today, 1) });
    expect(humid.oarSets.find((set) => set.name === "Green-band sculls")?.state).toMatchObject({ due: true, reason: "humid-spell" });
    await setHumidSpell(admin, false);
    const settings = (await Club.findByPk(admin.clubId))!.settings as Record<string, unknown>;
    expect(settings.humidSpell).toBe(false);
  });
});

describe("weekly cleaning digest", () => {
  it("mails every active coach and admin once per ISO week per club, remembered in the database", async () => {
    const monday = new Date(2030, 0, 7, 9, 0); // Monday 7 January 2030: ISO week 2030-W02
    const first = await sendWeeklyCleaningDigests(monday);
    expect(first.isoWeeks).toEqual(["2030-W02"]);
    expect(first.sentToClubs).toEqual(expect.arrayContaining([admin.clubId, otherClubCoach.clubId]));
    const mails = await listOutbox();
    const digests = mails.filter((mail) => mail.subject.includes("2030-W02"));
    const recipients = digests.map((mail) => mail.to).sort();
    expect(recipients).toEqual(
      [
        "admin@lantern-reach.example",
        "coach.ines@lantern-reach.example",
        "coach.tobias@lantern-reach.example",
        "coach@saltmarsh.example",
      ].sort(),
    );
    const lantern = digests.find((mail) => mail.to === "coach.tobias@lantern-reach.example");
    expect(lantern?.text).toContain("Pair sweeps: due now. No cleaning on record.");

    const later = new Date(2030, 0, 13, 22, 0); // Sunday of the same week
    expect((await sendWeeklyCleaningDigests(later)).sentToClubs).toEqual([]);
    expect((await listOutbox()).filter((mail) => mail.subject.includes("2030-W02"))).toHaveLength(4);
    expect(await CleaningDigest.count({ where: { isoWeek: "2030-W02", state: "sent" } })).toBe(2);

    const nextWeek = new Date(2030, 0, 14, 0, 30);
    expect((await sendWeeklyCleaningDigests(nextWeek)).sentToClubs).toHaveLength(2);
  });

  it("sends now for coaches, counts as the week's digest, and refuses athletes", async () => {
    await expect(sendCleaningDigestNow(athlete)).rejects.toBeInstanceOf(ForbiddenError);
    const wednesday = new Date(2030, 1, 6, 12, 0); // 2030-W06
    const sent = await sendCleaningDigestNow(coach, wednesday);
    expect(sent).toEqual({ recipients: 3, isoWeek: "2030-W06" });
    const run = await sendWeeklyCleaningDigests(wednesday);
    expect(run.sentToClubs).not.toContain(coach.clubId);
    expect(run.sentToClubs).toContain(otherClubCoach.clubId);
  });

  it("sends at most three by hand an hour per club, then answers 429 with when to try again", async () => {
    const wednesday = new Date(2030, 1, 13, 12, 0); // 2030-W07
    // One was sent by hand in the test above: two more are allowed this hour, then it refuses.
    await sendCleaningDigestNow(coach, wednesday);
    await sendCleaningDigestNow(coach, wednesday);
    const refused = sendCleaningDigestNow(coach, wednesday);
    await expect(refused).rejects.toBeInstanceOf(TooManyRequestsError);
    await refused.catch((error: TooManyRequestsError) => {
      expect(error.status).toBe(429);
      expect(error.message).toMatch(/sent 3 times in the last hour/);
      expect(error.retryAfterSeconds).toBeGreaterThan(0);
    });
    // Another club's coaches are counted on their own.
    await expect(sendCleaningDigestNow(otherClubCoach, wednesday)).resolves.toMatchObject({ isoWeek: "2030-W07" });
  });

  it("goes by each club's own time zone: its today, and the week of its digest", async () => {
    const stored = new Map<number, Record<string, unknown>>();
    const setZone = (clubId: number, timeZone: string) =>
      writeTransaction(async (transaction) => {
        const club = (await Club.findByPk(clubId, { transaction }))!;
        stored.set(clubId, club.settings);
        await club.update({ settings: { ...club.settings, timeZone } }, { transaction });
      });
    await setZone(coach.clubId, "UTC");
    await setZone(otherClubCoach.clubId, "Pacific/Auckland");
    try {
      // Sunday 5 January 2031 at noon UTC is 01:00 on Monday 6 January in Auckland (UTC+13 in summer,
      // IANA Time Zone Database, IANA, 2025): a new day there, and a new ISO week (2031-W02).
      const sundayNoonUtc = new Date("2031-01-05T12:00:00Z");
      expect(await clubToday(coach.clubId, sundayNoonUtc)).toBe("2031-01-05");
      expect(await clubToday(otherClubCoach.clubId, sundayNoonUtc)).toBe("2031-01-06");
      expect((await cleaningOverview(otherClubAthlete, sundayNoonUtc)).today).toBe("2031-01-06");
      const run = await sendWeeklyCleaningDigests(sundayNoonUtc);
      expect(run.isoWeeks.sort()).toEqual(["2031-W01", "2031-W02"]);
      expect(await CleaningDigest.count({ where: { clubId: coach.clubId, isoWeek: "2031-W01", state: "sent" } })).toBe(1);
      expect(await CleaningDigest.count({ where: { clubId: otherClubCoach.clubId, isoWeek: "2031-W02", state: "sent" } })).toBe(1);
    } finally {
      await writeTransaction(async (transaction) => {
        for (const [clubId, settings] of stored) await Club.update({ settings }, { where: { id: clubId }, transaction });
      });
    }
  });
});

function planRequest(body: unknown, headers: Record<string, string> = {}): Request {
  return new Request("http://127.0.0.1/api/rig/plan", {
    method: "POST",
    headers: { "content-type": "application/json", ...headers },
    body: typeof body === "string" ? body : JSON.stringify(body),
  });
}

const goodPlan = {
  oarType: "sculling",
  measured: { lengthCm: 287, inboardCm: 87 },
  target: { lengthCm: 288, inboardCm: 89 },
  spanCm: 159,
};

describe("POST /api/rig/plan", () => {
  it("answers the plan from the engine for anyone, without signing in", async () => {
    const response = await planRoute(planRequest(goodPlan), undefined);
    expect(response.status).toBe(200);
    const body = (await response.json()) as Record<string, unknown>;
    const expected = planRigChange({ ...goodPlan, oarType: "sculling", clickCm: 0.5, halfSwivelCm: 2 });
    expect(body).toEqual({
      length: expected.length,
      inboard: {
        changeCm: expected.inboard.changeCm,
        clicks: expected.inboard.clicks,
        direction: expected.inboard.direction,
        residualCm: expected.inboard.residualCm,
      },
      outboardCm: expected.outboardCm,
      leverRatio: expected.leverRatio,
      spanGearing: expected.spanGearing,
      overlapCm: expected.overlapCm,
      warnings: [],
    });
    // L 288, I 89, span 159: O 199; overlap 2 × (89 + 2) − 159 = 23 (FISA 2006 protocol).
    expect(body).toMatchObject({ outboardCm: 199, overlapCm: 23, inboard: { clicks: 2, direction: "towards-blade" } });
  });

  it("warns when the target is outside the default limits", async () => {
    const response = await planRoute(planRequest({ ...goodPlan, target: { lengthCm: 294, inboardCm: 88 } }), undefined);
    const body = (await response.json()) as { warnings: string[] };
    expect(body.warnings.join(" ")).toContain("ask your coach before going afloat");
  });

  const malformed: [string, unknown, string][] = [
    ["a string for a length", { ...goodPlan, measured: { lengthCm: "287", inboardCm: 87 } }, "measured.lengthCm"],
    ["a negative inboard", { ...goodPlan, measured: { lengthCm: 287, inboardCm: -87 } }, "measured.inboardCm"],
    ["an inboard longer than the oar", { ...goodPlan, target: { lengthCm: 288, inboardCm: 290 } }, "target.inboardCm"],
    ["a 3 m scull", { ...goodPlan, target: { lengthCm: 300, inboardCm: 88 } }, "target.lengthCm"],
    [
      "a 2 m sweep oar",
      {
        ...goodPlan,
        oarType: "sweep",
        spanCm: undefined,
        measured: { lengthCm: 200, inboardCm: 80 },
        target: { lengthCm: 374, inboardCm: 116 },
      },
      "measured.lengthCm",
    ],
    ["an unknown oar type", { ...goodPlan, oarType: "paddle" }, "oarType"],
    ["a missing target", { oarType: "sculling", measured: goodPlan.measured }, "target"],
    ["a zero click", { ...goodPlan, clickCm: 0 }, "clickCm"],
    ["a click as text", { ...goodPlan, clickCm: "half" }, "clickCm"],
    ["a span of 2 m", { ...goodPlan, spanCm: 200 }, "spanCm"],
    ["a negative half swivel", { ...goodPlan, halfSwivelCm: -1 }, "halfSwivelCm"],
    ["a null length", { ...goodPlan, measured: { lengthCm: null, inboardCm: 87 } }, "measured.lengthCm"],
    ["an unknown field", { ...goodPlan, limits: { maxLengthCm: 999 } }, "limits"],
    [
      "a handle move longer than the inboard",
      { ...goodPlan, measured: { lengthCm: 299, inboardCm: 1 }, target: { lengthCm: 250, inboardCm: 88 } },
      "measured.inboardCm",
    ],
    ["not JSON", "{lengthCm: 287", "body"],
    ["an array", [goodPlan], "body"],
  ];

  it.each(malformed)("refuses %s with 400 naming the field", async (_label, body, field) => {
    const response = await planRoute(planRequest(body), undefined);
    expect(response.status).toBe(400);
    const json = (await response.json()) as { error: string; fields: Record<string, string[]> };
    expect(json.error).toBe("invalid_input");
    expect(Object.keys(json.fields)).toContain(field);
  });

  it("checks a signed-in member's plan against their club's limits, anyone else's against the defaults", async () => {
    const club = await Club.findByPk(athlete.clubId);
    const before = club!.settings;
    const limits = {
      sculling: { minLengthCm: 280, maxLengthCm: 295, minInboardCm: 85, maxInboardCm: 91 },
      sweep: { minLengthCm: 366, maxLengthCm: 380, minInboardCm: 112, maxInboardCm: 120 },
    };
    await writeTransaction((transaction) => club!.update({ settings: { ...before, limits } }, { transaction }));
    const user = await User.findByPk(athlete.id);
    const { secret } = authOptions();
    const session = (tokenVersion: number) =>
      encode({ token: { uid: athlete.id, role: "athlete", clubId: athlete.clubId, tokenVersion }, secret: secret! }).then(
        (jwt) => `next-auth.session-token=${jwt}`,
      );
    const body = { ...goodPlan, target: { lengthCm: 293, inboardCm: 88 } };
    const warningsFor = async (headers: Record<string, string>) =>
      ((await (await planRoute(planRequest(body, headers), undefined)).json()) as { warnings: string[] }).warnings;

    expect(await warningsFor({ cookie: await session(user!.tokenVersion) })).toEqual([]);
    expect(await warningsFor({})).toEqual([expect.stringContaining("above your club's range for sculls (280–292 cm)")]);
    // A session whose token version moved on (signed out everywhere) counts as nobody.
    expect(await warningsFor({ cookie: await session(user!.tokenVersion + 1) })).toHaveLength(1);
    await writeTransaction((transaction) => club!.update({ settings: before }, { transaction }));
  });

  it("refuses a body that is not JSON by type with 415", async () => {
    const response = await planRoute(planRequest(goodPlan, { "content-type": "text/plain" }), undefined);
    expect(response.status).toBe(415);
  });

  it("throttles one address with 429 and a Retry-After", async () => {
    const statuses: number[] = [];
    for (let index = 0; index < 61; index += 1) {
      const response = await planRoute(planRequest(goodPlan, { "x-forwarded-for": "203.0.113.9" }), undefined);
      statuses.push(response.status);
    }
    expect(statuses.slice(0, 60).every((status) => status === 200)).toBe(true);
    expect(statuses[60]).toBe(429);
    const refused = await planRoute(planRequest(goodPlan, { "x-forwarded-for": "203.0.113.9" }), undefined);
    expect(refused.headers.get("retry-after")).toMatch(/^\d+$/);
    const other = await planRoute(planRequest(goodPlan, { "x-forwarded-for": "203.0.113.10" }), undefined);
    expect(other.status).toBe(200);
  });
});
