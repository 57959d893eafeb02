/**
 * The route-guard table: the status every route handler (and every server action) must give each kind
 * of caller. tests/integration/route-guards.test.ts walks app/ and fails for any handler or action
 * without a row here, then calls each one directly as every role; tests/e2e/route-guards.spec.ts sends
 * the route rows through the real server with real signed-in browsers.
 *
 * Roles: "home" is the demo club (Lantern Reach); "other" is the invented second club seeded for tests
 * (lib/seed/second-club.ts). Requests aim at home-club records, so the other club's members must get
 * 404 wherever a record is addressed (never 403: they must not learn that it exists).
 *
 * Adding a route or action? Add one row per exported method / action with all seven statuses. Pure
 * data: no app imports but a pure lib/ helper, so Playwright can load it too.
 */

import { machineTimeZone } from "@/lib/care/calendar";

export const guardRoles = ["anonymous", "athlete", "otherAthlete", "coach", "otherCoach", "admin", "otherAdmin"] as const;
export type GuardRole = (typeof guardRoles)[number];
export type Expected = Record<GuardRole, number>;

/**
 * Values the requests may use: home-club records to aim at, and a tag unique to each call. The boat is the
 * demo fleet's Heron (1x) and the oar set its Short-loom sculls (lib/seed/demo-fleet.ts), linked to Heron only.
 * The certification records come from lib/seed/demo-certification.ts; the seed has no evidence photos, so
 * both harnesses add three (as the coach, through POST /api/sign-offs/[id]/evidence) before the rows run.
 */
export interface GuardFixtures {
  /** Lena Fairbrother: an athlete whose clearance is not suspended. */
  homeAthleteId: number;
  homeBoatId: number;
  homeOarSetId: number;
  /** Hamish Oyelaran: the seed suspended his clearance. */
  homeSuspendedAthleteId: number;
  /** Iris Delacourt's "overall-length" module certificate, which the seed revoked (her only certificate). */
  homeCertificateId: string;
  /** That certificate's public verification code. */
  homeVerificationCode: string;
  /** Jonah Treloar's waiting "grip-cleaning" sign-off, asked of any coach: the evidence upload row adds to it. */
  homeWaitingSignOffId: string;
  /** Iris Delacourt's "setting-inboard" sign-off, already recorded as "not yet". */
  homeDecidedSignOffId: string;
  /** A photo on Elin Marchetti's waiting "changing-boats" sign-off that the rows only read. */
  homeEvidenceId: string;
  /** Two more photos on that sign-off: the coach removes the first, the admin the second. */
  spareEvidenceIds: [string, string];
  tag: string;
}

export interface GuardRequest {
  path: string;
  json?: unknown;
  /** A form body (application/x-www-form-urlencoded). */
  form?: Record<string, string>;
  /** A raw body with its content type, e.g. a CSV upload. */
  text?: { body: string; contentType: string };
  /** One file sent as multipart/form-data under `field` (bytes as base64, so the table stays plain data). */
  file?: { field: string; name: string; type: string; base64: string };
}

export interface RouteGuardRow {
  /** The route file, relative to the project root. */
  file: string;
  method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  /** The request one role sends; most rows send every role the same one. */
  request: (fixtures: GuardFixtures, role: GuardRole) => GuardRequest;
  expect: Expected;
  /** Text that must not appear in any answer given to the other club's members. */
  hiddenFromOtherClub?: string;
  why?: string;
}

interface ActionGuardRowBase {
  file: string;
  action: string;
  /** 200 for { ok: true }; 303 for a form action that redirects; else the status of the typed error it turned into a failure. */
  expect: Expected;
  /** For redirecting form actions: where each role must be sent. */
  redirects?: Partial<Record<GuardRole, RegExp>>;
  why?: string;
}

export type ActionGuardRow = ActionGuardRowBase &
  (
    | {
        /** The action's one argument: an object, or a FormData built from these fields and files. */
        input: (fixtures: GuardFixtures) => unknown;
        args?: never;
      }
    | {
        /** Every argument, in order, for actions that take more than one (or none); used as given. */
        args: (fixtures: GuardFixtures) => unknown[];
        input?: never;
      }
  );

