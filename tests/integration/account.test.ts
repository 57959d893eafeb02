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
const { changeOwnNameAction, changePasswordAction, requestEmailChangeAction } = await import("@/app/(account)/account/actions");
const { confirmEmailChangeAction } = await import("@/app/(auth)/confirm-email/actions");
const { emailChangesPerHour, pendingEmailChange } = await import("@/lib/data/email-change");
const { EmailChange } = await import("@/models");

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

/** The token in the newest confirmation mail to `to`. */
async function confirmationTokenSentTo(to: string): Promise<string> {
  const mail = (await listOutbox()).find((message) => message.to === to && message.subject === "Confirm your new Slipway e-mail address");
  const token = /\/confirm-email\?token=([A-Za-z0-9_-]{43})/.exec(mail?.text ?? "")?.[1];
  if (!token) throw new Error(`no confirmation link to ${to}`);
  return token;
}

describe("changing your own e-mail address", () => {
  it("changes nothing until the link sent to the new address is used; then it signs in with that one only and every session ends", async () => {
    const email = "bilal@lantern-reach.example";
    const moved = "bilal.new-address@river-mail.example";
    const cookie = await sessionCookieFor(email, demoPassword);
    const before = (await User.findOne({ where: { email } }))!;

    const asked = await asCookie(cookie, () =>
      requestEmailChangeAction({ newEmail: " Bilal.New-Address@River-Mail.example ", currentPassword: demoPassword }),
    );
    expect(asked).toMatchObject({ ok: false, fieldErrors: { newEmail: [expect.stringContaining("e-mail address")] } });
    const sent = await asCookie(cookie, () =>
      requestEmailChangeAction({ newEmail: "Bilal.New-Address@River-Mail.example", currentPassword: demoPassword }),
    );
    expect(sent).toEqual({
      ok: true,
      message: `A confirmation link is on its way to ${moved}. Open it within 24 hours; until then you sign in with ${email}.`,
      data: { newEmail: moved },
    });
    // Nothing changed yet: the old address signs in, the session lives, Your account shows what waits.
    expect(await authenticateWithPassword(email, demoPassword)).not.toBeNull();
    expect(await asCookie(cookie, () => currentActor())).toMatchObject({ email });
    expect(await pendingEmailChange((await asCookie(cookie, () => currentActor()))!)).toMatchObject({ newEmail: moved });
    const firstToken = await confirmationTokenSentTo(moved);

    // Asking again replaces the first link.
    await asCookie(cookie, () => requestEmailChangeAction({ newEmail: moved, currentPassword: demoPassword }));
    const token = await confirmationTokenSentTo(moved);
    expect(token).not.toBe(firstToken);
    expect(await asCookie(null, () => confirmEmailChangeAction({ token: firstToken }))).toMatchObject({
      ok: false,
      message: "This link is no longer valid. Ask for a new one under Your account.",
      fieldErrors: { token: expect.any(Array) },
    });

    // A sign-in link mailed to the old address before the change stops working with it.
    const oldAddressLink = await SignInLink.create({
      userId: before.id,
      tokenHash: hashToken(newToken()),
      expiresAt: new Date(Date.now() + 15 * 60_000),
    });
    // Only Bilal, signed in, confirms his own request: not whoever reads a mistyped address, nor another member.
    expect(await asCookie(null, () => confirmEmailChangeAction({ token }))).toMatchObject({
      ok: false,
      message: "Sign in as Bilal Hartigan, with the address you use now, and open the link again.",
    });
    const someoneElse = await sessionCookieFor("greta@lantern-reach.example", demoPassword);
    expect(await asCookie(someoneElse, () => confirmEmailChangeAction({ token }))).toMatchObject({ ok: false });
    expect((await User.findByPk(before.id))!.email).toBe(email);
    expect(await asCookie(cookie, () => confirmEmailChangeAction({ token }))).toEqual({
      ok: true,
      message: `Your Slipway account now signs in with ${moved}. Every device was signed out: sign in again with it.`,
      data: { email: moved },
    });
    expect(await SignInLink.findByPk(oldAddressLink.id)).toBeNull();
    const after = (await User.findByPk(before.id))!;
    expect(after.email).toBe(moved);
    expect(after.tokenVersion).toBe(before.tokenVersion + 1);
    expect(await asCookie(cookie, () => currentActor())).toBeNull();
    expect(await authenticateWithPassword(email, demoPassword)).toBeNull();
    expect(await authenticateWithPassword(moved, demoPassword)).toMatchObject({ id: before.id });
    const audit = await AuditEvent.findOne({ where: { action: "member.email-changed", subjectId: String(before.id) } });
    expect(audit).toMatchObject({ actorId: before.id, details: { from: email, to: moved } });
    // The old address is told, in case it was not them.
    const told = (await listOutbox()).filter(
      (message) => message.to === email && message.subject === "Your Slipway e-mail address was changed",
    );
    expect(told).toHaveLength(1);
    expect(told[0]!.text).toContain(moved);
    // The link works once.
    expect(await asCookie(null, () => confirmEmailChangeAction({ token }))).toMatchObject({
      ok: false,
      message: "This link is no longer valid. Ask for a new one under Your account.",
    });
  });

  it("checks the current password like a password change, and refuses the address the member already has", async () => {
    const email = "carys@lantern-reach.example";
    const cookie = await sessionCookieFor(email, demoPassword);
    const wrong = await asCookie(cookie, () =>
      requestEmailChangeAction({ newEmail: "carys@elsewhere.example", currentPassword: "not my password at all" }),
    );
    expect(wrong).toMatchObject({ ok: false, fieldErrors: { currentPassword: ["That is not your current password."] } });
    const blank = await asCookie(cookie, () => requestEmailChangeAction({ newEmail: "carys@elsewhere.example", currentPassword: "" }));
    expect(blank).toMatchObject({ ok: false, fieldErrors: { currentPassword: ["Enter your current password."] } });
    const same = await asCookie(cookie, () =>
      requestEmailChangeAction({ newEmail: "CARYS@lantern-reach.example", currentPassword: demoPassword }),
    );
    expect(same).toMatchObject({ ok: false, fieldErrors: { newEmail: ["That is the address you sign in with already."] } });
    const carys = (await User.findOne({ where: { email } }))!;
    expect(await EmailChange.count({ where: { userId: carys.id } })).toBe(0);
    expect((await listOutbox()).some((message) => message.to === "carys@elsewhere.example")).toBe(false);
  });

  it("answers an address that has an account as any other, and tells that address instead of sending a link", async () => {
    const email = "iris@lantern-reach.example";
    const taken = "ada@lantern-reach.example";
    const cookie = await sessionCookieFor(email, demoPassword);
    const outcome = await asCookie(cookie, () => requestEmailChangeAction({ newEmail: taken, currentPassword: demoPassword }));
    expect(outcome).toMatchObject({ ok: true, message: expect.stringContaining(`A confirmation link is on its way to ${taken}.`) });
    const iris = (await User.findOne({ where: { email } }))!;
    expect(await EmailChange.count({ where: { userId: iris.id } })).toBe(0);
    const mail = (await listOutbox()).find(
      (message) => message.to === taken && message.subject === "Your Slipway account's address was not changed",
    );
    expect(mail?.text).not.toMatch(/token=/);
  });

  it("refuses a link whose address got an account of its own meanwhile, and an expired link", async () => {
    const email = "elin@lantern-reach.example";
    const cookie = await sessionCookieFor(email, demoPassword);
    const target = "elin.meanwhile@river-mail.example";
    await asCookie(cookie, () => requestEmailChangeAction({ newEmail: target, currentPassword: demoPassword }));
    const token = await confirmationTokenSentTo(target);
    const elin = (await User.findOne({ where: { email } }))!;
    const squatter = await User.create({
      clubId: elin.clubId,
      email: target,
      name: "Meanwhile Member",
      role: "athlete",
      passwordHash: null,
    });
    expect(await asCookie(cookie, () => confirmEmailChangeAction({ token }))).toMatchObject({
      ok: false,
      message: "That address has a Slipway account of its own by now, so yours was not moved to it.",
    });
    expect((await User.findByPk(elin.id))!.email).toBe(email);
    await squatter.destroy();

    const later = "elin.later@river-mail.example";
    await asCookie(cookie, () => requestEmailChangeAction({ newEmail: later, currentPassword: demoPassword }));
    const expiring = await confirmationTokenSentTo(later);
    await EmailChange.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: elin.id, usedAt: null } });
    expect(await asCookie(cookie, () => confirmEmailChangeAction({ token: expiring }))).toMatchObject({
      ok: false,
      message: expect.stringContaining("no longer valid"),
    });
    expect((await User.findByPk(elin.id))!.email).toBe(email);
  });

  it(`sends at most ${emailChangesPerHour} confirmation links an hour for one member`, async () => {
    const email = "hamish@lantern-reach.example";
    const cookie = await sessionCookieFor(email, demoPassword);
    for (let ask = 0; ask < emailChangesPerHour; ask += 1) {
      const outcome = await asCookie(cookie, () =>
        requestEmailChangeAction({ newEmail: `hamish.${ask}@river-mail.example`, currentPassword: demoPassword }),
      );
      expect(outcome).toMatchObject({ ok: true });
    }
    const refused = await asCookie(cookie, () =>
      requestEmailChangeAction({ newEmail: "hamish.more@river-mail.example", currentPassword: demoPassword }),
    );
    expect(refused).toMatchObject({
      ok: false,
      message: expect.stringContaining(`${emailChangesPerHour} confirmation links were sent for this account in the last hour.`),
    });
    expect((await listOutbox()).some((message) => message.to === "hamish.more@river-mail.example")).toBe(false);
  });
});
