import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { createTempDataDir } from "@/tests/support/temp-data-dir";
import { installNextHeadersStandIn, withRequest } from "@/tests/support/request-scope";
import { callAuth, csrf, passwordSignIn, testOrigin } from "@/tests/support/auth-handler";
import { sessionCookieFor } from "@/tests/support/call-route";

/** Your account (/account): a member corrects their name and changes their password, with real next-auth sessions. */

vi.mock("next/headers", async () => (await import("@/tests/support/request-scope")).nextHeadersStandIn);
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

createTempDataDir("account");
installNextHeadersStandIn();

const { closeDatabase, getSequelize } = await import("@/lib/db");
const { databaseReady } = await import("@/lib/data/database");
const { seedDemoClub, demoPassword } = await import("@/lib/seed/demo-club");
const { seedDemoCertification } = await import("@/lib/seed/demo-certification");
const { currentActor } = await import("@/lib/auth/session");
const { authenticateWithPassword } = await import("@/lib/data/users");
const { newToken, hashToken } = await import("@/lib/auth/tokens");
const { signInFailureLimit } = await import("@/lib/auth/throttle");
const { AuditEvent, Certificate, SignInLink, User } = await import("@/models");
const { listOutbox } = await import("@/lib/mail/outbox");
const { clubToday } = await import("@/lib/data/club-settings");
const { changeOwnNameAction, changePasswordAction } = await import("@/app/(account)/account/actions");

beforeAll(async () => {
  await databaseReady();
  await seedDemoClub(getSequelize());
  await seedDemoCertification(getSequelize());
});

afterAll(async () => {
  await closeDatabase();
});

const newPassword = "tidewater collar heron";

let calls = 0;

/** Runs work as the cookie's owner, each call from its own address (the per-address limit is tested on its own). */
function asCookie<T>(cookie: string | null, work: () => Promise<T>, address = `192.0.2.${(calls += 1) % 250}`): Promise<T> {
  const headers: Record<string, string> = { "x-forwarded-for": address };
  if (cookie) headers.cookie = cookie;
  return withRequest(new Request(`${testOrigin}/account`, { headers }), work);
}

/** A session started with a one-time e-mail link, through the real handler. */
async function linkSessionCookie(email: string): Promise<string> {
  const user = (await User.findOne({ where: { email } }))!;
  const token = newToken();
  await SignInLink.create({ userId: user.id, tokenHash: hashToken(token), expiresAt: new Date(Date.now() + 15 * 60_000) });
  const headers = { "x-forwarded-for": "198.51.100.77" };
  const start = await csrf(headers);
  const { response, cookie } = await callAuth("POST", ["callback", "link"], {
    cookie: start.cookie,
    headers,
    form: { token, csrfToken: start.csrfToken, callbackUrl: `${testOrigin}/home`, json: "true" },
  });
  expect(response.status).toBe(200);
  return cookie;
}