/** Everyone gets the same answer. */
function all(status: number): Expected {
  return { anonymous: status, athlete: status, otherAthlete: status, coach: status, otherCoach: status, admin: status, otherAdmin: status };
}

/** Signed in as coach or admin of any club. */
const coachesOfAnyClub: Expected = {
  anonymous: 401,
  athlete: 403,
  otherAthlete: 403,
  coach: 200,
  otherCoach: 200,
  admin: 200,
  otherAdmin: 200,
};

/** Admins acting on their own club, with `ok` as the success status. */
function adminsOwnClub(ok: number): Expected {
  return { anonymous: 401, athlete: 403, otherAthlete: 403, coach: 403, otherCoach: 403, admin: ok, otherAdmin: ok };
}

/** Admins changing a home-club record: the other club's admin is told it does not exist. */
const homeAdminOnRecord: Expected = {
  anonymous: 401,
  athlete: 403,
  otherAthlete: 403,
  coach: 403,
  otherCoach: 403,
  admin: 200,
  otherAdmin: 404,
};

/** Coaches and admins changing a home-club record: the other club's coach and admin are told it does not exist. */
const homeCoachOnRecord: Expected = {
  anonymous: 401,
  athlete: 403,
  otherAthlete: 403,
  coach: 200,
  otherCoach: 404,
  admin: 200,
  otherAdmin: 404,
};

/** Any member using a home-club record, with `ok` as the success status: the other club's members are told it does not exist. */
function homeMembersOnRecord(ok: number): Expected {
  return { anonymous: 401, athlete: ok, otherAthlete: 404, coach: ok, otherCoach: 404, admin: ok, otherAdmin: 404 };
}

/**
 * Coaches and admins using one home-club athlete's own record (a certificate, sign-off, photo or clearance),
 * with `ok` as the success status. Athletes see only their own records, so another athlete's is not found
 * for them (the home-club athlete too, as tests/integration/certification.test.ts checks); the other club's
 * coach and admin are told it does not exist.
 */
function homeStaffOnAthleteRecord(ok: number): Expected {
  return { anonymous: 401, athlete: 404, otherAthlete: 404, coach: ok, otherCoach: 404, admin: ok, otherAdmin: 404 };
}

/** A 1×1 PNG: a valid club logo and evidence photo. */
export const tinyPngBase64 = "iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==";

/** A YYYY-MM-DD day `offset` days from today in this machine's time zone (as the server's localIsoDate reads it). */
function localDay(offset: number): string {
  const day = new Date();
  day.setDate(day.getDate() + offset);
  return `${day.getFullYear()}-${String(day.getMonth() + 1).padStart(2, "0")}-${String(day.getDate()).padStart(2, "0")}`;
}

/** A number from the tag, so each call can pick its own far-away day. */
function tagNumber(tag: string): number {
  let sum = 0;
  for (const char of tag) sum = (sum * 31 + char.charCodeAt(0)) % 100_000;
  return sum;
}

/** A sculling change the engine can plan (287/86.5 → 288/88): valid for the default limits and every club's. */
const scullChange = { oarType: "sculling", measured: { lengthCm: 287, inboardCm: 86.5 }, target: { lengthCm: 288, inboardCm: 88 } };

/** Any signed-in member of any club; nobody signed in gets 401. */
function members(status: number): Expected {
  return { ...all(status), anonymous: 401 };
}

