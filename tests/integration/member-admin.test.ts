import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { createTempDataDir } from "@/tests/support/temp-data-dir";
import { installNextHeadersStandIn } from "@/tests/support/request-scope";
import { asCookie, callRoute, sessionCookieFor } from "@/tests/support/call-route";

vi.mock("next/headers", async () => (await import("@/tests/support/request-scope")).nextHeadersStandIn);
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

createTempDataDir("member-admin");
installNextHeadersStandIn();

const { closeDatabase, getSequelize } = await import("@/lib/db");
const { databaseReady } = await import("@/lib/data/database");
const { seedDemoClub, demoPassword } = await import("@/lib/seed/demo-club");
const { seedSecondClub } = await import("@/lib/seed/second-club");
const { seedDemoCertification } = await import("@/lib/seed/demo-certification");
const { changeMemberRole, importRoster, renameMember, setMemberStatus } = await import("@/lib/data/member-admin");
const { confirmEmailChange, requestMemberEmailChange } = await import("@/lib/data/email-change");
const { ConflictError, ValidationError } = await import("@/lib/http/errors");
const {
  authenticateWithPassword,
  acceptInvitation,
  sessionUserById,
  inviteMember,
  listUnansweredInvitations,
  withdrawInvitation,
  findPendingInvitation,
} = await import("@/lib/data/users");
const { hashToken, newToken } = await import("@/lib/auth/tokens");
const { currentActor } = await import("@/lib/auth/session");
const { listOutbox } = await import("@/lib/mail/outbox");
const { AuditEvent, Certificate, Invitation, User } = await import("@/models");
const { ForbiddenError, NotFoundError } = await import("@/lib/http/errors");
const memberRoute = await import("@/app/api/members/[id]/route");
const importRoute = await import("@/app/api/members/import/route");
const { importRosterAction, setMemberStatusAction } = await import("@/app/(club)/club/members/actions");

type Actor = import("@/lib/auth/permissions").Actor;

beforeAll(async () => {
  await databaseReady();
  await seedDemoClub(getSequelize());
  await seedSecondClub(getSequelize());
  await seedDemoCertification(getSequelize());
});

afterAll(async () => {
  await closeDatabase();
});

async function actorFor(email: string): Promise<Actor> {
  const user = await User.findOne({ where: { email } });
  return { id: user!.id, clubId: user!.clubId, role: user!.role, name: user!.name, email: user!.email };
}

async function userFor(email: string) {
  return (await User.findOne({ where: { email } }))!;
}

const admin = "admin@lantern-reach.example";

describe("changing a member's role", () => {
  it("changes the role, moves the token version on and audits it; the member's open session ends", async () => {
    const cookie = await sessionCookieFor("iris@lantern-reach.example", demoPassword);
    expect(await asCookie(cookie, () => currentActor())).toMatchObject({ role: "athlete" });
    const before = await userFor("iris@lantern-reach.example");

    const changed = await changeMemberRole(await actorFor(admin), before.id, "coach");
    expect(changed).toMatchObject({ role: "coach", status: "active" });
    const after = await userFor("iris@lantern-reach.example");
    expect(after.tokenVersion).toBe(before.tokenVersion + 1);
    expect(await sessionUserById(before.id, before.tokenVersion)).toBeNull();
    expect(await asCookie(cookie, () => currentActor())).toBeNull();

    const event = await AuditEvent.findOne({ where: { action: "member.role_changed", subjectId: String(before.id) } });
    expect(event?.details).toEqual({ from: "athlete", to: "coach" });

    const fresh = await sessionCookieFor("iris@lantern-reach.example", demoPassword);
    expect(await asCookie(fresh, () => currentActor())).toMatchObject({ role: "coach" });
  });

  it("leaves the token version alone when the role does not change", async () => {
    const before = await userFor("jonah@lantern-reach.example");
    await changeMemberRole(await actorFor(admin), before.id, "athlete");
    expect((await userFor("jonah@lantern-reach.example")).tokenVersion).toBe(before.tokenVersion);
  });

  it("refuses coaches (403), the admin's own account (403) and members of another club (404)", async () => {
    const jonah = await userFor("jonah@lantern-reach.example");
    const adminActor = await actorFor(admin);
    await expect(changeMemberRole(await actorFor("coach.tobias@lantern-reach.example"), jonah.id, "coach")).rejects.toBeInstanceOf(
      ForbiddenError,
    );
    await expect(changeMemberRole(adminActor, adminActor.id, "athlete")).rejects.toBeInstanceOf(ForbiddenError);
    await expect(setMemberStatus(adminActor, adminActor.id, "deactivated")).rejects.toBeInstanceOf(ForbiddenError);
    await expect(changeMemberRole(await actorFor("admin@brackwater.example"), jonah.id, "coach")).rejects.toBeInstanceOf(NotFoundError);
    await expect(changeMemberRole(adminActor, 999_999, "coach")).rejects.toBeInstanceOf(NotFoundError);
    expect((await userFor("jonah@lantern-reach.example")).role).toBe("athlete");
  });
});

