import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTempDataDir } from "@/tests/support/temp-data-dir";

createTempDataDir("demo-certification");

const { closeDatabase, getSequelize } = await import("@/lib/db");
const { databaseReady } = await import("@/lib/data/database");
const { seedDemoClub } = await import("@/lib/seed/demo-club");
const { seedDemoCertification } = await import("@/lib/seed/demo-certification");
const { rosterMatrix } = await import("@/lib/data/clearance");
const { registerFor } = await import("@/lib/data/register");
const { signOffQueue } = await import("@/lib/data/sign-offs");
const { rosterRowMatches } = await import("@/lib/clearance/roster");
const { User, Certificate, QuizAttempt } = await import("@/models");
const { isoDateOf } = await import("@/lib/clearance/dates");
const { machineTimeZone } = await import("@/lib/care/calendar");

async function actorFor(email: string) {
  const user = (await User.findOne({ where: { email } }))!;
  return { id: user.id, clubId: user.clubId, role: user.role, name: user.name, email: user.email };
}

beforeAll(async () => {
  await databaseReady();
  await seedDemoClub(getSequelize());
});

afterAll(async () => {
  await closeDatabase();
});

describe("demo certification seed", () => {
  it("stages athletes at every stage and leaves ada and bilal untouched", async () => {
    expect(await seedDemoCertification(getSequelize())).toEqual({ staged: 10 });
    const coach = await actorFor("coach.tobias@lantern-reach.example");
    const matrix = await rosterMatrix(coach);
    const byEmail = new Map(matrix.athletes.map((row) => [row.email, row]));
    const state = (email: string) => byEmail.get(`${email}@lantern-reach.example`)!.clearance.state;
    for (const untouched of ["ada", "bilal"]) {
      const row = byEmail.get(`${untouched}@lantern-reach.example`)!;
      expect(Object.values(row.modules).every((cell) => cell.status === "not-started")).toBe(true);
    }
    expect(Object.values(byEmail.get("carys@lantern-reach.example")!.modules).map((cell) => cell.status)).toEqual(
      Array(5).fill("ready-for-sign-off"),
    );
    expect(state("femi")).toBe("cleared");
    expect(state("greta")).toBe("cleared");
    expect(state("hamish")).toBe("suspended");
    expect(state("lena")).toBe("expired");
    const expiring = matrix.athletes.filter((row) => rosterRowMatches(row, "expiring-soon", "", matrix.today)).map((row) => row.name);
    expect(expiring).toEqual(["Greta Quennell"]);
    expect(byEmail.get("iris@lantern-reach.example")!.modules["overall-length"]?.status).toBe("ready-for-sign-off");
    expect(byEmail.get("iris@lantern-reach.example")!.modules["setting-inboard"]?.status).toBe("not-yet");
    expect(byEmail.get("elin@lantern-reach.example")!.waitingForMe).toBe(1);
    expect((await signOffQueue(coach)).map((entry) => entry.athleteName).sort()).toEqual(["Elin Marchetti", "Jonah Treloar"]);
    const admin = await actorFor("admin@lantern-reach.example");
    const revoked = await registerFor(admin, {
      module: "",
      kind: "all",
      status: "revoked",
      from: "",
      to: "",
    });
    expect(revoked.entries.map((entry) => entry.athleteName)).toEqual(["Iris Delacourt"]);
    expect(await Certificate.count({ where: { kind: "clearance" } })).toBe(4);
    // The demo club sets no time zone, so its day is the machine's.
    expect(matrix.today).toBe(isoDateOf(new Date(), machineTimeZone()));
  });

  it("changes nothing when run again", async () => {
    const before = await QuizAttempt.count();
    expect(await seedDemoCertification(getSequelize())).toEqual({ staged: 0 });
    expect(await QuizAttempt.count()).toBe(before);
  });
});