export const routeGuardRows: RouteGuardRow[] = [
  {
    file: "app/api/auth/[...nextauth]/route.ts",
    method: "GET",
    request: () => ({ path: "/api/auth/session" }),
    expect: all(200),
    why: "next-auth's own endpoints are public; the session endpoint says who is signed in.",
  },
  {
    file: "app/api/auth/[...nextauth]/route.ts",
    method: "POST",
    request: () => ({
      path: "/api/auth/callback/password",
      form: { email: "nobody@nowhere.example", password: "not-this-csrf-token", csrfToken: "0".repeat(64) },
    }),
    expect: all(302),
    why: "A well-formed CSRF token that is not the caller's own: next-auth sends the sign-in back to the sign-in page, for everyone.",
  },
  {
    file: "app/api/[...unmatched]/route.ts",
    method: "GET",
    request: () => ({ path: "/api/no-such-route/get" }),
    expect: all(404),
    why: "Paths no handler serves: a JSON 404 for everyone, reading nothing.",
  },
  {
    file: "app/api/[...unmatched]/route.ts",
    method: "POST",
    request: () => ({ path: "/api/no-such-route/post", json: {} }),
    expect: all(404),
    why: "Paths no handler serves: a JSON 404 for everyone, reading nothing.",
  },
  {
    file: "app/api/[...unmatched]/route.ts",
    method: "PUT",
    request: () => ({ path: "/api/no-such-route/put", json: {} }),
    expect: all(404),
    why: "Paths no handler serves: a JSON 404 for everyone, reading nothing.",
  },
  {
    file: "app/api/[...unmatched]/route.ts",
    method: "PATCH",
    request: () => ({ path: "/api/no-such-route/patch", json: {} }),
    expect: all(404),
    why: "Paths no handler serves: a JSON 404 for everyone, reading nothing.",
  },
  {
    file: "app/api/[...unmatched]/route.ts",
    method: "DELETE",
    request: () => ({ path: "/api/no-such-route/delete" }),
    expect: all(404),
    why: "Paths no handler serves: a JSON 404 for everyone, reading nothing.",
  },
  {
    file: "app/api/bench/ping/route.ts",
    method: "GET",
    request: () => ({ path: "/api/bench/ping" }),
    expect: all(200),
    why: "Public and static ({ ok: true }, no database, session or input): the benchmark's baseline route.",
  },
  {
    file: "app/api/health/route.ts",
    method: "GET",
    request: () => ({ path: "/api/health" }),
    expect: all(200),
    why: "Public: says only whether the database answers.",
  },
  {
    file: "app/api/invitations/route.ts",
    method: "POST",
    request: ({ tag }) => ({
      path: "/api/invitations",
      json: { email: `guard.${tag}@invitations.example`, name: "Guard Row", role: "athlete" },
    }),
    expect: adminsOwnClub(201),
  },
  {
    file: "app/api/roster/route.ts",
    method: "GET",
    request: () => ({ path: "/api/roster" }),
    expect: coachesOfAnyClub,
    hiddenFromOtherClub: "@lantern-reach.example",
    why: "Each coach sees their own club's athletes only.",
  },
  {
    file: "app/api/members/[id]/route.ts",
    method: "PATCH",
    request: ({ homeAthleteId }) => ({ path: `/api/members/${homeAthleteId}`, json: { role: "athlete" } }),
    expect: homeAdminOnRecord,
    why: "Setting the role the athlete already has: passes every guard, changes nothing.",
  },
  {
    file: "app/api/members/import/route.ts",
    method: "POST",
    request: ({ tag }) => ({
      path: "/api/members/import",
      text: { body: `name,email\nGuard Import,guard.import.${tag}@roster.example\n`, contentType: "text/csv" },
    }),
    expect: adminsOwnClub(200),
  },
];

routeGuardRows.push(
  {
    file: "app/api/modules/[slug]/attempts/route.ts",
    method: "POST",
    request: () => ({ path: "/api/modules/secure-and-check/attempts" }),
    expect: members(201),
    why: "Any member starts (or resumes) their own attempt; the questions carry no answers.",
  },
  {
    file: "app/api/attempts/[id]/submit/route.ts",
    method: "POST",
    request: () => ({ path: "/api/attempts/00000000-0000-4000-8000-000000000000/submit", json: { answers: {} } }),
    expect: members(404),
    why: "Only the athlete's own attempt can be submitted; any other id is not found (tests/e2e/learn.spec.ts covers another athlete's real attempt).",
  },
  {
    file: "app/api/me/progress/route.ts",
    method: "GET",
    request: () => ({ path: "/api/me/progress" }),
    expect: members(200),
    why: "Each member's own progress.",
  },
);

