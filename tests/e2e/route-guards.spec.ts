import { expect, test, type APIRequestContext, type BrowserContext, type Locator, type Page } from "@playwright/test";
import { demo, otherClub, signedInContext } from "./support/auth";
import {
  guardRoles,
  routeGuardRows,
  tinyPngBase64,
  type GuardFixtures,
  type GuardRequest,
  type GuardRole,
} from "../support/route-guard-table";

/**
 * The route rows of tests/support/route-guard-table.ts through the real server, each role a real
 * signed-in browser (the other club comes from SLIPWAY_SEED_SECOND_CLUB=1 in scripts/e2e-server.sh).
 * tests/integration/route-guards.test.ts checks the table is complete and covers the server actions.
 */
const accounts: Record<Exclude<GuardRole, "anonymous">, [string, string]> = {
  athlete: [demo.athlete, demo.password],
  otherAthlete: [otherClub.athlete, otherClub.password],
  coach: [demo.coach, demo.password],
  otherCoach: [otherClub.coach, otherClub.password],
  admin: [demo.admin, demo.password],
  otherAdmin: [otherClub.admin, otherClub.password],
};

/** The id at the end of a link's href, e.g. 7 from /roster/fleet/boats/7. */
async function recordIdFrom(link: Locator): Promise<number> {
  const href = (await link.getAttribute("href")) ?? "";
  const id = Number(/\/(\d+)$/.exec(href)?.[1]);
  expect(id, `a record id in ${href}`).toBeGreaterThan(0);
  return id;
}

/** The uuid in a link's href, e.g. from /api/certificates/<uuid>/pdf. */
async function uuidFrom(link: Locator): Promise<string> {
  const href = (await link.getAttribute("href")) ?? "";
  const id = /([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})/.exec(href)?.[1];
  expect(id, `a record id in ${href}`).toBeTruthy();
  return id!;
}

function multipartOf(file: NonNullable<GuardRequest["file"]>) {
  return { [file.field]: { name: file.name, mimeType: file.type, buffer: Buffer.from(file.base64, "base64") } };
}

test("every route handler answers each role as the guard table says", async ({ browser }) => {
  test.setTimeout(120_000);
  const contexts: BrowserContext[] = [];
  const requests = {} as Record<GuardRole, APIRequestContext>;
  let coachPage: Page | undefined;
  let adminPage: Page | undefined;
  const anonymous = await browser.newContext();
  contexts.push(anonymous);
  requests.anonymous = anonymous.request;
  for (const [role, [email, password]] of Object.entries(accounts)) {
    const { context, page } = await signedInContext(browser, email, password);
    contexts.push(context);
    if (role === "coach") coachPage = page;
    if (role === "admin") adminPage = page;
    requests[role as GuardRole] = context.request;
  }

  const roster = (await (await requests.coach.get("/api/roster")).json()) as { athletes: { id: number; email: string }[] };
  const athleteId = (name: string) => roster.athletes.find((athlete) => athlete.email === `${name}@lantern-reach.example`)!.id;
  const homeAthleteId = athleteId("lena");
  // The demo fleet's Heron and Short-loom sculls, read from the edit links of the coach's fleet page.
  await coachPage!.goto("/roster/fleet");
  const homeBoatId = await recordIdFrom(
    coachPage!.locator('[data-testid="fleet-boat"][data-name="Heron"] a[href^="/roster/fleet/boats/"]'),
  );
  const homeOarSetId = await recordIdFrom(
    coachPage!.locator('[data-testid="fleet-oar-set"][data-name="Short-loom sculls"] a[href^="/roster/fleet/oar-sets/"]'),
  );
  // The seeded certification records (lib/seed/demo-certification.ts), from what a coach and an admin can read.
  const queue = (await (await requests.coach.get("/api/sign-offs")).json()) as {
    signOffs: { id: string; athleteName: string; moduleSlug: string }[];
  };
  const waiting = (athleteName: string, moduleSlug: string) => {
    const entry = queue.signOffs.find((signOff) => signOff.athleteName === athleteName && signOff.moduleSlug === moduleSlug);
    expect(entry, `${athleteName}'s waiting ${moduleSlug} sign-off`).toBeTruthy();
    return entry!.id;
  };
  await adminPage!.goto(`/roster/athletes/${athleteId("iris")}`);
  const homeCertificateId = await uuidFrom(adminPage!.getByTestId("athlete-certificates").locator('a[href^="/api/certificates/"]'));
  const homeDecidedSignOffId = await uuidFrom(adminPage!.getByRole("link", { name: "Setting the inboard with the collar" }));
  const register = await (await requests.admin.get("/api/register/csv")).text();
  const homeVerificationCode = /\/verify\/([A-Za-z0-9_-]{24})/.exec(
    register.split("\n").find((line) => line.includes("Iris Delacourt")) ?? "",
  )?.[1];
  expect(homeVerificationCode, "Iris Delacourt's verification code in the register").toBeTruthy();
  // The seed has no evidence photos: the coach adds three to Elin's waiting sign-off, as the form does.
  const elinSignOff = waiting("Elin Marchetti", "changing-boats");
  const uploadEvidence = async () => {
    const response = await requests.coach.post(`/api/sign-offs/${elinSignOff}/evidence`, {
      multipart: multipartOf({ field: "file", name: "fixture.png", type: "image/png", base64: tinyPngBase64 }),
    });
    expect(response.status(), await response.text()).toBe(201);
    return ((await response.json()) as { id: string }).id;
  };
  const home: Omit<GuardFixtures, "tag"> = {
    homeAthleteId,
    homeBoatId,
    homeOarSetId,
    homeSuspendedAthleteId: athleteId("hamish"),
    homeCertificateId,
    homeVerificationCode: homeVerificationCode!,
    homeWaitingSignOffId: waiting("Jonah Treloar", "grip-cleaning"),
    homeDecidedSignOffId,
    homeEvidenceId: await uploadEvidence(),
    spareEvidenceIds: [await uploadEvidence(), await uploadEvidence()],
  };

  const mismatches: string[] = [];
  let calls = 0;
  for (const row of routeGuardRows) {
    for (const role of guardRoles) {
      calls += 1;
      const request = row.request({ ...home, tag: `e2e${Date.now()}x${calls}` }, role);
      const response = await requests[role].fetch(request.path, {
        method: row.method,
        maxRedirects: 0,
        ...(request.json !== undefined ? { data: request.json } : {}),
        ...(request.form ? { form: request.form } : {}),
        ...(request.text ? { data: request.text.body, headers: { "Content-Type": request.text.contentType } } : {}),
        ...(request.file ? { multipart: multipartOf(request.file) } : {}),
      });
      const body = await response.text();
      if (response.status() !== row.expect[role]) {
        mismatches.push(
          `${row.method} ${request.path} (${row.file}) as ${role}: expected ${row.expect[role]}, got ${response.status()} ${body.slice(0, 120)}`,
        );
      }
      if (row.hiddenFromOtherClub && role.startsWith("other") && body.includes(row.hiddenFromOtherClub)) {
        mismatches.push(`${row.method} ${request.path} as ${role} shows ${row.hiddenFromOtherClub}`);
      }
    }
  }
  expect(mismatches, mismatches.join("\n")).toEqual([]);
  for (const context of contexts) await context.close();
});
