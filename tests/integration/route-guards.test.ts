import path from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { createTempDataDir } from "@/tests/support/temp-data-dir";
import { installNextHeadersStandIn, withRequest } from "@/tests/support/request-scope";
import { callRoute, sessionCookieFor } from "@/tests/support/call-route";
import { testOrigin } from "@/tests/support/auth-handler";
import { actionFiles, missingGuardRows, paramsFor, projectRoot, routeFiles } from "@/tests/support/route-files";
import {
  actionGuardRows,
  guardRoles,
  routeGuardRows,
  tinyPngBase64,
  type GuardFixtures,
  type GuardRequest,
  type GuardRole,
} from "@/tests/support/route-guard-table";

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
const { seedDemoCertification } = await import("@/lib/seed/demo-certification");
const { AppError } = await import("@/lib/http/errors");
const { readClubSettings } = await import("@/lib/validations/club-settings");
const { settingsToForm } = await import("@/lib/validations/club-settings-form");
const { Boat, BoatOarSet, Certificate, ClearanceSuspension, Club, EvidencePhoto, OarSet, PracticalAssessment, User } =
  await import("@/models");
const evidenceUpload = await import("@/app/api/sign-offs/[id]/evidence/route");

const accounts: Record<Exclude<GuardRole, "anonymous">, [string, string]> = {
  athlete: ["ada@lantern-reach.example", demoPassword],
  otherAthlete: ["athlete@brackwater.example", secondClubPassword],
  coach: ["coach.tobias@lantern-reach.example", demoPassword],
  otherCoach: ["coach@brackwater.example", secondClubPassword],
  admin: ["admin@lantern-reach.example", demoPassword],
  otherAdmin: ["admin@brackwater.example", secondClubPassword],
};
const cookies = {} as Record<GuardRole, string | undefined>;
let home = {} as Omit<GuardFixtures, "tag">;
/** The seeded settings form of the home club, to compare with after every row (the fleet rows add race days). */
let homeSettingsBefore: unknown;
let calls = 0;

function fixtures(): GuardFixtures {
  calls += 1;
  return { ...home, tag: `int${calls}` };
}

function fileForm(file: NonNullable<GuardRequest["file"]>): FormData {
  const form = new FormData();
  form.set(file.field, new File([new Uint8Array(Buffer.from(file.base64, "base64"))], file.name, { type: file.type }));
  return form;
}

async function homeUser(email: string) {
  return (await User.findOne({ where: { email: `${email}@lantern-reach.example` } }))!;
}

async function waitingSignOff(athleteId: number, moduleSlug: string): Promise<string> {
  return (await PracticalAssessment.findOne({ where: { athleteId, moduleSlug, status: "waiting" } }))!.id;
}

/** A photo added by the coach through the upload route, as the e2e harness does: the seed has none. */
async function uploadEvidence(signOffId: string): Promise<string> {
  const response = await callRoute(evidenceUpload.POST, {
    method: "POST",
    path: `/api/sign-offs/${signOffId}/evidence`,
    params: { id: signOffId },
    cookie: cookies.coach,
    body: fileForm({ field: "file", name: "fixture.png", type: "image/png", base64: tinyPngBase64 }),
  });
  expect(response.status, await response.clone().text()).toBe(201);
  return ((await response.json()) as { id: string }).id;
}

beforeAll(async () => {
  await databaseReady();
  await seedDemoClub(getSequelize());
  await seedSecondClub(getSequelize());
  await seedDemoFleet(getSequelize());
  await seedDemoCertification(getSequelize());
  cookies.anonymous = undefined;
  for (const [role, [email, password]] of Object.entries(accounts)) {
    cookies[role as GuardRole] = await sessionCookieFor(email, password);
  }
  const [athlete, hamish, iris, elin, jonah] = await Promise.all(["lena", "hamish", "iris", "elin", "jonah"].map(homeUser));
  const certificate = (await Certificate.findOne({ where: { athleteId: iris!.id, kind: "module", moduleSlug: "overall-length" } }))!;
  const elinSignOff = await waitingSignOff(elin!.id, "changing-boats");
  home = {
    homeAthleteId: athlete!.id,
    homeBoatId: (await Boat.findOne({ where: { clubId: athlete!.clubId, name: "Heron" } }))!.id,
    homeOarSetId: (await OarSet.findOne({ where: { clubId: athlete!.clubId, name: "Short-loom sculls" } }))!.id,
    homeSuspendedAthleteId: hamish!.id,
    homeCertificateId: certificate.id,
    homeVerificationCode: certificate.verificationCode,
    homeWaitingSignOffId: await waitingSignOff(jonah!.id, "grip-cleaning"),
    homeDecidedSignOffId: (await PracticalAssessment.findOne({
      where: { athleteId: iris!.id, moduleSlug: "setting-inboard", status: "not-yet" },
    }))!.id,
    homeEvidenceId: await uploadEvidence(elinSignOff),
    spareEvidenceIds: [await uploadEvidence(elinSignOff), await uploadEvidence(elinSignOff)],
  };
  homeSettingsBefore = settingsToForm(readClubSettings((await Club.findByPk(athlete!.clubId))!.settings));
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
    expect(routeFiles().map((route) => route.file)).toEqual(
      expect.arrayContaining(["app/api/roster/route.ts", "app/api/members/[id]/route.ts"]),
    );
    expect(actionFiles().map((entry) => entry.file)).toEqual(
      expect.arrayContaining(["app/(club)/club/actions.ts", "app/(auth)/sign-in/actions.ts"]),
    );
  });
});