routeGuardRows.push(
  {
    file: "app/api/rig/plan/route.ts",
    method: "POST",
    request: () => ({ path: "/api/rig/plan", json: scullChange }),
    expect: all(200),
    why: "Public: plans a boat change with the rigging engine (the club's limits for members, the defaults for anyone else); throttled at 60 a minute per address, and a row makes 7 calls.",
  },
  {
    file: "app/api/rig/plans/route.ts",
    method: "POST",
    request: ({ homeBoatId, homeOarSetId }) => ({
      path: "/api/rig/plans",
      json: {
        // A fresh once-only id per call, so every home-club call records a new plan (201, not the 200 of a resend).
        clientId: globalThis.crypto.randomUUID(),
        boatId: homeBoatId,
        oarSetId: homeOarSetId,
        request: { ...scullChange, target: { lengthCm: 286, inboardCm: 87 } },
        plannedAt: new Date().toISOString(),
      },
    }),
    expect: homeMembersOnRecord(201),
    why: "Any member records a plan for their own club's boat and oar set; the other club's members are told the boat does not exist. Adds a plan for Heron, which no other test counts.",
  },
  {
    file: "app/api/rig/plans/route.ts",
    method: "GET",
    request: () => ({ path: "/api/rig/plans" }),
    expect: coachesOfAnyClub,
    hiddenFromOtherClub: "Heron",
    why: "Each coach sees their own club's saved plans only; the POST row before this one has just saved home-club plans for Heron.",
  },
);

const tinyPngFile = { field: "file", name: "guard.png", type: "image/png", base64: tinyPngBase64 };

routeGuardRows.push(
  {
    file: "app/api/certificates/[id]/pdf/route.ts",
    method: "GET",
    request: ({ homeCertificateId }) => ({ path: `/api/certificates/${homeCertificateId}/pdf` }),
    expect: homeStaffOnAthleteRecord(200),
    why: "A certificate's PDF is for its athlete and the coaches and admins of their club. Iris's revoked certificate (the PDF says so): reading it changes nothing.",
  },
  {
    file: "app/api/verify/[code]/route.ts",
    method: "GET",
    request: ({ homeVerificationCode }) => ({ path: `/api/verify/${homeVerificationCode}` }),
    expect: all(200),
    why: "Public: anyone holding the code may check the certificate (this one answers that it is revoked); an unknown code is 404 for everyone.",
  },
  {
    file: "app/api/club/logo/route.ts",
    method: "POST",
    request: () => ({ path: "/api/club/logo", file: tinyPngFile }),
    expect: adminsOwnClub(201),
    why: "Admins upload their own club's logo (sniffed PNG or JPEG). The GET row after this reads it and the DELETE row after that removes it, so both clubs end with no logo, as seeded.",
  },
  {
    file: "app/api/club/logo/route.ts",
    method: "GET",
    request: () => ({ path: "/api/club/logo" }),
    expect: members(200),
    why: "Every member sees their own club's logo: the POST row before this one has just set one for each club (with none it is 404).",
  },
  {
    file: "app/api/club/logo/route.ts",
    method: "DELETE",
    request: () => ({ path: "/api/club/logo" }),
    expect: adminsOwnClub(204),
    why: "Admins remove their own club's logo: takes away the one the POST row set, back to none as seeded.",
  },
  {
    file: "app/api/sign-offs/[id]/evidence/route.ts",
    method: "POST",
    request: ({ homeWaitingSignOffId }) => ({ path: `/api/sign-offs/${homeWaitingSignOffId}/evidence`, file: tinyPngFile }),
    expect: homeStaffOnAthleteRecord(201),
    why: "Coaches and admins of the athlete's club add a photo to a waiting sign-off (checked before the body is read). Two photos a run, under the limit of three; nothing is signed off.",
  },
  {
    file: "app/api/evidence/[id]/route.ts",
    method: "GET",
    request: ({ homeEvidenceId }) => ({ path: `/api/evidence/${homeEvidenceId}` }),
    expect: homeStaffOnAthleteRecord(200),
    why: "A sign-off photo is for its athlete and the coaches and admins of their club only.",
  },
  {
    file: "app/api/evidence/[id]/route.ts",
    method: "DELETE",
    // The coach and the admin each remove a photo of their own; everyone else aims at the one that stays,
    // so no refusal can pass just because an earlier call already removed the photo.
    request: ({ homeEvidenceId, spareEvidenceIds }, role) => ({
      path: `/api/evidence/${role === "coach" ? spareEvidenceIds[0] : role === "admin" ? spareEvidenceIds[1] : homeEvidenceId}`,
    }),
    expect: homeStaffOnAthleteRecord(204),
    why: "Coaches and admins of the athlete's club remove a photo from a waiting sign-off: only the two spare photos the harness added go.",
  },
  {
    file: "app/api/sign-offs/route.ts",
    method: "GET",
    request: () => ({ path: "/api/sign-offs" }),
    expect: coachesOfAnyClub,
    hiddenFromOtherClub: "Jonah Treloar",
    why: "Each coach sees the sign-offs their own club's athletes wait for.",
  },
  {
    file: "app/api/sign-offs/route.ts",
    method: "POST",
    request: () => ({ path: "/api/sign-offs", json: { moduleSlug: "grip-cleaning", coachId: null } }),
    expect: members(409),
    why: "Any member asks for their own sign-off only. None of the callers has passed the grip-cleaning quiz, so each is told to pass it first (409) after every guard: nothing is asked.",
  },
  {
    file: "app/api/roster/matrix/route.ts",
    method: "GET",
    request: () => ({ path: "/api/roster/matrix" }),
    expect: coachesOfAnyClub,
    hiddenFromOtherClub: "@lantern-reach.example",
    why: "Each coach sees their own club's athletes × modules only.",
  },
  {
    file: "app/api/roster/matrix/export/route.ts",
    method: "GET",
    request: () => ({ path: "/api/roster/matrix/export?filter=all" }),
    expect: coachesOfAnyClub,
    hiddenFromOtherClub: "@lantern-reach.example",
    why: "The roster as CSV: each coach's own club only.",
  },
  {
    file: "app/api/register/csv/route.ts",
    method: "GET",
    request: () => ({ path: "/api/register/csv" }),
    expect: adminsOwnClub(200),
    hiddenFromOtherClub: "Lena Fairbrother",
    why: "Each admin downloads their own club's induction register (the other club's is empty).",
  },
  {
    file: "app/api/register/pdf/route.ts",
    method: "GET",
    request: () => ({ path: "/api/register/pdf" }),
    expect: adminsOwnClub(200),
    why: "Each admin prints their own club's induction register (the CSV row checks which club's entries it holds).",
  },
);