describe("deactivating and reactivating", () => {
  it("blocks sign-in and ends the open session at the next request; reactivating lets them sign in again", async () => {
    const email = "kit@lantern-reach.example";
    const cookie = await sessionCookieFor(email, demoPassword);
    const kit = await userFor(email);
    const adminActor = await actorFor(admin);

    expect(await setMemberStatus(adminActor, kit.id, "deactivated")).toMatchObject({ status: "deactivated" });
    expect(await asCookie(cookie, () => currentActor())).toBeNull();
    expect(await authenticateWithPassword(email, demoPassword)).toBeNull();
    expect(await User.count({ where: { email } })).toBe(1);

    await setMemberStatus(adminActor, kit.id, "active");
    expect(await asCookie(cookie, () => currentActor())).toBeNull();
    expect(await authenticateWithPassword(email, demoPassword)).toMatchObject({ email });

    const actions = (await AuditEvent.findAll({ where: { subjectType: "user", subjectId: String(kit.id) }, order: [["id", "ASC"]] })).map(
      (event) => event.action,
    );
    expect(actions).toEqual(["member.deactivated", "member.reactivated"]);
  });
});

describe("importing a roster", () => {
  const csv = [
    "name,email,role",
    "Wren Halloway,wren.halloway@lantern-reach.example,coach",
    "Otto Fairlie,otto.fairlie@lantern-reach.example,",
    "Ada Again,ADA@lantern-reach.example,athlete",
    ",no.name@lantern-reach.example,athlete",
    "Bad Mail,bad-mail,athlete",
    "Odd Role,odd.role@lantern-reach.example,cox",
    "Otto Twice,otto.fairlie@lantern-reach.example,athlete",
  ].join("\n");

  it("invites and e-mails the good rows and reports the rest by row and field", async () => {
    const report = await importRoster(await actorFor(admin), csv);
    expect(report.fileProblem).toBeNull();
    expect(report.rowCount).toBe(7);
    expect(report.invited.map((entry) => [entry.row, entry.email, entry.role])).toEqual([
      [2, "wren.halloway@lantern-reach.example", "coach"],
      [3, "otto.fairlie@lantern-reach.example", "athlete"],
    ]);
    expect(report.problems.map(({ row, field }) => [row, field])).toEqual([
      [4, "email"],
      [5, "name"],
      [6, "email"],
      [7, "role"],
      [8, "email"],
    ]);
    expect(report.problems[0]?.message).toContain("Already a member");

    const invitations = await Invitation.findAll({
      where: { email: ["wren.halloway@lantern-reach.example", "otto.fairlie@lantern-reach.example"] },
    });
    expect(invitations.map((invitation) => invitation.role).sort()).toEqual(["athlete", "coach"]);
    const mail = await listOutbox();
    expect(mail.filter((message) => message.to === "wren.halloway@lantern-reach.example")).toHaveLength(1);
    expect(mail.filter((message) => message.to === "otto.fairlie@lantern-reach.example")).toHaveLength(1);
    expect(await AuditEvent.count({ where: { action: "member.invited" } })).toBe(2);
    expect(await AuditEvent.count({ where: { action: "member.roster_imported" } })).toBe(1);
  });

  it("reports open invitations and new members when the same file comes again", async () => {
    const mail = (await listOutbox()).find((message) => message.to === "wren.halloway@lantern-reach.example");
    const token = /\/invite\/(\S+)/.exec(mail!.text)?.[1];
    await acceptInvitation(token!, "Wren Halloway", "slipway reed heron tide");

    const again = await importRoster(await actorFor(admin), csv);
    expect(again.invited).toEqual([]);
    const messages = new Map(again.problems.map((problem) => [problem.row, problem.message]));
    expect(messages.get(2)).toContain("Already a member");
    expect(messages.get(3)).toContain("Already invited");
  });

  it("refuses non-admins", async () => {
    await expect(importRoster(await actorFor("coach.tobias@lantern-reach.example"), csv)).rejects.toBeInstanceOf(ForbiddenError);
  });
});