describe("changing your own password", () => {
  it("needs the right current password in a password session, and refuses the current one as the new one", async () => {
    const email = "greta@lantern-reach.example";
    const cookie = await sessionCookieFor(email, demoPassword);
    const wrong = await asCookie(cookie, () => changePasswordAction({ currentPassword: "not my password at all", newPassword }));
    expect(wrong).toMatchObject({ ok: false, fieldErrors: { currentPassword: ["That is not your current password."] } });
    const blank = await asCookie(cookie, () => changePasswordAction({ currentPassword: "", newPassword }));
    expect(blank).toMatchObject({ ok: false, fieldErrors: { currentPassword: ["Enter your current password."] } });
    const same = await asCookie(cookie, () => changePasswordAction({ currentPassword: demoPassword, newPassword: demoPassword }));
    expect(same).toMatchObject({ ok: false, fieldErrors: { newPassword: [expect.stringContaining("current password")] } });
    const common = await asCookie(cookie, () => changePasswordAction({ currentPassword: demoPassword, newPassword: "password123" }));
    expect(common).toMatchObject({ ok: false, fieldErrors: { newPassword: [expect.stringContaining("common")] } });
    // Nothing changed: the old password still signs in, the session still works.
    expect(await authenticateWithPassword(email, demoPassword)).not.toBeNull();
    expect(await asCookie(cookie, () => currentActor())).toMatchObject({ email });
  });

  it("sets the new password, ends every session of the member (this one too) and audits it", async () => {
    const email = "kit@lantern-reach.example";
    const cookie = await sessionCookieFor(email, demoPassword);
    const otherDevice = await sessionCookieFor(email, demoPassword);
    const before = (await User.findOne({ where: { email } }))!;
    const outcome = await asCookie(cookie, () => changePasswordAction({ currentPassword: demoPassword, newPassword }));
    expect(outcome).toEqual({ ok: true, message: "Password changed.", data: { email } });
    expect(await authenticateWithPassword(email, demoPassword)).toBeNull();
    expect(await authenticateWithPassword(email, newPassword)).toMatchObject({ email });
    expect(await asCookie(cookie, () => currentActor())).toBeNull();
    expect(await asCookie(otherDevice, () => currentActor())).toBeNull();
    const after = (await User.findOne({ where: { email } }))!;
    expect(after.tokenVersion).toBe(before.tokenVersion + 1);
    expect(await AuditEvent.count({ where: { action: "member.password-changed", subjectId: String(before.id) } })).toBe(1);
    // The member is told by e-mail, in case it was not them.
    const told = (await listOutbox()).filter((message) => message.to === email && message.subject === "Your Slipway password was changed");
    expect(told).toHaveLength(1);
    // The form then signs in again with the new password, as the browser would.
    const { response } = await passwordSignIn(email, newPassword, { "x-forwarded-for": "198.51.100.78" });
    expect(response.status).toBe(200);
  });

  it("lets a fresh e-mail-link session set a password without the old one; a password session cannot", async () => {
    const email = "dev@lantern-reach.example";
    const passwordCookie = await sessionCookieFor(email, demoPassword);
    expect(await asCookie(passwordCookie, () => changePasswordAction({ currentPassword: "", newPassword }))).toMatchObject({
      ok: false,
      fieldErrors: { currentPassword: ["Enter your current password."] },
    });
    const linkCookie = await linkSessionCookie(email);
    expect(await asCookie(linkCookie, () => changePasswordAction({ currentPassword: "", newPassword }))).toMatchObject({ ok: true });
    expect(await authenticateWithPassword(email, newPassword)).toMatchObject({ email });
    // A current password typed anyway is still checked.
    const next = await linkSessionCookie(email);
    expect(
      await asCookie(next, () => changePasswordAction({ currentPassword: "a wrong guess here", newPassword: "another heron tidewater" })),
    ).toMatchObject({ ok: false, fieldErrors: { currentPassword: ["That is not your current password."] } });
  });

  it("counts wrong current passwords as failed sign-ins of the account: after the limit the form refuses and so does sign-in", async () => {
    const email = "jonah@lantern-reach.example";
    const cookie = await sessionCookieFor(email, demoPassword);
    for (let attempt = 0; attempt < signInFailureLimit; attempt += 1) {
      const guess = await asCookie(cookie, () => changePasswordAction({ currentPassword: `guess number ${attempt}`, newPassword }));
      expect(guess).toMatchObject({ ok: false, fieldErrors: { currentPassword: ["That is not your current password."] } });
    }
    const refused = await asCookie(cookie, () => changePasswordAction({ currentPassword: demoPassword, newPassword }));
    expect(refused).toMatchObject({ ok: false, message: expect.stringContaining("Too many wrong passwords") });
    const { response } = await passwordSignIn(email, demoPassword, { "x-forwarded-for": "198.51.100.79" });
    expect(response.status).toBe(429);
    expect(await authenticateWithPassword(email, demoPassword)).not.toBeNull();
  });

  it("answers a signed-out caller as unauthenticated", async () => {
    expect(await asCookie(null, () => changePasswordAction({ currentPassword: demoPassword, newPassword }))).toEqual({
      ok: false,
      message: "Sign in to continue.",
      fieldErrors: {},
    });
  });
});

describe("correcting your own name", () => {
  it("saves the trimmed name, which the session shows at once; issued certificates keep the name they were issued to", async () => {
    const email = "femi@lantern-reach.example";
    const cookie = await sessionCookieFor(email, demoPassword);
    const femi = (await User.findOne({ where: { email } }))!;
    const issuedBefore = await Certificate.findAll({ where: { athleteId: femi.id } });
    expect(issuedBefore.length).toBeGreaterThan(0);
    const today = await clubToday(femi.clubId);
    const holding = issuedBefore.filter((certificate) => certificate.revokedAt === null && certificate.expiresOn > today).length;
    expect(holding).toBeGreaterThan(1);
    const outcome = await asCookie(cookie, () => changeOwnNameAction({ name: "  Femi Ashdown-Okoro  " }));
    expect(outcome).toEqual({
      ok: true,
      message: `Name saved. ${holding} current certificates carry your earlier name: a club administrator can reissue them under this one.`,
      data: { name: "Femi Ashdown-Okoro" },
    });
    expect(await asCookie(cookie, () => currentActor())).toMatchObject({ name: "Femi Ashdown-Okoro" });
    const issuedAfter = await Certificate.findAll({ where: { athleteId: femi.id } });
    expect(issuedAfter.map((certificate) => certificate.athleteName)).toEqual(issuedBefore.map((certificate) => certificate.athleteName));
    const audit = await AuditEvent.findOne({ where: { action: "member.renamed", subjectId: String(femi.id) } });
    expect(audit?.details).toEqual({ from: femi.name, to: "Femi Ashdown-Okoro" });
    const again = await asCookie(cookie, () => changeOwnNameAction({ name: "Femi Ashdown-Okoro" }));
    expect(again).toMatchObject({ ok: true, message: expect.stringMatching(/^Your name was already written that way\. /) });
    expect(await AuditEvent.count({ where: { action: "member.renamed", subjectId: String(femi.id) } })).toBe(1);
  });

  it("refuses a blank name or one with a line break, and changes nothing", async () => {
    const email = "lena@lantern-reach.example";
    const cookie = await sessionCookieFor(email, demoPassword);
    const before = (await User.findOne({ where: { email } }))!.name;
    expect(await asCookie(cookie, () => changeOwnNameAction({ name: "   " }))).toMatchObject({
      ok: false,
      fieldErrors: { name: ["Enter your name."] },
    });
    expect(await asCookie(cookie, () => changeOwnNameAction({ name: "Lena\nFairbrother" }))).toMatchObject({
      ok: false,
      fieldErrors: { name: [expect.stringContaining("one line")] },
    });
    expect((await User.findOne({ where: { email } }))!.name).toBe(before);
  });
});
