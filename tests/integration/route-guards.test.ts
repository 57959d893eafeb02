import path from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { createTempDataDir } from "@/tests/support/temp-data-dir";
import { installNextHeadersStandIn, withRequest } from "@/tests/support/request-scope";
import { callRoute, sessionCookieFor } from "@/tests/support/call-route";
import { testOrigin } from "@/tests/support/auth-handler";
import { actionFiles, missingGuardRows, paramsFor, projectRoot, routeFiles } from "@/tests/support/route-files";
import { actionGuardRows, guardRoles, routeGuardRows, type GuardFixtures, type GuardRole } from "@/tests/support/route-guard-table";

vi.mock("next/headers", async () => (await import("@/tests/support/request-scope")).nextHeadersStandIn);
vi.mock("next/cache", () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));

/** The typed error each action turned into its failure result, so the table can speak in statuses. */
const lastActionError: { current: unknown } = { current: null };
vi.mock("@/lib/http/action-result", async (importOriginal) => {
  const real = await importOriginal<typeof import("@/lib/http/action-result")>();
  return {
    ...real,
    actionFailure: (error: unknown) => {
      lastActionError.current = error;
      return real.actionFailure(error);
    },
  };
});

createTempDataDir("route-guards");
installNextHeadersStandIn();

const { closeDatabase, getSequelize } = await import("@/lib/db");
const { databaseReady } = await import("@/lib/data/database");
const { seedDemoClub, demoPassword } = await import("@/lib/seed/demo-club");
const { seedSecondClub, secondClubPassword } = await import("@/lib/seed/second-club");
const { seedDemoFleet } = await import("@/lib/seed/demo-fleet");
const { AppError } = await import("@/lib/http/errors");
const { Boat, BoatOarSet, Club, OarSet, User } = await import("@/models");

const accounts: Record<Exclude<GuardRole, "anonymous">, [string, string]> = {
  athlete: ["ada@lantern-reach.example", demoPassword],
  otherAthlete: ["athlete@brackwater.example", secondClubPassword],
  coach: ["coach.tobias@lantern-reach.example", demoPassword],
  otherCoach: ["coach@brackwater.example", secondClubPassword],
  admin: ["admin@lantern-reach.example", demoPassword],
  otherAdmin: ["admin@brackwater.example", secondClubPassword],
};
const cookies = {} as Record<GuardRole, string | undefined>;
let home: Omit<GuardFixtures, "tag"> = { homeAthleteId: 0, homeBoatId: 0, homeOarSetId: 0 };
let calls = 0;

function fixtures(): GuardFixtures {
  calls += 1;
  return { ...home, tag: `int${calls}` };
}

beforeAll(async () => {
  await databaseReady();
  await seedDemoClub(getSequelize());
  await seedSecondClub(getSequelize());
  await seedDemoFleet(getSequelize());
  const athlete = (await User.findOne({ where: { email: "lena@lantern-reach.example" } }))!;
  home = {
    homeAthleteId: athlete.id,
    homeBoatId: (await Boat.findOne({ where: { clubId: athlete.clubId, name: "Heron" } }))!.id,
    homeOarSetId: (await OarSet.findOne({ where: { clubId: athlete.clubId, name: "Short-loom sculls" } }))!.id,
  };
  cookies.anonymous = undefined;
  for (const [role, [email, password]] of Object.entries(accounts)) {
    cookies[role as GuardRole] = await sessionCookieFor(email, password);
  }
});

afterAll(async () => {
  await closeDatabase();
});

describe("the route-guard table", () => {
  it("has a row for every route handler method and server action, and none for ones that are gone", () => {
    const messages = missingGuardRows(routeGuardRows, actionGuardRows);
    expect(messages, messages.join("\n")).toEqual([]);
  });

  it("names the exact file when a handler has no row", () => {
    const withoutRoster = routeGuardRows.filter((row) => row.file !== "app/api/roster/route.ts");
    expect(missingGuardRows(withoutRoster, actionGuardRows)).toEqual([
      "app/api/roster/route.ts exports GET but tests/support/route-guard-table.ts has no row for it: add its expected status for every role.",
    ]);
    const withoutImport = actionGuardRows.filter((row) => row.action !== "importRosterAction");
    expect(missingGuardRows(routeGuardRows, withoutImport)).toEqual([
      "app/(club)/club/members/actions.ts exports the server action importRosterAction but tests/support/route-guard-table.ts has no row for it: add its expected status for every role.",
    ]);
  });

  it("finds the route files and action modules of the app", () => {
    expect(routeFiles().map((route) => route.file)).toEqual(expect.arrayContaining(["app/api/roster/route.ts", "app/api/members/[id]/route.ts"]));
    expect(actionFiles().map((entry) => entry.file)).toEqual(expect.arrayContaining(["app/(club)/club/actions.ts", "app/(auth)/sign-in/actions.ts"]));
  });
});