describe("member route handlers", () => {
  it("PATCH /api/members/[id] changes a role for the admin and validates the body", async () => {
    const cookie = await sessionCookieFor(admin, demoPassword);
    const lena = await userFor("lena@lantern-reach.example");
    const path = `/api/members/${lena.id}`;
    const params = { id: String(lena.id) };

    const changed = await callRoute(memberRoute.PATCH, { method: "PATCH", path, params, cookie, json: { role: "coach" } });
    expect(changed.status).toBe(200);
    expect(await changed.json()).toMatchObject({ member: { id: lena.id, role: "coach" } });
    await callRoute(memberRoute.PATCH, { method: "PATCH", path, params, cookie, json: { role: "athlete" } });

    const both = await callRoute(memberRoute.PATCH, { method: "PATCH", path, params, cookie, json: { role: "coach", status: "active" } });
    expect(both.status).toBe(400);
    const badId = await callRoute(memberRoute.PATCH, {
      method: "PATCH",
      path: "/api/members/abc",
      params: { id: "abc" },
      cookie,
      json: { role: "coach" },
    });
    expect(badId.status).toBe(400);
    const self = await userFor(admin);
    const own = await callRoute(memberRoute.PATCH, {
      method: "PATCH",
      path: `/api/members/${self.id}`,
      params: { id: String(self.id) },
      cookie,
      json: { status: "deactivated" },
    });
    expect(own.status).toBe(403);
  });

  it("POST /api/members/import checks type, size and the file, then reports per row", async () => {
    const cookie = await sessionCookieFor(admin, demoPassword);
    const path = "/api/members/import";
    const good = "name,email\nSage Merrow,sage.merrow@lantern-reach.example\nNo Mail,\n";

    const ok = await callRoute(importRoute.POST, { method: "POST", path, cookie, body: good, contentType: "text/csv; charset=utf-8" });
    expect(ok.status).toBe(200);
    const report = (await ok.json()) as { invited: { email: string }[]; problems: { row: number; field: string }[] };
    expect(report.invited.map((entry) => entry.email)).toEqual(["sage.merrow@lantern-reach.example"]);
    expect(report.problems).toEqual([{ row: 3, field: "email", message: "Missing e-mail address." }]);

    expect((await callRoute(importRoute.POST, { method: "POST", path, cookie, json: { csv: good } })).status).toBe(415);
    const big = `name,email\n${"x".repeat(210 * 1024)},big@example.org\n`;
    expect((await callRoute(importRoute.POST, { method: "POST", path, cookie, body: big, contentType: "text/csv" })).status).toBe(413);
    const binary = new Uint8Array([0x6e, 0x61, 0x6d, 0x65, 0x00, 0xff]);
    expect((await callRoute(importRoute.POST, { method: "POST", path, cookie, body: binary, contentType: "text/plain" })).status).toBe(415);
    const noHeader = await callRoute(importRoute.POST, {
      method: "POST",
      path,
      cookie,
      body: "just,some\ntext,here\n",
      contentType: "text/plain",
    });
    expect(noHeader.status).toBe(400);
    expect(await noHeader.json()).toMatchObject({
      error: "invalid_input",
      fields: { file: [expect.stringContaining("Missing: name, email")] },
    });
  });
});

