import { expect, test, type APIRequestContext, type BrowserContext } from "@playwright/test";
import { demo, otherClub, signedInContext } from "./support/auth";
import { guardRoles, routeGuardRows, type GuardRole } from "../support/route-guard-table";

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

test("every route handler answers each role as the guard table says", async ({ browser }) => {
  test.setTimeout(120_000);
  const contexts: BrowserContext[] = [];
  const requests = {} as Record<GuardRole, APIRequestContext>;
  const anonymous = await browser.newContext();
  contexts.push(anonymous);
  requests.anonymous = anonymous.request;
  for (const [role, [email, password]] of Object.entries(accounts)) {
    const { context } = await signedInContext(browser, email, password);
    contexts.push(context);
    requests[role as GuardRole] = context.request;
  }

  const roster = (await (await requests.coach.get("/api/roster")).json()) as { athletes: { id: number; email: string }[] };
  const homeAthleteId = roster.athletes.find((athlete) => athlete.email === "lena@lantern-reach.example")!.id;

  const mismatches: string[] = [];
  let calls = 0;
  for (const row of routeGuardRows) {
    for (const role of guardRoles) {
      calls += 1;
      const request = row.request({ homeAthleteId, tag: `e2e${Date.now()}x${calls}` });
      const response = await requests[role].fetch(request.path, {
        method: row.method,
        maxRedirects: 0,
        ...(request.json !== undefined ? { data: request.json } : {}),
        ...(request.form ? { form: request.form } : {}),
        ...(request.text ? { data: request.text.body, headers: { "Content-Type": request.text.contentType } } : {}),
      });
      const body = await response.text();
      if (response.status() !== row.expect[role]) {
        mismatches.push(`${row.method} ${request.path} (${row.file}) as ${role}: expected ${row.expect[role]}, got ${response.status()} ${body.slice(0, 120)}`);
      }
      if (row.hiddenFromOtherClub && role.startsWith("other") && body.includes(row.hiddenFromOtherClub)) {
        mismatches.push(`${row.method} ${request.path} as ${role} shows ${row.hiddenFromOtherClub}`);
      }
    }
  }
  expect(mismatches, mismatches.join("\n")).toEqual([]);
  for (const context of contexts) await context.close();
});