/**
 * The club settings form as every club starts (lib/validations/club-settings.ts defaults); neither club
 * changes them. Without a stored time zone a club has the server's, this machine's.
 */
const settingsAsSeeded = {
  timeZone: machineTimeZone(),
  passMarkPercent: 80,
  clickCm: 0.5,
  halfSwivelCm: 2,
  clearanceModules: ["overall-length", "setting-inboard", "changing-boats", "secure-and-check", "grip-cleaning"],
  clearanceMonths: 12,
  limits: {
    sculling: { minLengthCm: 280, maxLengthCm: 292, minInboardCm: 85, maxInboardCm: 91 },
    sweep: { minLengthCm: 366, maxLengthCm: 380, minInboardCm: 112, maxInboardCm: 120 },
  },
};

/** Verdicts for "setting-inboard"'s checklist (content/modules/setting-inboard.mdx): valid, and a "not yet". */
const settingInboardVerdicts = {
  items: { "measures-from-collar-face": "met", "plans-clicks": "not-yet", "seats-and-tightens": "met", "checks-inboard": "met" },
  note: "Guard row: count the clicks first.",
  evidenceIds: [],
};

export const actionGuardRows: ActionGuardRow[] = [
  {
    file: "app/(account)/account/actions.ts",
    action: "changePasswordAction",
    input: () => ({ currentPassword: "not anyone's password here", newPassword: "guard row heron tidewater" }),
    expect: { anonymous: 401, athlete: 400, otherAthlete: 400, coach: 400, otherCoach: 400, admin: 400, otherAdmin: 400 },
    why: "Any member, only for their own account (there is no member argument); a wrong current password is refused (400), so the rows' sessions live on.",
  },
  {
    file: "app/(account)/account/actions.ts",
    action: "changeOwnNameAction",
    input: ({ tag }) => ({ name: `Guard Row ${tag}` }),
    expect: { anonymous: 401, athlete: 200, otherAthlete: 200, coach: 200, otherCoach: 200, admin: 200, otherAdmin: 200 },
    why: "Any member renames only themselves (there is no member argument).",
  },
  {
    file: "app/(account)/account/actions.ts",
    action: "requestEmailChangeAction",
    input: () => ({ newEmail: "guard.row@river-mail.example", currentPassword: "not anyone's password here" }),
    expect: { anonymous: 401, athlete: 400, otherAthlete: 400, coach: 400, otherCoach: 400, admin: 400, otherAdmin: 400 },
    why: "Any member, only for their own account (there is no member argument); a wrong current password is refused (400), so no link is sent.",
  },
  {
    file: "app/(auth)/confirm-email/actions.ts",
    action: "confirmEmailChangeAction",
    // Shaped like a real token (43 base64url characters), so that it is refused as unknown, not as malformed.
    input: () => ({ token: "no-such-email-change-0000000000000000000000" }),
    expect: all(404),
    why: "Public: the link's token is the guard; an unknown one is not found for everyone.",
  },
  {
    file: "app/(auth)/invite/[token]/actions.ts",
    action: "acceptInvitationAction",
    // Shaped like a real token (43 base64url characters), so that it is refused as unknown, not as malformed.
    input: () => ({ token: "no-such-invitation-000000000000000000000000", name: "Guard Row", password: "heron slipway tidewater" }),
    expect: all(404),
    why: "Public: the invitation token is the guard; an unknown one is not found for everyone.",
  },
  {
    file: "app/(auth)/sign-in/actions.ts",
    action: "requestSignInLinkAction",
    input: () => ({ email: "nobody@nowhere.example" }),
    expect: all(200),
    why: "Public, and the same answer whether or not the address has an account.",
  },
  {
    file: "app/(club)/club/actions.ts",
    action: "inviteMemberAction",
    input: ({ tag }) => ({ email: `guard.${tag}@invite-action.example`, name: "Guard Row", role: "athlete" }),
    expect: adminsOwnClub(200),
  },
  {
    file: "app/(club)/club/actions.ts",
    action: "withdrawInvitationAction",
    // No invitation is seeded for the rows: an id that does not exist shows that the role check comes
    // first (403) and that an admin is then told it is not there (404). tests/integration/member-admin.test.ts
    // withdraws a real one, and refuses the other club's admin.
    input: () => ({ invitationId: 2_147_480_000 }),
    expect: { anonymous: 401, athlete: 403, otherAthlete: 403, coach: 403, otherCoach: 403, admin: 404, otherAdmin: 404 },
  },
  {
    file: "app/(club)/club/members/actions.ts",
    action: "changeMemberRoleAction",
    input: ({ homeAthleteId }) => ({ memberId: homeAthleteId, role: "athlete" }),
    expect: homeAdminOnRecord,
  },
  {
    file: "app/(club)/club/members/actions.ts",
    action: "renameMemberAction",
    input: ({ homeAthleteId }) => ({ memberId: homeAthleteId, name: "Lena Fairbrother" }),
    expect: homeAdminOnRecord,
  },
  {
    file: "app/(club)/club/members/actions.ts",
    action: "changeMemberEmailAction",
    input: ({ homeAthleteId }) => ({ memberId: homeAthleteId, newEmail: "ada@lantern-reach.example" }),
    expect: { anonymous: 401, athlete: 403, otherAthlete: 403, coach: 403, otherCoach: 403, admin: 400, otherAdmin: 404 },
    why: "Admins start moving their own club's members to a new address. Ada's address has an account, so the admin passes every guard and is refused by name (400): no link is sent.",
  },
  {
    file: "app/(club)/club/members/actions.ts",
    action: "setMemberStatusAction",
    input: ({ homeAthleteId }) => ({ memberId: homeAthleteId, status: "active" }),
    expect: homeAdminOnRecord,
  },
  {
    file: "app/(club)/club/members/actions.ts",
    action: "importRosterAction",
    input: ({ tag }) => ({
      formData: { roster: { name: "roster.csv", type: "text/csv", body: `name,email\nGuard Import,guard.action.${tag}@roster.example\n` } },
    }),
    expect: adminsOwnClub(200),
  },
  {
    file: "app/(learn)/learn/[slug]/actions.ts",
    action: "finishLessonAction",
    input: () => ({ formData: { slug: "overall-length" } }),
    expect: all(303),
    redirects: {
      anonymous: /^\/sign-in\?callbackUrl=/,
      athlete: /^\/learn\/overall-length\/quiz$/,
      otherAthlete: /^\/learn\/overall-length\/quiz$/,
      coach: /^\/learn\/overall-length\/quiz$/,
      otherCoach: /^\/learn\/overall-length\/quiz$/,
      admin: /^\/learn\/overall-length\/quiz$/,
      otherAdmin: /^\/learn\/overall-length\/quiz$/,
    },
    why: "A plain form action (works without JavaScript): records the read for any member, sends the signed-out to sign in.",
  },
];