describe("members page actions", () => {
  function upload(body: BlobPart, type: string, name = "roster.csv"): FormData {
    const data = new FormData();
    data.set("roster", new File([body], name, { type }));
    return data;
  }

  it("importRosterAction refuses a missing, non-text, binary or oversized file with a message for the field", async () => {
    const cookie = await sessionCookieFor(admin, demoPassword);
    const missing = await asCookie(cookie, () => importRosterAction(new FormData()));
    expect(missing).toMatchObject({ ok: false, fieldErrors: { roster: ["Choose a CSV file."] } });
    const image = await asCookie(cookie, () => importRosterAction(upload(new Uint8Array([0x89, 0x50]), "image/png", "a.png")));
    expect(image).toMatchObject({ ok: false, message: "Choose a CSV or plain-text file." });
    const binary = await asCookie(cookie, () => importRosterAction(upload(new Uint8Array([0x6e, 0x00, 0xff]), "text/csv")));
    expect(binary).toMatchObject({ ok: false, message: expect.stringContaining("not text") });
    const big = await asCookie(cookie, () => importRosterAction(upload("x".repeat(201 * 1024), "text/csv")));
    expect(big).toMatchObject({ ok: false, message: expect.stringContaining("200 KB") });
  });

  it("importRosterAction invites the good rows and returns the report", async () => {
    const cookie = await sessionCookieFor(admin, demoPassword);
    const result = await asCookie(cookie, () =>
      importRosterAction(upload("name,email\nRue Castellan,rue.castellan@lantern-reach.example\n,x@y.example\n", "text/csv")),
    );
    expect(result.ok).toBe(true);
    expect(result.message).toBe("1 invitation sent. Some rows were not imported.");
    expect(result.ok && result.data?.problems).toEqual([{ row: 3, field: "name", message: "Missing name." }]);
  });

  it("setMemberStatusAction turns the admin's own account away with the rule's message", async () => {
    const cookie = await sessionCookieFor(admin, demoPassword);
    const self = await userFor(admin);
    const result = await asCookie(cookie, () => setMemberStatusAction({ memberId: self.id, status: "deactivated" }));
    expect(result).toMatchObject({ ok: false, message: expect.stringContaining("cannot change your own role or deactivate yourself") });
    expect((await userFor(admin)).status).toBe("active");
  });
});

describe("the roster API's pages", () => {
  const rosterRoute = () => import("@/app/api/roster/route");
  const coach = "coach.tobias@lantern-reach.example";

  it("pages through the club's athletes by name without overlap or gaps", async () => {
    const { listClubMembers } = await import("@/lib/data/members");
    const everyone = (await listClubMembers(await actorFor(coach), "athlete")).map((member) => member.id);
    const cookie = await sessionCookieFor(coach, demoPassword);
    const { GET } = await rosterRoute();
    const seen: number[] = [];
    let offset: number | null = 0;
    while (offset !== null) {
      const response = await callRoute(GET, { method: "GET", path: `/api/roster?limit=3&offset=${offset}`, cookie });
      expect(response.status).toBe(200);
      const page = (await response.json()) as { athletes: { id: number }[]; total: number; limit: number; nextOffset: number | null };
      expect(page.total).toBe(everyone.length);
      expect(page.limit).toBe(3);
      expect(page.athletes.length).toBeLessThanOrEqual(3);
      seen.push(...page.athletes.map((athlete) => athlete.id));
      offset = page.nextOffset;
    }
    expect(seen).toEqual(everyone);
    const first = (await (await callRoute(GET, { method: "GET", path: "/api/roster", cookie })).json()) as {
      limit: number;
      offset: number;
    };
    expect(first).toMatchObject({ limit: 100, offset: 0 });
  });

  it.each([
    ["limit=0", "limit"],
    ["limit=501", "limit"],
    ["limit=abc", "limit"],
    ["limit=-1", "limit"],
    ["limit=1.5", "limit"],
    ["offset=-3", "offset"],
    ["offset=NaN", "offset"],
    ["offset=1e3", "offset"],
    ["limt=10", "limt"],
  ])("refuses ?%s with 400 naming %s", async (query, field) => {
    const cookie = await sessionCookieFor(coach, demoPassword);
    const { GET } = await rosterRoute();
    const response = await callRoute(GET, { method: "GET", path: `/api/roster?${query}`, cookie });
    expect(response.status).toBe(400);
    const body = (await response.json()) as { error: string; message: string; fields: Record<string, string[]> };
    expect(body.error).toBe("invalid_input");
    expect(body.message).toContain(field);
  });
});