describe.each(routeGuardRows.map((row) => [`${row.method} ${row.file}`, row] as const))("%s", (_label, row) => {
  it.each(guardRoles.map((role) => [role, row.expect[role]] as const))("as %s answers %i", async (role, status) => {
    const handlers = (await import(/* @vite-ignore */ path.join(projectRoot, row.file))) as Record<string, unknown>;
    const request = row.request(fixtures());
    const response = await callRoute(handlers[row.method], {
      method: row.method,
      path: request.path,
      params: paramsFor(row.file, request.path),
      cookie: cookies[role],
      // Every caller is a different address, so the sign-in throttle never decides a row.
      headers: { "x-forwarded-for": `198.51.100.${calls % 250}` },
      json: request.json,
      ...(request.form ? { body: new URLSearchParams(request.form).toString(), contentType: "application/x-www-form-urlencoded" } : {}),
      ...(request.text ? { body: request.text.body, contentType: request.text.contentType } : {}),
    });
    const body = await response.text();
    expect(response.status, body.slice(0, 300)).toBe(status);
    if (row.hiddenFromOtherClub && role.startsWith("other")) expect(body).not.toContain(row.hiddenFromOtherClub);
  });
});

function actionArgument(input: unknown): unknown {
  if (!input || typeof input !== "object" || !("formData" in input)) return input;
  const data = new FormData();
  for (const [name, value] of Object.entries((input as { formData: Record<string, unknown> }).formData)) {
    if (value && typeof value === "object" && "body" in value) {
      const file = value as { name: string; type: string; body: string };
      data.set(name, new File([file.body], file.name, { type: file.type }));
    } else data.set(name, String(value));
  }
  return data;
}

describe.each(actionGuardRows.map((row) => [`${row.action} in ${row.file}`, row] as const))("%s", (_label, row) => {
  it.each(guardRoles.map((role) => [role, row.expect[role]] as const))("as %s answers %i", async (role, status) => {
    const actions = (await import(/* @vite-ignore */ path.join(projectRoot, row.file))) as Record<string, (...args: unknown[]) => Promise<{ ok: boolean; message?: string }>>;
    lastActionError.current = null;
    const given = fixtures();
    const args = row.args ? row.args(given) : [actionArgument(row.input(given))];
    const headers = { cookie: cookies[role] ?? "", "x-forwarded-for": `203.0.113.${calls % 250}` };
    let result: { ok: boolean; message?: string } | undefined;
    let actual: number;
    try {
      result = await withRequest(new Request(`${testOrigin}/`, { headers }), () => actions[row.action]!(...args));
      const error = lastActionError.current;
      actual = result.ok ? 200 : error instanceof AppError ? error.status : 400;
    } catch (thrown) {
      // A plain form action answers with Next's redirect (thrown as NEXT_REDIRECT): the table says 303.
      const digest = (thrown as { digest?: unknown }).digest;
      if (typeof digest !== "string" || !digest.startsWith("NEXT_REDIRECT")) throw thrown;
      actual = 303;
      const target = digest.split(";")[2] ?? "";
      if (row.redirects) expect(target, `${role} is sent to`).toMatch(row.redirects[role] ?? /^$/);
    }
    expect(actual, result?.message).toBe(status);
  });
});

describe("after every row", () => {
  it("has left the home-club records the rows aim at as they were seeded", async () => {
    const boat = (await Boat.findByPk(home.homeBoatId))!;
    expect({ name: boat.name, boatClass: boat.boatClass, spanCm: boat.spanCm, archivedAt: boat.archivedAt }).toEqual({
      name: "Heron",
      boatClass: "1x",
      spanCm: 160,
      archivedAt: null,
    });
    const set = (await OarSet.findByPk(home.homeOarSetId))!;
    expect({ name: set.name, targetLengthCm: set.targetLengthCm, archivedAt: set.archivedAt }).toEqual({ name: "Short-loom sculls", targetLengthCm: 286, archivedAt: null });
    const links = await BoatOarSet.findAll({ where: { oarSetId: home.homeOarSetId } });
    expect(links.map((link) => link.boatId)).toEqual([home.homeBoatId]);
    const club = (await Club.findByPk(boat.clubId))!;
    expect((club.settings as { humidSpell?: boolean }).humidSpell ?? false).toBe(false);
  });
});