const fleetActions = "app/(coach)/roster/fleet/actions.ts";

/** Heron exactly as lib/seed/demo-fleet.ts seeds it, so an update with it changes nothing. */
const heronAsSeeded = { name: "Heron", boatClass: "1x", spanCm: 160, notes: "Learn-to-scull single, wide and stable." };

actionGuardRows.push(
  {
    file: fleetActions,
    action: "createBoatAction",
    input: ({ tag }) => ({ name: `Guard boat ${tag}`, boatClass: "1x", spanCm: 160 }),
    expect: coachesOfAnyClub,
    why: "Coaches and admins add a boat to their own club (a new name each call); athletes may not.",
  },
  {
    file: fleetActions,
    action: "updateBoatAction",
    args: ({ homeBoatId }) => [homeBoatId, heronAsSeeded],
    expect: homeCoachOnRecord,
    why: "Saving Heron with its own values: passes every guard, changes nothing.",
  },
  {
    file: fleetActions,
    action: "setBoatArchivedAction",
    input: ({ homeBoatId }) => ({ id: homeBoatId, archived: false }),
    expect: homeCoachOnRecord,
    why: "Restoring Heron, which is not archived: passes every guard, changes nothing (archiving it would hide it from later rows).",
  },
  {
    file: fleetActions,
    action: "createOarSetAction",
    input: ({ tag }) => ({
      name: `Guard sculls ${tag}`,
      oarType: "sculling",
      oarCount: 2,
      targetLengthCm: 288,
      targetInboardCm: 88,
      clickCm: 0.5,
      handleMechanism: "clamped-slide",
      boatIds: [],
    }),
    expect: coachesOfAnyClub,
    why: "Coaches and admins add an oar set to their own club, linked to no boat (a home-club boat would be refused as a field error, 400, for the other club).",
  },
  {
    file: fleetActions,
    action: "updateOarSetAction",
    // Short-loom sculls as seeded, still linked to Heron only: an empty boatIds would unlink it.
    args: ({ homeOarSetId, homeBoatId }) => [
      homeOarSetId,
      {
        name: "Short-loom sculls",
        oarType: "sculling",
        oarCount: 2,
        targetLengthCm: 286,
        targetInboardCm: 87,
        clickCm: 0.5,
        handleMechanism: "end-screw",
        boatIds: [homeBoatId],
      },
    ],
    expect: homeCoachOnRecord,
    why: "Saving Short-loom sculls with its own values and links: passes every guard, changes nothing.",
  },
  {
    file: fleetActions,
    action: "setOarSetArchivedAction",
    input: ({ homeOarSetId }) => ({ id: homeOarSetId, archived: false }),
    expect: homeCoachOnRecord,
    why: "Restoring Short-loom sculls, which is not archived: passes every guard, changes nothing.",
  },
  {
    file: fleetActions,
    action: "addRaceDayAction",
    input: ({ tag }) => ({ raceDay: localDay(400 + (tagNumber(tag) % 300)) }),
    expect: coachesOfAnyClub,
    why: "Coaches and admins add a race day to their own club's calendar: one more than a year ahead, so no set falls due because of it.",
  },
  {
    file: fleetActions,
    action: "removeRaceDayAction",
    input: () => ({ raceDay: "2001-01-01" }),
    expect: coachesOfAnyClub,
    why: "Removing a day that is not on the calendar: passes every guard, changes nothing.",
  },
  {
    file: fleetActions,
    action: "setHumidSpellAction",
    input: () => ({ humidSpell: false }),
    expect: coachesOfAnyClub,
    why: "Setting the humid spell to off, as it already is: passes every guard, changes nothing.",
  },
  {
    file: fleetActions,
    action: "sendDigestNowAction",
    args: () => [],
    expect: coachesOfAnyClub,
    why: "Coaches and admins send their own club's cleaning digest. No harmless way to succeed: it really mails the club's coaches and admins (the test outbox) and counts as this week's digest.",
  },
  {
    file: "app/(rig)/rig/care/actions.ts",
    action: "recordCleaningAction",
    input: ({ homeOarSetId }) => ({ oarSetId: homeOarSetId, cleanedOn: localDay(0), method: "wipe-down" }),
    expect: homeMembersOnRecord(200),
    why: "Any member records a cleaning of their own club's oar set (adds a record for today); the other club's members are told the set does not exist.",
  },
);