describe("invitations not accepted yet (the club page's list)", () => {
  const daysAgo = (days: number) => new Date(Date.now() - days * 86_400_000);

  it("lists the newest invitation per address, leaves out accepted ones, addresses with an account and long-expired ones", async () => {
    const actor = await actorFor(admin);
    await inviteMember(actor, { email: "wren.list@lantern-reach.example", name: "Wren List", role: "athlete" });
    await inviteMember(actor, { email: "wren.list@lantern-reach.example", name: "Wren List", role: "coach" });
    const clubId = actor.clubId;
    const stale = { clubId, invitedById: actor.id, role: "athlete" as const, acceptedAt: null };
    await Invitation.create({
      ...stale,
      email: "lapsed.recent@lantern-reach.example",
      name: "Lapsed Recent",
      tokenHash: hashToken(newToken()),
      expiresAt: daysAgo(5),
    });
    await Invitation.create({
      ...stale,
      email: "lapsed.long@lantern-reach.example",
      name: "Lapsed Long",
      tokenHash: hashToken(newToken()),
      expiresAt: daysAgo(31),
    });
    // An address that has an account by now (invited again after joining another way), and an accepted one.
    await Invitation.create({
      ...stale,
      email: "ada@lantern-reach.example",
      name: "Ada",
      tokenHash: hashToken(newToken()),
      expiresAt: daysAgo(-3),
    });
    await Invitation.create({
      ...stale,
      email: "accepted@lantern-reach.example",
      name: "Accepted",
      tokenHash: hashToken(newToken()),
      expiresAt: daysAgo(-3),
      acceptedAt: daysAgo(1),
    });

    const listed = await listUnansweredInvitations(actor);
    const byEmail = new Map(listed.map((invitation) => [invitation.email, invitation]));
    expect(listed.filter((invitation) => invitation.email === "wren.list@lantern-reach.example")).toHaveLength(1);
    expect(byEmail.get("wren.list@lantern-reach.example")).toMatchObject({ role: "coach", open: true });
    expect(byEmail.get("lapsed.recent@lantern-reach.example")).toMatchObject({ open: false });
    for (const gone of ["lapsed.long@lantern-reach.example", "ada@lantern-reach.example", "accepted@lantern-reach.example"]) {
      expect(byEmail.has(gone), gone).toBe(false);
    }
    // Another club's invitations never show, and only administrators may look.
    const other = await listUnansweredInvitations(await actorFor("admin@brackwater.example"));
    expect(other.some((invitation) => invitation.email.endsWith("@lantern-reach.example"))).toBe(false);
    await expect(listUnansweredInvitations(await actorFor("coach.tobias@lantern-reach.example"))).rejects.toBeInstanceOf(ForbiddenError);
  });

  it("withdraws one: its link stops working, it leaves the list and the audit log says who; others are refused", async () => {
    const actor = await actorFor(admin);
    // An earlier invitation to the same address, expired: it must not come back on the list once the newer one is withdrawn.
    await Invitation.create({
      clubId: actor.clubId,
      invitedById: actor.id,
      email: "wrong.address@lantern-reach.example",
      name: "Wrong Address",
      role: "athlete",
      tokenHash: hashToken(newToken()),
      expiresAt: new Date(Date.now() - 86_400_000),
      createdAt: new Date(Date.now() - 15 * 86_400_000),
    });
    const { invitationId } = await inviteMember(actor, {
      email: "wrong.address@lantern-reach.example",
      name: "Wrong Address",
      role: "athlete",
    });
    const token = newToken();
    await Invitation.update({ tokenHash: hashToken(token) }, { where: { id: invitationId } });
    expect(await findPendingInvitation(token)).not.toBeNull();

    await expect(withdrawInvitation(await actorFor("admin@brackwater.example"), invitationId)).rejects.toBeInstanceOf(NotFoundError);
    await expect(withdrawInvitation(await actorFor("coach.tobias@lantern-reach.example"), invitationId)).rejects.toBeInstanceOf(
      ForbiddenError,
    );
    expect(await findPendingInvitation(token)).not.toBeNull();

    expect(await withdrawInvitation(actor, invitationId)).toEqual({ email: "wrong.address@lantern-reach.example" });
    expect(await findPendingInvitation(token)).toBeNull();
    expect((await listUnansweredInvitations(actor)).some((invitation) => invitation.email === "wrong.address@lantern-reach.example")).toBe(
      false,
    );
    const audit = await AuditEvent.findOne({ where: { action: "member.invitation-withdrawn", subjectId: String(invitationId) } });
    expect(audit).toMatchObject({ actorId: actor.id, details: { email: "wrong.address@lantern-reach.example" } });
    await expect(withdrawInvitation(actor, invitationId)).rejects.toBeInstanceOf(NotFoundError);
  });
});