describe("a role that may not see a club-wide list", () => {
  // Each query is malformed; the allowed role's 400 shows it, so the refused role's 403 came first.
  const lists: [file: string, query: string, refused: GuardRole, allowed: GuardRole][] = [
    ["app/api/roster/route.ts", "/api/roster?limit=0", "athlete", "coach"],
    ["app/api/roster/matrix/route.ts", "/api/roster/matrix?page=2", "athlete", "coach"],
    ["app/api/roster/matrix/export/route.ts", "/api/roster/matrix/export?filter=everyone", "athlete", "coach"],
    ["app/api/register/csv/route.ts", "/api/register/csv?from=yesterday", "coach", "admin"],
    ["app/api/register/pdf/route.ts", "/api/register/pdf?kind=medal", "coach", "admin"],
    ["app/api/rig/plans/route.ts", "/api/rig/plans?boat=-1", "athlete", "coach"],
  ];

  it.each(lists)("%s is refused 403 before the query %s is read", async (file, query, refused, allowed) => {
    const { GET } = (await import(/* @vite-ignore */ path.join(projectRoot, file))) as { GET: unknown };
    const ask = (role: GuardRole) =>
      callRoute(GET, { method: "GET", path: query, params: {}, cookie: cookies[role], headers: { "x-forwarded-for": "198.51.100.251" } });
    const refusal = await ask(refused);
    expect(refusal.status).toBe(403);
    expect(((await refusal.json()) as { fields?: object }).fields ?? {}).toEqual({});
    expect((await ask(allowed)).status).toBe(400);
  });
});

describe.each(routeGuardRows.map((row) => [`${row.method} ${row.file}`, row] as const))("%s", (_label, row) => {
  it.each(guardRoles.map((role) => [role, row.expect[role]] as const))("as %s answers %i", async (role, status) => {
    const handlers = (await import(/* @vite-ignore */ path.join(projectRoot, row.file))) as Record<string, unknown>;
    const request = row.request(fixtures(), role);
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
      ...(request.file ? { body: fileForm(request.file) } : {}),
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
    const actions = (await import(/* @vite-ignore */ path.join(projectRoot, row.file))) as Record<
      string,
      (...args: unknown[]) => Promise<{ ok: boolean; message?: string }>
    >;
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

/**
 * A caller the table refuses (401 signed out, 403 wrong role) is refused the same way when the input is
 * malformed too: the permission is checked before the input, so a refusal never depends on (or tells
 * anything about) what the form would have accepted.
 */
const refusedActionCases = actionGuardRows.flatMap((row) =>
  guardRoles
    .filter((role) => row.expect[role] === 401 || row.expect[role] === 403)
    .map((role) => [`${row.action} as ${role}`, row, role, row.expect[role]] as const),
);
describe.each(refusedActionCases)("%s, with malformed input", (_label, row, role, status) => {
  it(`answers ${status} before looking at the input`, async () => {
    const actions = (await import(/* @vite-ignore */ path.join(projectRoot, row.file))) as Record<
      string,
      (...args: unknown[]) => Promise<{ ok: boolean; message?: string }>
    >;
    lastActionError.current = null;
    const given = fixtures();
    // The input malformed; an action addressed by an id argument (updateBoatAction's boatId, say) keeps
    // the real one, as the record decides between 404 and 403 there.
    const junk = { unexpected: "<not a field>", id: -1 };
    const malformed = row.args ? [...row.args(given).slice(0, -1), junk] : [junk];
    const headers = { cookie: cookies[role] ?? "", "x-forwarded-for": `203.0.113.${calls % 250}` };
    const result = await withRequest(new Request(`${testOrigin}/`, { headers }), () => actions[row.action]!(...malformed));
    const error = lastActionError.current;
    expect(result.ok).toBe(false);
    expect(error instanceof AppError ? error.status : 400, result.message).toBe(status);
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
    expect({ name: set.name, targetLengthCm: set.targetLengthCm, archivedAt: set.archivedAt }).toEqual({
      name: "Short-loom sculls",
      targetLengthCm: 286,
      archivedAt: null,
    });
    const links = await BoatOarSet.findAll({ where: { oarSetId: home.homeOarSetId } });
    expect(links.map((link) => link.boatId)).toEqual([home.homeBoatId]);
    const club = (await Club.findByPk(boat.clubId))!;
    expect((club.settings as { humidSpell?: boolean }).humidSpell ?? false).toBe(false);
  });

  it("has left the certification records as they were seeded, less the two spare photos", async () => {
    const certificate = (await Certificate.findByPk(home.homeCertificateId))!;
    expect(certificate.revokeReason).toBe("Recorded against the wrong athlete; to be observed again.");
    expect(await ClearanceSuspension.count({ where: { athleteId: home.homeSuspendedAthleteId, liftedAt: null } })).toBe(1);
    expect(await ClearanceSuspension.count({ where: { athleteId: home.homeAthleteId } })).toBe(0);
    expect((await PracticalAssessment.findByPk(home.homeDecidedSignOffId))!.status).toBe("not-yet");
    expect((await PracticalAssessment.findByPk(home.homeWaitingSignOffId))!.status).toBe("waiting");
    const elinSignOff = (await EvidencePhoto.findByPk(home.homeEvidenceId))!.assessmentId;
    expect((await PracticalAssessment.findByPk(elinSignOff))!.status).toBe("waiting");
    expect((await EvidencePhoto.findAll({ where: { assessmentId: elinSignOff } })).map((photo) => photo.id)).toEqual([home.homeEvidenceId]);
    // The upload row's two photos (the coach's and the admin's).
    expect(await EvidencePhoto.count({ where: { assessmentId: home.homeWaitingSignOffId } })).toBe(2);
    const club = (await Club.findByPk(certificate.clubId))!;
    expect(club.logoFile ?? null).toBeNull();
    expect(settingsToForm(readClubSettings(club.settings))).toEqual(homeSettingsBefore);
  });
});