actionGuardRows.push(
  {
    file: "app/(club)/club/register/[id]/actions.ts",
    action: "revokeCertificateAction",
    args: ({ homeCertificateId }) => [homeCertificateId, { reason: "Guard row: already revoked." }],
    expect: { anonymous: 401, athlete: 403, otherAthlete: 404, coach: 403, otherCoach: 404, admin: 409, otherAdmin: 404 },
    why: "Admins revoke their own club's certificates. Iris's is revoked already, so the admin passes every guard and is told so (409): nothing changes. The home club's athlete and coach may not (403); the other club's members are told it does not exist.",
  },
  {
    file: "app/(club)/club/settings/actions.ts",
    action: "saveClubSettingsAction",
    input: () => settingsAsSeeded,
    expect: adminsOwnClub(200),
    why: "Each admin saves their own club's settings with the values it already has: passes every guard, nothing changes.",
  },
  {
    file: "app/(coach)/roster/athletes/[id]/actions.ts",
    action: "suspendClearanceAction",
    args: ({ homeSuspendedAthleteId }) => [homeSuspendedAthleteId, { reason: "Guard row: already suspended." }],
    expect: homeStaffOnAthleteRecord(409),
    why: "Coaches and admins of the athlete's club suspend a clearance. Hamish's is suspended already, so they pass every guard and are told so (409): nothing changes.",
  },
  {
    file: "app/(coach)/roster/athletes/[id]/actions.ts",
    action: "liftSuspensionAction",
    args: ({ homeAthleteId }) => [homeAthleteId, { note: "" }],
    expect: homeStaffOnAthleteRecord(409),
    why: "Coaches and admins of the athlete's club lift a suspension. Lena's clearance is not suspended, so they pass every guard and are told so (409): nothing changes.",
  },
  {
    file: "app/(coach)/roster/athletes/[id]/actions.ts",
    action: "reissueCertificatesAction",
    args: ({ homeAthleteId }) => [homeAthleteId, { name: "Lena Fairbrother" }],
    expect: { anonymous: 401, athlete: 404, otherAthlete: 404, coach: 403, otherCoach: 404, admin: 409, otherAdmin: 404 },
    why: "Admins of the athlete's club reissue certificates under a corrected name. Lena's passes have all expired, so the admin passes every guard and is told there is nothing to reissue (409). Her club's coach may see her record but not reissue (403); everyone else is told she does not exist.",
  },
  {
    file: "app/(coach)/roster/sign-offs/[id]/actions.ts",
    action: "recordAssessmentAction",
    args: ({ homeDecidedSignOffId }) => [homeDecidedSignOffId, settingInboardVerdicts],
    expect: homeStaffOnAthleteRecord(409),
    why: "Coaches and admins of the athlete's club (never the athlete) record a sign-off. Iris's was recorded already, so valid verdicts pass every guard and are told so (409): nothing is signed off.",
  },
);