describe("correcting a member's name", () => {
  it("saves it and audits who; issued certificates keep their name; coaches, the admin's own row and other clubs are refused", async () => {
    const actor = await actorFor(admin);
    const greta = await userFor("greta@lantern-reach.example");
    const issued = await Certificate.findAll({ where: { athleteId: greta.id } });
    expect(issued.length).toBeGreaterThan(0);
    const summary = await renameMember(actor, greta.id, "  Greta Quennell-Vasquez ");
    expect(summary).toMatchObject({ id: greta.id, name: "Greta Quennell-Vasquez" });
    expect((await userFor("greta@lantern-reach.example")).tokenVersion).toBe(greta.tokenVersion);
    const kept = await Certificate.findAll({ where: { athleteId: greta.id } });
    expect(kept.map((certificate) => certificate.athleteName)).toEqual(issued.map((certificate) => certificate.athleteName));
    const audit = await AuditEvent.findOne({ where: { action: "member.renamed", subjectId: String(greta.id) } });
    expect(audit).toMatchObject({ actorId: actor.id, details: { from: greta.name, to: "Greta Quennell-Vasquez" } });

    await expect(renameMember(await actorFor("coach.tobias@lantern-reach.example"), greta.id, "X")).rejects.toBeInstanceOf(ForbiddenError);
    await expect(renameMember(await actorFor("admin@brackwater.example"), greta.id, "X")).rejects.toBeInstanceOf(NotFoundError);
    await expect(renameMember(actor, actor.id, "Someone Else")).rejects.toThrow("Correct your own name under Your account.");
    expect((await userFor("greta@lantern-reach.example")).name).toBe("Greta Quennell-Vasquez");
  });
});

describe("moving a member to another e-mail address", () => {
  it("mails a link to the new address naming the admin; only the member's opening it makes the change", async () => {
    const actor = await actorFor(admin);
    const dev = await userFor("dev@lantern-reach.example");
    const moved = "dev.castellano@river-mail.example";
    expect(await requestMemberEmailChange(actor, dev.id, " Dev.Castellano@River-Mail.example ")).toEqual({
      newEmail: moved,
      currentEmail: "dev@lantern-reach.example",
    });
    // Nothing changed yet.
    expect((await userFor("dev@lantern-reach.example")).tokenVersion).toBe(dev.tokenVersion);
    const mail = (await listOutbox()).find((message) => message.to === moved);
    expect(mail?.subject).toBe("Confirm your new Slipway e-mail address");
    expect(mail?.text).toContain(`${actor.name}, an administrator of your club, asked to move your Slipway account to this address.`);
    const audit = await AuditEvent.findOne({ where: { action: "member.email-change-requested", subjectId: String(dev.id) } });
    expect(audit).toMatchObject({ actorId: actor.id, details: { to: moved } });

    const token = /\/confirm-email\?token=([A-Za-z0-9_-]{43})/.exec(mail!.text)![1]!;
    // An admin vouched for this one: the member confirms it without signing in (they may be unable to).
    expect(await confirmEmailChange(token, null)).toEqual({ email: moved });
    const after = (await User.findByPk(dev.id))!;
    expect(after.email).toBe(moved);
    expect(after.tokenVersion).toBe(dev.tokenVersion + 1);
    // Put it back for the tests below.
    await after.update({ email: "dev@lantern-reach.example" });
  });

  it("refuses a taken address, the member's own, a deactivated member, the admin's own account, coaches and other clubs", async () => {
    const actor = await actorFor(admin);
    const kit = await userFor("kit@lantern-reach.example");
    await expect(requestMemberEmailChange(actor, kit.id, "ada@lantern-reach.example")).rejects.toThrow(
      "That address already has a Slipway account.",
    );
    await expect(requestMemberEmailChange(actor, kit.id, "KIT@lantern-reach.example")).rejects.toBeInstanceOf(ValidationError);
    await expect(requestMemberEmailChange(actor, actor.id, "maren@river-mail.example")).rejects.toThrow(
      "Change your own e-mail address under Your account.",
    );
    await expect(
      requestMemberEmailChange(await actorFor("coach.tobias@lantern-reach.example"), kit.id, "kit@river-mail.example"),
    ).rejects.toBeInstanceOf(ForbiddenError);
    await expect(
      requestMemberEmailChange(await actorFor("admin@brackwater.example"), kit.id, "kit@river-mail.example"),
    ).rejects.toBeInstanceOf(NotFoundError);
    await setMemberStatus(actor, kit.id, "deactivated");
    await expect(requestMemberEmailChange(actor, kit.id, "kit@river-mail.example")).rejects.toBeInstanceOf(ConflictError);
    await setMemberStatus(actor, kit.id, "active");
    expect((await listOutbox()).some((message) => message.to === "kit@river-mail.example")).toBe(false);
  });
});
