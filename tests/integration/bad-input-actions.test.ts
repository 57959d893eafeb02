import fs from "node:fs";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { QueryTypes } from "sequelize";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { createTempDataDir } from "@/tests/support/temp-data-dir";
import { installNextHeadersStandIn, withRequest } from "@/tests/support/request-scope";
import { sessionCookieFor } from "@/tests/support/call-route";
import { testOrigin } from "@/tests/support/auth-handler";

/**
 * The bad-input tables of the server actions (issue 6), the counterpart of tests/e2e/bad-input*.spec.ts
 * for the route handlers. Each action is called directly, as a caller who may use it, with at least 30
 * malformed inputs built from its schema: whole inputs that are not one object, missing, null, wrongly
 * typed, huge, blank and control-character fields, NaN, Infinity, negative and huge numbers, unknown and
 * prototype-ish keys, malformed positional ids and unknown ones. React's action protocol can deliver
 * undefined, NaN, Infinity, BigInt, Dates, Maps, Sets, FormData and files as well as JSON's values, so the
 * tables use them too. Every case must come back `{ ok: false }` with a message and `fieldErrors` naming
 * the field (`_` for the input as a whole), without throwing, logging an error or changing the database
 * (row counts and latest `updated_at` of every table, committed write transactions, the mail outbox).
 * After its table each action is given the valid input the cases vary, and must accept it: the
 * refusals were about the input, not the caller.
 */

vi.mock("next/headers", async () => (await import("@/tests/support/request-scope")).nextHeadersStandIn);
vi.mock("next/cache", () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));

const dataDir = createTempDataDir("bad-input-actions");
installNextHeadersStandIn();

const { closeDatabase, committedWrites, getSequelize } = await import("@/lib/db");
const { databaseReady } = await import("@/lib/data/database");
const { seedDemoClub, demoPassword } = await import("@/lib/seed/demo-club");
const { seedSecondClub, secondClubPassword } = await import("@/lib/seed/second-club");
const { demoOarSets, seedDemoFleet } = await import("@/lib/seed/demo-fleet");
const { seedDemoCertification } = await import("@/lib/seed/demo-certification");
const { localIsoDate } = await import("@/lib/care/calendar");
const { addDaysIso } = await import("@/lib/care/dates");
const { newToken, hashToken } = await import("@/lib/auth/tokens");
const { readClubSettings } = await import("@/lib/validations/club-settings");
const { settingsToForm } = await import("@/lib/validations/club-settings-form");
const { Boat, Certificate, Club, EmailChange, Invitation, OarSet, PracticalAssessment, User } = await import("@/models");

const careActions = await import("@/app/(rig)/rig/care/actions");
const learnActions = await import("@/app/(learn)/learn/[slug]/actions");
const athleteActions = await import("@/app/(coach)/roster/athletes/[id]/actions");
const signOffActions = await import("@/app/(coach)/roster/sign-offs/[id]/actions");
const fleetActions = await import("@/app/(coach)/roster/fleet/actions");
const signInActions = await import("@/app/(auth)/sign-in/actions");
const inviteActions = await import("@/app/(auth)/invite/[token]/actions");
const clubActions = await import("@/app/(club)/club/actions");
const registerActions = await import("@/app/(club)/club/register/[id]/actions");
const settingsActions = await import("@/app/(club)/club/settings/actions");
const memberActions = await import("@/app/(club)/club/members/actions");
const accountActions = await import("@/app/(account)/account/actions");
const confirmEmailActions = await import("@/app/(auth)/confirm-email/actions");

// ---------------------------------------------------------------------------------------------------
// Fixtures

type Caller = "anonymous" | "athlete" | "coach" | "admin";
const cookies: Partial<Record<Caller, string>> = {};

interface Fixtures {
  today: string;
  heronId: number;
  shortLoomId: number;
  greenBandId: number;
  grebeId: number;
  otherClubBoatId: number;
  otherClubOarSetId: number;
  otherClubAthleteId: number;
  /** Athletes of the demo club, one per table that changes a member, so no table's control changes another's subject. */
  lenaId: number;
  elinId: number;
  hamishId: number;
  kitId: number;
  devId: number;
  adaEmail: string;
  jonahWaitingSignOffId: string;
  femiCertificateId: string;
  emailChangeToken: string;
  invitationToken: string;
  /** An invitation the withdraw table's valid control withdraws, and one of the other club. */
  spareInvitationId: number;
  otherClubInvitationId: number;
  settingsAsStored: unknown;
}
let fx = {} as Fixtures;

async function homeUser(name: string) {
  return (await User.findOne({ where: { email: `${name}@lantern-reach.example` } }))!;
}

beforeAll(async () => {
  await databaseReady();
  await seedDemoClub(getSequelize());
  await seedSecondClub(getSequelize());
  await seedDemoFleet(getSequelize());
  await seedDemoCertification(getSequelize());
  cookies.athlete = await sessionCookieFor("ada@lantern-reach.example", demoPassword);
  cookies.coach = await sessionCookieFor("coach.tobias@lantern-reach.example", demoPassword);
  cookies.admin = await sessionCookieFor("admin@lantern-reach.example", demoPassword);
  await sessionCookieFor("admin@brackwater.example", secondClubPassword);

  const [admin, lena, hamish, kit, dev, jonah, femi, elin] = await Promise.all(
    ["admin", "lena", "hamish", "kit", "dev", "jonah", "femi", "elin"].map(homeUser),
  );
  // Elin's two module passes hold under the seeded name; correcting it gives reissueCertificatesAction work to do.
  await elin!.update({ name: "Elin Corrected-Spelling" });
  const otherAthlete = (await User.findOne({ where: { email: "athlete@brackwater.example" } }))!;
  // The second club has no fleet: one boat and one oar set of its own, for "a record of another club".
  const otherBoat = await Boat.create({
    clubId: otherAthlete.clubId,
    name: "Far-shore single",
    boatClass: "1x",
    spanCm: 160,
    spreadCm: null,
    notes: "",
  });
  const otherSet = await OarSet.create({
    clubId: otherAthlete.clubId,
    name: "Far-shore sculls",
    oarType: "sculling",
    oarCount: 2,
    targetLengthCm: 288,
    targetInboardCm: 88,
    clickCm: 0.5,
    handleMechanism: "clamped-slide",
    notes: "",
  });
  const boatNamed = async (name: string) => (await Boat.findOne({ where: { clubId: admin!.clubId, name } }))!.id;
  const setNamed = async (name: string) => (await OarSet.findOne({ where: { clubId: admin!.clubId, name } }))!.id;
  const invitationToken = newToken();
  // An admin started moving Bilal to another address; the confirm table's valid call uses the link.
  const emailChangeToken = newToken();
  const bilal = await homeUser("bilal");
  await EmailChange.create({
    userId: bilal!.id,
    newEmail: "bilal.moved@bad-input.example",
    // Started by the admin, so it is confirmed without Bilal's session (the caller is anonymous).
    requestedById: admin!.id,
    tokenHash: hashToken(emailChangeToken),
    expiresAt: new Date(Date.now() + 86_400_000),
  });
  await Invitation.create({
    clubId: admin!.clubId,
    invitedById: admin!.id,
    email: "new.member@bad-input.example",
    name: "Wren Halloway",
    role: "athlete",
    tokenHash: hashToken(invitationToken),
    expiresAt: new Date(Date.now() + 86_400_000),
  });
  const invitationFor = async (clubId: number, email: string) =>
    (
      await Invitation.create({
        clubId,
        invitedById: null,
        email,
        name: "Spare Invitation",
        role: "athlete",
        tokenHash: hashToken(newToken()),
        expiresAt: new Date(Date.now() + 86_400_000),
      })
    ).id;
  const spareInvitationId = await invitationFor(admin!.clubId, "spare.invitation@bad-input.example");
  const otherClubInvitationId = await invitationFor(otherAthlete.clubId, "other.invitation@bad-input.example");
  fx = {
    today: localIsoDate(),
    heronId: await boatNamed("Heron"),
    grebeId: await boatNamed("Grebe"),
    shortLoomId: await setNamed("Short-loom sculls"),
    greenBandId: await setNamed("Green-band sculls"),
    otherClubBoatId: otherBoat.id,
    otherClubOarSetId: otherSet.id,
    otherClubAthleteId: otherAthlete.id,
    lenaId: lena!.id,
    elinId: elin!.id,
    hamishId: hamish!.id,
    kitId: kit!.id,
    devId: dev!.id,
    adaEmail: "ada@lantern-reach.example",
    jonahWaitingSignOffId: (await PracticalAssessment.findOne({
      where: { athleteId: jonah!.id, moduleSlug: "grip-cleaning", status: "waiting" },
    }))!.id,
    femiCertificateId: (await Certificate.findOne({
      where: { athleteId: femi!.id, kind: "module", moduleSlug: "grip-cleaning", revokedAt: null },
    }))!.id,
    invitationToken,
    emailChangeToken,
    spareInvitationId,
    otherClubInvitationId,
    settingsAsStored: settingsToForm(readClubSettings((await Club.findByPk(admin!.clubId))!.settings)),
  };
  tables = await tablesOfTheDatabase();
});

afterAll(async () => {
  await closeDatabase();
});

// ---------------------------------------------------------------------------------------------------
// What "changed nothing" means: every table's row count and latest updated_at, the committed write
// transactions of this process, and the mail outbox.

let tables: { name: string; updatedAt: boolean }[] = [];

async function tablesOfTheDatabase() {
  const names = await getSequelize().query<{ name: string }>(
    "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'",
    {
      type: QueryTypes.SELECT,
    },
  );
  const result: { name: string; updatedAt: boolean }[] = [];
  for (const { name } of names) {
    const columns = await getSequelize().query<{ name: string }>(`PRAGMA table_info("${name}")`, { type: QueryTypes.SELECT });
    result.push({ name, updatedAt: columns.some((column) => column.name === "updated_at") });
  }
  return result;
}

async function fingerprint(): Promise<string> {
  const select = tables
    .map(
      ({ name, updatedAt }) =>
        `(SELECT count(*)${updatedAt ? ` || ' ' || coalesce(max(updated_at), '')` : ""} FROM "${name}") AS "${name}"`,
    )
    .join(", ");
  const [counts] = await getSequelize().query(`SELECT ${select}`, { type: QueryTypes.SELECT });
  const outbox = path.join(dataDir, "outbox");
  const mails = fs.existsSync(outbox) ? fs.readdirSync(outbox).length : 0;
  return JSON.stringify({ writes: committedWrites(), mails, counts });
}

// ---------------------------------------------------------------------------------------------------
// The runner

interface BadCase {
  label: string;
  /** Every argument of the call, in order. */
  args: unknown[];
  /** The field the refusal must name: a key of fieldErrors, or a prefix of one ("limits" for "limits.sweep.maxLengthCm"). */
  field: string;
}

type Outcome = { ok: boolean; message?: unknown; fieldErrors?: Record<string, unknown> };
type AnyAction = (...args: unknown[]) => Promise<unknown>;

let addressCounter = 0;

function callAs<T>(caller: Caller, work: () => Promise<T>): Promise<T> {
  addressCounter += 1;
  const headers: Record<string, string> = { "x-forwarded-for": `203.0.113.${addressCounter % 250}` };
  const cookie = cookies[caller];
  if (cookie) headers.cookie = cookie;
  return withRequest(new Request(`${testOrigin}/`, { headers }), work);
}

function describeThrown(thrown: unknown): string {
  const digest = (thrown as { digest?: unknown } | null)?.digest;
  if (typeof digest === "string") return digest;
  return thrown instanceof Error ? `${thrown.name}: ${thrown.message}` : String(thrown);
}

type OutcomeCheck = (bad: BadCase, answer: unknown, thrown?: unknown) => string[];

function outcomeProblems(bad: BadCase, answer: unknown, thrown?: unknown): string[] {
  if (thrown !== undefined) return [`${bad.label}: threw ${describeThrown(thrown)}`];
  const outcome = answer as Outcome | undefined;
  if (!outcome || typeof outcome !== "object") return [`${bad.label}: answered ${String(answer)}`];
  if (outcome.ok !== false) return [`${bad.label}: accepted (${String(outcome.message)})`];
  const problems: string[] = [];
  if (typeof outcome.message !== "string" || outcome.message.trim() === "") problems.push(`${bad.label}: no message`);
  const fields = outcome.fieldErrors ?? {};
  const keys = Object.keys(fields);
  if (!keys.some((key) => key === bad.field || key.startsWith(`${bad.field}.`))) {
    problems.push(`${bad.label}: does not name "${bad.field}": ${String(outcome.message)} ${JSON.stringify(keys)}`);
  }
  for (const [key, messages] of Object.entries(fields)) {
    if (!Array.isArray(messages) || messages.length === 0 || messages.some((message) => typeof message !== "string" || message === "")) {
      problems.push(`${bad.label}: no message for ${key}`);
    }
  }
  if (/\bat .+\.(js|ts):\d+/.test(JSON.stringify(outcome))) problems.push(`${bad.label}: a stack trace in the answer`);
  return problems;
}

/** Runs every case and collects what went wrong, so one failure lists them all. */
async function refusalProblems(
  action: AnyAction,
  caller: Caller,
  cases: BadCase[],
  check: OutcomeCheck = outcomeProblems,
): Promise<string[]> {
  const problems: string[] = [];
  const logged = vi.spyOn(console, "error");
  try {
    for (const bad of cases) {
      const before = await fingerprint();
      const logsBefore = logged.mock.calls.length;
      try {
        problems.push(...check(bad, await callAs(caller, () => action(...bad.args))));
      } catch (thrown) {
        problems.push(...check(bad, undefined, thrown));
      }
      if ((await fingerprint()) !== before) problems.push(`${bad.label}: changed the database or the outbox`);
      for (const call of logged.mock.calls.slice(logsBefore)) problems.push(`${bad.label}: logged ${String(call[0])}`);
    }
  } finally {
    logged.mockRestore();
  }
  return problems;
}

function actionOf(action: unknown): AnyAction {
  return action as AnyAction;
}

/**
 * One table: every case refused as described above, then the valid arguments the cases vary accepted
 * (`accepts` checks the answer).
 */
function table(label: string, options: { action: unknown; as: Caller; cases: () => BadCase[]; valid: () => unknown[] }) {
  it(`${label} refuses every malformed input, naming its field, and accepts the valid one`, async () => {
    const cases = options.cases();
    expect(cases.length, "cases in the table").toBeGreaterThanOrEqual(30);
    const problems = await refusalProblems(actionOf(options.action), options.as, cases);
    expect(problems, problems.join("\n")).toEqual([]);
    const control = (await callAs(options.as, () => actionOf(options.action)(...options.valid()))) as Outcome;
    expect(control, JSON.stringify(control)).toMatchObject({ ok: true });
  });
}

// ---------------------------------------------------------------------------------------------------
// Case builders

const huge = "x".repeat(70_000);

type Input = Record<string, unknown>;

interface Variant {
  label: string;
  input: unknown;
  field: string;
}

/** Whole inputs that are not one plain object, each refused as a whole ("_"). */
function notOneObject(valid: Input): Variant[] {
  const form = new FormData();
  for (const [key, value] of Object.entries(valid)) form.set(key, typeof value === "object" ? JSON.stringify(value) : String(value));
  const values: [string, unknown][] = [
    ["undefined", undefined],
    ["null", null],
    ["a string", "hello"],
    ["an empty string", ""],
    ["the input as JSON text", JSON.stringify(valid)],
    ["a number", 42],
    ["NaN", Number.NaN],
    ["true", true],
    ["a BigInt", 1n],
    ["an empty array", []],
    ["an array holding the input", [valid]],
    ["a Map of the fields", new Map(Object.entries(valid))],
    ["a Set", new Set([valid])],
    ["a Date", new Date()],
    ["FormData of the fields", form],
    ["a file", new File([JSON.stringify(valid)], "input.json", { type: "application/json" })],
  ];
  return values.map(([label, input]) => ({ label: `input is ${label}`, input, field: "_" }));
}

/** The object with an own "__proto__" key first, as JSON.parse (and React's action protocol) makes one. */
function withProtoKey(valid: object, value: unknown): unknown {
  const rest = JSON.stringify(valid).slice(1);
  return JSON.parse(`{"__proto__": ${JSON.stringify(value)}${rest === "}" ? "" : ","}${rest}`) as unknown;
}

/** Unknown and prototype-ish keys beside valid fields, each named; an empty object names `emptyObject`. */
function strayKeys(valid: Input, emptyObject: string): Variant[] {
  return [
    { label: "empty object", input: {}, field: emptyObject },
    { label: "an extra field", input: { ...valid, sneaky: true }, field: "sneaky" },
    { label: "a huge extra field", input: { ...valid, padding: huge }, field: "padding" },
    { label: "a __proto__ key", input: withProtoKey(valid, { admin: true }), field: "__proto__" },
    { label: "a constructor key", input: { ...valid, constructor: { prototype: { admin: true } } }, field: "constructor" },
    { label: "an id key", input: { ...valid, id: 1 }, field: "id" },
  ].filter((variant) => !Object.hasOwn(valid, variant.field));
}

type FieldKind =
  "text" | "name" | "choice" | "date" | "email" | "token" | "password" | "number" | "integer" | "id" | "boolean" | "list" | "object";

interface FieldSpec {
  kind: FieldKind;
  /** May be left out (it has a default, or the rules need it only sometimes). */
  optional?: boolean;
  /** An empty string is a valid value (an optional note). */
  blankAllowed?: boolean;
}

/** The generic malformed values of each field, every other field valid. */
function fieldVariants(valid: Input, specs: Record<string, FieldSpec>): Variant[] {
  const variants: Variant[] = [];
  for (const [key, spec] of Object.entries(specs)) {
    const add = (label: string, value: unknown) =>
      variants.push({ label: `${key} ${label}`, input: { ...valid, [key]: value }, field: key });
    if (!spec.optional) {
      const rest = { ...valid };
      delete rest[key];
      variants.push({ label: `missing ${key}`, input: rest, field: key });
    }
    add("null", null);
    if (spec.kind !== "list") add("an array", [valid[key]]);
    if (spec.kind !== "object") add("an object", { value: valid[key] });
    const text = String(valid[key]);
    switch (spec.kind) {
      case "text":
      case "name":
      case "choice":
      case "date":
      case "email":
      case "token":
      case "password":
        add("a number", 42);
        add("true", true);
        add("a huge string", huge);
        if (!spec.blankAllowed) add("empty", "");
        if (!spec.blankAllowed && (spec.kind === "text" || spec.kind === "name")) add("only spaces", "   ");
        if (spec.kind !== "password") add("with a NUL", `${text}\u0000`);
        if (spec.kind === "text" || spec.kind === "name") add("with a terminal escape", `${text}\u001b[2J`);
        if (spec.kind === "name") add("with a line break inside", `${text}\nsecond line`);
        break;
      case "number":
      case "integer":
      case "id":
        add("a numeric string", text);
        add('"NaN"', "NaN");
        add("NaN", Number.NaN);
        add("Infinity", Number.POSITIVE_INFINITY);
        add("-Infinity", Number.NEGATIVE_INFINITY);
        add("negative", -1);
        add("huge", 1e308);
        add("a BigInt", 1n);
        add("true", true);
        if (spec.kind !== "number") add("a fraction", Number(valid[key]) + 0.5);
        if (spec.kind === "id") {
          add("zero", 0);
          add("an unknown id", 999_999);
        }
        break;
      case "boolean":
        add('"true"', "true");
        add('"false"', "false");
        add("1", 1);
        add("0", 0);
        break;
      case "list":
        add("a string", "x");
        add("an object", {});
        add("a Set", new Set(valid[key] as unknown[]));
        add("holding null", [null]);
        add("holding a huge string", [huge]);
        break;
      case "object":
        add("a string", "x");
        add("empty", {});
        break;
    }
  }
  return variants;
}

/** Malformed values of a numeric id passed as a positional argument; `unknown` are well-formed ids of no record the caller may use. */
function numericIdVariants(name: string, validId: number, unknown: [string, number][]): Variant[] {
  const values: [string, unknown][] = [
    ["a numeric string", String(validId)],
    ["a word", "heron"],
    ["an empty string", ""],
    ["NaN", Number.NaN],
    ["Infinity", Number.POSITIVE_INFINITY],
    ["negative", -validId],
    ["zero", 0],
    ["a fraction", validId + 0.5],
    ["huge", 1e308],
    ["past the largest id", 2 ** 31],
    ["null", null],
    ["undefined", undefined],
    ["true", true],
    ["an array holding it", [validId]],
    ["an object holding it", { id: validId }],
    ["a BigInt", BigInt(validId)],
    ["a Date", new Date(validId)],
    ["with a NUL", `${validId}\u0000`],
    ["a huge string", huge],
  ];
  return [
    ...values.map(([label, input]) => ({ label: `${name} ${label}`, input, field: name })),
    ...unknown.map(([label, input]) => ({ label: `${name} ${label}`, input, field: name })),
  ];
}

/** Malformed values of a UUID passed as a positional argument, and a well-formed unknown one. */
function uuidVariants(name: string, validId: string): Variant[] {
  const values: [string, unknown][] = [
    ["not a UUID", "not-a-uuid"],
    ["an empty string", ""],
    ["a number", 42],
    ["NaN", Number.NaN],
    ["null", null],
    ["undefined", undefined],
    ["true", true],
    ["an object", { id: validId }],
    ["an array holding it", [validId]],
    ["with a NUL", `${validId}\u0000`],
    ["with a trailing space", `${validId} `],
    ["in braces", `{${validId}}`],
    ["cut short", validId.slice(0, -1)],
    ["a huge string", huge],
    ["an unknown UUID", randomUUID()],
  ];
  return values.map(([label, input]) => ({ label: `${name} ${label}`, input, field: name }));
}

/** Cases of a one-argument action from variants of its input. */
function single(variants: Variant[]): BadCase[] {
  return variants.map(({ label, input, field }) => ({ label, args: [input], field }));
}

/** Cases of an (id, input) action: malformed ids with the valid input, then malformed inputs with the valid id. */
function pair(validId: unknown, validInput: unknown, idVariants: Variant[], inputVariants: Variant[]): BadCase[] {
  return [
    ...idVariants.map(({ label, input, field }) => ({ label, args: [input, validInput], field })),
    ...inputVariants.map(({ label, input, field }) => ({ label, args: [validId, input], field })),
  ];
}

function objectVariants(valid: Input, emptyObject: string, specs: Record<string, FieldSpec>, specific: Variant[] = []): Variant[] {
  return [...notOneObject(valid), ...strayKeys(valid, emptyObject), ...fieldVariants(valid, specs), ...specific];
}

function v(label: string, input: unknown, field: string): Variant {
  return { label, input, field };
}

// ---------------------------------------------------------------------------------------------------
// The fleet (coach)

const validBoat = () => ({ name: "Dabchick", boatClass: "1x", spanCm: 160, notes: "" });
const heronAsSeeded = () => ({ name: "Heron", boatClass: "1x", spanCm: 160, notes: "Learn-to-scull single, wide and stable." });
const boatSpecs: Record<string, FieldSpec> = {
  name: { kind: "name" },
  boatClass: { kind: "choice" },
  spanCm: { kind: "number" },
  notes: { kind: "text", optional: true, blankAllowed: true },
};

function boatVariants(valid: Input): Variant[] {
  return objectVariants(valid, "name", boatSpecs, [
    v("name too long", { ...valid, name: "n".repeat(81) }, "name"),
    v("boatClass unknown", { ...valid, boatClass: "9x" }, "boatClass"),
    v("boatClass in capitals", { ...valid, boatClass: "1X" }, "boatClass"),
    v("spanCm below a boat's", { ...valid, spanCm: 139.9 }, "spanCm"),
    v("spanCm above a boat's", { ...valid, spanCm: 180.1 }, "spanCm"),
    v("spreadCm on a sculling boat", { ...valid, spreadCm: 84 }, "spreadCm"),
    v("a sweep boat with a span", { ...valid, boatClass: "8+" }, "spreadCm"),
    v("notes too long", { ...valid, notes: "n".repeat(501) }, "notes"),
    v("another active boat's name", { ...valid, name: "Grebe" }, "name"),
  ]);
}

const validOarSet = (fixtures: Fixtures) => ({
  name: "Spare sculls",
  oarType: "sculling",
  oarCount: 2,
  targetLengthCm: 288,
  targetInboardCm: 88,
  clickCm: 0.5,
  handleMechanism: "clamped-slide",
  boatIds: [fixtures.heronId],
  notes: "",
});
/** The seeded short-loom sculls (lib/seed/demo-fleet.ts) as the edit form sends them, still linked to Heron only. */
const shortLoomAsSeeded = (fixtures: Fixtures) => {
  const { name, oarType, oarCount, targetLengthCm, targetInboardCm, clickCm, handleMechanism } = demoOarSets.find(
    (set) => set.name === "Short-loom sculls",
  )!;
  return { name, oarType, oarCount, targetLengthCm, targetInboardCm, clickCm, handleMechanism, boatIds: [fixtures.heronId] };
};
const oarSetSpecs: Record<string, FieldSpec> = {
  name: { kind: "name" },
  oarType: { kind: "choice" },
  oarCount: { kind: "integer" },
  targetLengthCm: { kind: "number" },
  targetInboardCm: { kind: "number" },
  clickCm: { kind: "number" },
  handleMechanism: { kind: "choice" },
  boatIds: { kind: "list", optional: true },
  notes: { kind: "text", optional: true, blankAllowed: true },
};

function oarSetVariants(valid: Input, fixtures: Fixtures): Variant[] {
  return objectVariants(valid, "name", oarSetSpecs, [
    v("oarCount zero", { ...valid, oarCount: 0 }, "oarCount"),
    v("oarCount over 40", { ...valid, oarCount: 41 }, "oarCount"),
    v("targetLengthCm a sweep oar's for sculls", { ...valid, targetLengthCm: 372 }, "targetLengthCm"),
    v("targetLengthCm zero", { ...valid, targetLengthCm: 0 }, "targetLengthCm"),
    v("targetInboardCm half the length", { ...valid, targetInboardCm: 144 }, "targetInboardCm"),
    v("clickCm zero", { ...valid, clickCm: 0 }, "clickCm"),
    v("clickCm over 2", { ...valid, clickCm: 2.5 }, "clickCm"),
    v("handleMechanism unknown", { ...valid, handleMechanism: "glue" }, "handleMechanism"),
    v("boatIds repeating a boat", { ...valid, boatIds: [fixtures.heronId, fixtures.heronId] }, "boatIds"),
    v("boatIds holding a numeric string", { ...valid, boatIds: [String(fixtures.heronId)] }, "boatIds"),
    v("boatIds holding NaN", { ...valid, boatIds: [Number.NaN] }, "boatIds"),
    v("boatIds holding a negative id", { ...valid, boatIds: [-1] }, "boatIds"),
    v("boatIds holding a huge id", { ...valid, boatIds: [1e308] }, "boatIds"),
    v("boatIds over 60", { ...valid, boatIds: Array.from({ length: 61 }, (_, index) => index + 1) }, "boatIds"),
    v("boatIds an unknown boat", { ...valid, boatIds: [999_999] }, "boatIds"),
    v("boatIds another club's boat", { ...valid, boatIds: [fixtures.otherClubBoatId] }, "boatIds"),
    v("boatIds a sweep boat for sculls", { ...valid, boatIds: [fixtures.grebeId] }, "boatIds"),
    v("another active set's name", { ...valid, name: "Eight sweeps" }, "name"),
  ]);
}

function archiveVariants(validId: number, otherClubId: number): Variant[] {
  const valid = { id: validId, archived: false };
  return objectVariants(valid, "id", { id: { kind: "id" }, archived: { kind: "boolean" } }, [
    v("id of another club's record", { ...valid, id: otherClubId }, "id"),
    v("id past the largest id", { ...valid, id: 2 ** 31 }, "id"),
  ]);
}

const dateVariants = (key: string, valid: Input): Variant[] => [
  v(`${key} 30 February`, { ...valid, [key]: "2026-02-30" }, key),
  v(`${key} month 13`, { ...valid, [key]: "2026-13-01" }, key),
  v(`${key} without leading zeros`, { ...valid, [key]: "2026-1-5" }, key),
  v(`${key} with a time`, { ...valid, [key]: `${String(valid[key])}T10:00:00Z` }, key),
  v(`${key} in words`, { ...valid, [key]: "tomorrow" }, key),
  v(`${key} day first`, { ...valid, [key]: "05/01/2026" }, key),
  v(`${key} a Date`, { ...valid, [key]: new Date() }, key),
  v(`${key} a timestamp`, { ...valid, [key]: Date.now() }, key),
];

describe("the fleet's actions (as a coach)", () => {
  table("createBoatAction", {
    action: fleetActions.createBoatAction,
    as: "coach",
    cases: () => single(boatVariants(validBoat())),
    valid: () => [validBoat()],
  });

  table("updateBoatAction", {
    action: fleetActions.updateBoatAction,
    as: "coach",
    cases: () =>
      pair(
        fx.heronId,
        heronAsSeeded(),
        numericIdVariants("boatId", fx.heronId, [
          ["unknown", 999_999],
          ["of another club", fx.otherClubBoatId],
        ]),
        boatVariants(heronAsSeeded()),
      ),
    valid: () => [fx.heronId, heronAsSeeded()],
  });

  table("setBoatArchivedAction", {
    action: fleetActions.setBoatArchivedAction,
    as: "coach",
    cases: () => single(archiveVariants(fx.heronId, fx.otherClubBoatId)),
    valid: () => [{ id: fx.heronId, archived: false }],
  });

  table("createOarSetAction", {
    action: fleetActions.createOarSetAction,
    as: "coach",
    cases: () => single(oarSetVariants(validOarSet(fx), fx)),
    valid: () => [validOarSet(fx)],
  });

  table("updateOarSetAction", {
    action: fleetActions.updateOarSetAction,
    as: "coach",
    cases: () =>
      pair(
        fx.shortLoomId,
        shortLoomAsSeeded(fx),
        numericIdVariants("oarSetId", fx.shortLoomId, [
          ["unknown", 999_999],
          ["of another club", fx.otherClubOarSetId],
        ]),
        oarSetVariants(shortLoomAsSeeded(fx), fx),
      ),
    valid: () => [fx.shortLoomId, shortLoomAsSeeded(fx)],
  });

  table("setOarSetArchivedAction", {
    action: fleetActions.setOarSetArchivedAction,
    as: "coach",
    cases: () => single(archiveVariants(fx.shortLoomId, fx.otherClubOarSetId)),
    valid: () => [{ id: fx.shortLoomId, archived: false }],
  });

  const validRaceDay = () => ({ raceDay: addDaysIso(fx.today, 400) });
  table("addRaceDayAction", {
    action: fleetActions.addRaceDayAction,
    as: "coach",
    cases: () =>
      single(
        objectVariants(validRaceDay(), "raceDay", { raceDay: { kind: "date" } }, [
          ...dateVariants("raceDay", validRaceDay()),
          v("raceDay yesterday", { raceDay: addDaysIso(fx.today, -1) }, "raceDay"),
          v("raceDay over two years ahead", { raceDay: addDaysIso(fx.today, 800) }, "raceDay"),
          v("raceDay in year 0000", { raceDay: "0000-01-01" }, "raceDay"),
        ]),
      ),
    valid: () => [validRaceDay()],
  });

  table("removeRaceDayAction", {
    action: fleetActions.removeRaceDayAction,
    as: "coach",
    cases: () =>
      single(
        objectVariants(
          { raceDay: "2001-01-01" },
          "raceDay",
          { raceDay: { kind: "date" } },
          dateVariants("raceDay", { raceDay: "2001-01-01" }),
        ),
      ),
    valid: () => [{ raceDay: "2001-01-01" }],
  });

  table("setHumidSpellAction", {
    action: fleetActions.setHumidSpellAction,
    as: "coach",
    cases: () =>
      single(
        objectVariants({ humidSpell: false }, "humidSpell", { humidSpell: { kind: "boolean" } }, [
          v('humidSpell "on"', { humidSpell: "on" }, "humidSpell"),
        ]),
      ),
    valid: () => [{ humidSpell: false }],
  });

  // It takes no input, like GET /api/me/progress: any argument is refused as a whole.
  table("sendDigestNowAction", {
    action: fleetActions.sendDigestNowAction,
    as: "coach",
    cases: () => [
      ...single(notOneObject({ week: "2026-W01" })),
      ...single(strayKeys({}, "_").map((variant) => ({ ...variant, field: "_" }))),
      { label: "two arguments", args: [{}, {}], field: "_" },
      { label: "an object naming a club", args: [{ clubId: 1 }], field: "_" },
      { label: "an object naming a week", args: [{ isoWeek: "2026-W01" }], field: "_" },
      { label: "FormData of nothing", args: [new FormData()], field: "_" },
      { label: "a huge string", args: [huge], field: "_" },
      { label: "Infinity", args: [Number.POSITIVE_INFINITY], field: "_" },
      { label: "a negative number", args: [-1], field: "_" },
      { label: "an array of ids", args: [[1, 2, 3]], field: "_" },
    ],
    valid: () => [],
  });
});

// ---------------------------------------------------------------------------------------------------
// The grip-cleaning log (athlete)

describe("the grip-cleaning log (as an athlete)", () => {
  const validCleaning = () => ({ oarSetId: fx.greenBandId, cleanedOn: fx.today, method: "wipe-down", note: "" });
  table("recordCleaningAction", {
    action: careActions.recordCleaningAction,
    as: "athlete",
    cases: () =>
      single(
        objectVariants(
          validCleaning(),
          "oarSetId",
          {
            oarSetId: { kind: "id" },
            cleanedOn: { kind: "date" },
            method: { kind: "choice" },
            note: { kind: "text", optional: true, blankAllowed: true },
          },
          [
            ...dateVariants("cleanedOn", validCleaning()),
            v("oarSetId of another club", { ...validCleaning(), oarSetId: fx.otherClubOarSetId }, "oarSetId"),
            v("cleanedOn tomorrow", { ...validCleaning(), cleanedOn: addDaysIso(fx.today, 1) }, "cleanedOn"),
            v("cleanedOn over a year ago", { ...validCleaning(), cleanedOn: addDaysIso(fx.today, -367) }, "cleanedOn"),
            v("method unknown", { ...validCleaning(), method: "pressure-washer" }, "method"),
            v('method "other" without a note', { ...validCleaning(), method: "other", note: " " }, "note"),
            v("note too long", { ...validCleaning(), note: "n".repeat(301) }, "note"),
            v("cleanedById a string", { ...validCleaning(), cleanedById: "me" }, "cleanedById"),
            v("cleanedById NaN", { ...validCleaning(), cleanedById: Number.NaN }, "cleanedById"),
            v("cleanedById negative", { ...validCleaning(), cleanedById: -4 }, "cleanedById"),
            v("cleanedById huge", { ...validCleaning(), cleanedById: 1e308 }, "cleanedById"),
            v("cleanedById null", { ...validCleaning(), cleanedById: null }, "cleanedById"),
            v("cleanedById unknown", { ...validCleaning(), cleanedById: 999_999 }, "cleanedById"),
            v("cleanedById of another club", { ...validCleaning(), cleanedById: fx.otherClubAthleteId }, "cleanedById"),
          ],
        ),
      ),
    valid: () => [validCleaning()],
  });
});

// ---------------------------------------------------------------------------------------------------
// Clearance, sign-offs and certificates

const validReason = () => ({ reason: "Rigged a boat without a coach on the landing stage." });

describe("clearance and sign-offs (as a coach)", () => {
  const reasonVariants = (valid: Input): Variant[] =>
    objectVariants(valid, "reason", { reason: { kind: "text" } }, [
      v("reason of two characters", { reason: "ab" }, "reason"),
      v("reason too long", { reason: "r".repeat(501) }, "reason"),
      v("reason of spaces around two characters", { reason: "  ab  " }, "reason"),
    ]);
  const athleteIdVariants = (validId: number) =>
    numericIdVariants("athleteId", validId, [
      ["unknown", 999_999],
      ["of another club", fx.otherClubAthleteId],
    ]);

  table("suspendClearanceAction", {
    action: athleteActions.suspendClearanceAction,
    as: "coach",
    cases: () => pair(fx.lenaId, validReason(), athleteIdVariants(fx.lenaId), reasonVariants(validReason())),
    valid: () => [fx.lenaId, validReason()],
  });

  const validReissue = () => ({ name: "Elin Corrected-Spelling" });
  table("reissueCertificatesAction", {
    action: athleteActions.reissueCertificatesAction,
    as: "admin",
    cases: () =>
      pair(
        fx.elinId,
        validReissue(),
        athleteIdVariants(fx.elinId),
        objectVariants(validReissue(), "name", { name: { kind: "name" } }, [
          v("name too long", { name: "n".repeat(121) }, "name"),
          v("name on two lines", { name: "Elin\nCorrected-Spelling" }, "name"),
        ]),
      ),
    valid: () => [fx.elinId, validReissue()],
  });

  const validLift = () => ({ note: "Talked it through; rigs with a partner for a week." });
  table("liftSuspensionAction", {
    action: athleteActions.liftSuspensionAction,
    as: "coach",
    cases: () =>
      pair(
        fx.hamishId,
        validLift(),
        athleteIdVariants(fx.hamishId),
        objectVariants(validLift(), "_", { note: { kind: "text", optional: true, blankAllowed: true } }, [
          v("note too long", { note: "n".repeat(501) }, "note"),
        ]).filter((variant) => variant.label !== "empty object"),
      ),
    valid: () => [fx.hamishId, validLift()],
  });

  const gripItems = { "wears-protection": "met", "chooses-soft-brush": "met", "rinses-and-dries": "met", "reports-torn-grip": "met" };
  const validAssessment = () => ({ items: { ...gripItems }, note: "", evidenceIds: [] as string[] });
  table("recordAssessmentAction", {
    action: signOffActions.recordAssessmentAction,
    as: "coach",
    cases: () =>
      pair(
        fx.jonahWaitingSignOffId,
        validAssessment(),
        uuidVariants("assessmentId", fx.jonahWaitingSignOffId),
        objectVariants(
          validAssessment(),
          "items",
          { items: { kind: "object" }, note: { kind: "text", blankAllowed: true }, evidenceIds: { kind: "list", optional: true } },
          [
            v(
              "items missing one verdict",
              { ...validAssessment(), items: { ...gripItems, "reports-torn-grip": undefined } },
              "items.reports-torn-grip",
            ),
            v(
              "items with another module's item",
              { ...validAssessment(), items: { ...gripItems, "plans-clicks": "met" } },
              "items.plans-clicks",
            ),
            v("items with a __proto__ key", { ...validAssessment(), items: withProtoKey(gripItems, "met") }, "items.__proto__"),
            v(
              "a verdict that is no verdict",
              { ...validAssessment(), items: { ...gripItems, "wears-protection": "passed" } },
              "items.wears-protection",
            ),
            v("a verdict true", { ...validAssessment(), items: { ...gripItems, "wears-protection": true } }, "items.wears-protection"),
            v("a verdict null", { ...validAssessment(), items: { ...gripItems, "wears-protection": null } }, "items.wears-protection"),
            v("a verdict huge", { ...validAssessment(), items: { ...gripItems, "wears-protection": huge } }, "items.wears-protection"),
            v("items an array of verdicts", { ...validAssessment(), items: Object.values(gripItems) }, "items"),
            v("items a Map", { ...validAssessment(), items: new Map(Object.entries(gripItems)) }, "items"),
            v('a "not yet" without a note', { ...validAssessment(), items: { ...gripItems, "rinses-and-dries": "not-yet" } }, "note"),
            v("note too long", { ...validAssessment(), note: "n".repeat(2001) }, "note"),
            v("evidenceIds holding no UUID", { ...validAssessment(), evidenceIds: ["photo-1"] }, "evidenceIds"),
            v("evidenceIds holding a number", { ...validAssessment(), evidenceIds: [7] }, "evidenceIds"),
            v(
              "evidenceIds over three",
              { ...validAssessment(), evidenceIds: [randomUUID(), randomUUID(), randomUUID(), randomUUID()] },
              "evidenceIds",
            ),
            v("evidenceIds an unknown photo", { ...validAssessment(), evidenceIds: [randomUUID()] }, "evidenceIds"),
          ],
        ),
      ),
    valid: () => [fx.jonahWaitingSignOffId, validAssessment()],
  });
});

describe("certificates (as an admin)", () => {
  table("revokeCertificateAction", {
    action: registerActions.revokeCertificateAction,
    as: "admin",
    cases: () =>
      pair(
        fx.femiCertificateId,
        validReason(),
        uuidVariants("certificateId", fx.femiCertificateId),
        objectVariants(validReason(), "reason", { reason: { kind: "text" } }, [
          v("reason of two characters", { reason: "ab" }, "reason"),
          v("reason too long", { reason: "r".repeat(501) }, "reason"),
        ]),
      ),
    valid: () => [fx.femiCertificateId, validReason()],
  });
});

// ---------------------------------------------------------------------------------------------------
// The club (admin)

describe("the club's administration (as an admin)", () => {
  const validInvitation = () => ({ email: "new.rower@invite-action.example", name: "Rowan Ashby", role: "athlete" });
  table("inviteMemberAction", {
    action: clubActions.inviteMemberAction,
    as: "admin",
    cases: () =>
      single(
        objectVariants(validInvitation(), "email", { email: { kind: "email" }, name: { kind: "name" }, role: { kind: "choice" } }, [
          v("email without a domain", { ...validInvitation(), email: "rowan@" }, "email"),
          v("email with two at signs", { ...validInvitation(), email: "rowan@@invite-action.example" }, "email"),
          v("email with spaces", { ...validInvitation(), email: "rowan ashby@invite-action.example" }, "email"),
          v("email over 254 characters", { ...validInvitation(), email: `${"r".repeat(60)}@${"d".repeat(200)}.example` }, "email"),
          v("email of an existing member", { ...validInvitation(), email: fx.adaEmail }, "email"),
          v("name too long", { ...validInvitation(), name: "n".repeat(121) }, "name"),
          v("role unknown", { ...validInvitation(), role: "captain" }, "role"),
          v("role in capitals", { ...validInvitation(), role: "ATHLETE" }, "role"),
        ]),
      ),
    valid: () => [validInvitation()],
  });

  table("withdrawInvitationAction", {
    action: clubActions.withdrawInvitationAction,
    as: "admin",
    cases: () =>
      single(
        objectVariants({ invitationId: fx.spareInvitationId }, "invitationId", { invitationId: { kind: "id" } }, [
          v("invitationId of another club", { invitationId: fx.otherClubInvitationId }, "invitationId"),
          v("invitationId unknown", { invitationId: 2_147_480_000 }, "invitationId"),
          v("invitationId past the largest id", { invitationId: 2 ** 31 }, "invitationId"),
          v("invitationId in hexadecimal", { invitationId: `0x${fx.spareInvitationId.toString(16)}` }, "invitationId"),
          v("invitationId with spaces", { invitationId: ` ${fx.spareInvitationId} ` }, "invitationId"),
          v("an email instead of the id", { invitationId: fx.spareInvitationId, email: "spare.invitation@bad-input.example" }, "email"),
        ]),
      ),
    valid: () => [{ invitationId: fx.spareInvitationId }],
  });

  const settings = () => structuredClone(fx.settingsAsStored) as Input & { limits: { sculling: Input; sweep: Input } };
  const withSculling = (change: Input) => {
    const value = settings();
    value.limits.sculling = { ...value.limits.sculling, ...change };
    return value;
  };
  table("saveClubSettingsAction", {
    action: settingsActions.saveClubSettingsAction,
    as: "admin",
    cases: () =>
      single(
        objectVariants(
          settings(),
          "passMarkPercent",
          {
            passMarkPercent: { kind: "integer" },
            clickCm: { kind: "number" },
            halfSwivelCm: { kind: "number" },
            clearanceModules: { kind: "list" },
            clearanceMonths: { kind: "integer" },
            limits: { kind: "object" },
            timeZone: { kind: "choice" },
          },
          [
            v("timeZone unknown to Intl", { ...settings(), timeZone: "Mars/Olympus_Mons" }, "timeZone"),
            v("timeZone an offset written by hand", { ...settings(), timeZone: "GMT+25:00" }, "timeZone"),
            v("passMarkPercent under 50", { ...settings(), passMarkPercent: 49 }, "passMarkPercent"),
            v("passMarkPercent over 100", { ...settings(), passMarkPercent: 101 }, "passMarkPercent"),
            v("passMarkPercent as a fraction of one", { ...settings(), passMarkPercent: 0.8 }, "passMarkPercent"),
            v("clickCm over 2", { ...settings(), clickCm: 3 }, "clickCm"),
            v("halfSwivelCm over 5", { ...settings(), halfSwivelCm: 6 }, "halfSwivelCm"),
            v("clearanceMonths over 60", { ...settings(), clearanceMonths: 61 }, "clearanceMonths"),
            v("clearanceModules empty", { ...settings(), clearanceModules: [] }, "clearanceModules"),
            v("clearanceModules an unknown module", { ...settings(), clearanceModules: ["sculling-backwards"] }, "clearanceModules"),
            v("clearanceModules a title, not a slug", { ...settings(), clearanceModules: ["Overall length"] }, "clearanceModules"),
            v(
              "clearanceModules over 30",
              { ...settings(), clearanceModules: Array.from({ length: 31 }, () => "overall-length") },
              "clearanceModules",
            ),
            v("clearanceModules holding a huge slug", { ...settings(), clearanceModules: ["a".repeat(5000)] }, "clearanceModules"),
            v("limits without sweep", { ...settings(), limits: { sculling: settings().limits.sculling } }, "limits.sweep"),
            v(
              "limits with another oar type",
              { ...settings(), limits: { ...settings().limits, coastal: settings().limits.sculling } },
              "limits.coastal",
            ),
            v("limits an array", { ...settings(), limits: [settings().limits.sculling] }, "limits"),
            v("a minimum above its maximum", withSculling({ minLengthCm: 300, maxLengthCm: 290 }), "limits.sculling.maxLengthCm"),
            v("a limit as text", withSculling({ minLengthCm: "280" }), "limits.sculling.minLengthCm"),
            v("a limit NaN", withSculling({ maxInboardCm: Number.NaN }), "limits.sculling.maxInboardCm"),
            v("a limit Infinity", withSculling({ maxLengthCm: Number.POSITIVE_INFINITY }), "limits.sculling.maxLengthCm"),
            v("a limit negative", withSculling({ minInboardCm: -88 }), "limits.sculling.minInboardCm"),
            v("a limit missing", withSculling({ minInboardCm: undefined }), "limits.sculling.minInboardCm"),
            v("a limit with an extra key", withSculling({ maxSpanCm: 160 }), "limits.sculling.maxSpanCm"),
            v("a limit with a __proto__ key", { ...settings(), limits: withProtoKey(settings().limits, {}) }, "limits.__proto__"),
          ],
        ),
      ),
    valid: () => [settings()],
  });

  const memberVariants = (valid: Input, second: "role" | "status") =>
    objectVariants(valid, "memberId", { memberId: { kind: "id" }, [second]: { kind: "choice" } }, [
      v("memberId of another club", { ...valid, memberId: fx.otherClubAthleteId }, "memberId"),
      v("memberId past the largest id", { ...valid, memberId: 2 ** 31 }, "memberId"),
      v("memberId in hexadecimal", { ...valid, memberId: `0x${Number(valid.memberId).toString(16)}` }, "memberId"),
      v("memberId with spaces", { ...valid, memberId: ` ${String(valid.memberId)} ` }, "memberId"),
      v(`${second} unknown`, { ...valid, [second]: "captain" }, second),
      v(`${second} in capitals`, { ...valid, [second]: String(valid[second]).toUpperCase() }, second),
      v(
        "both a role and a status",
        { ...valid, [second === "role" ? "status" : "role"]: second === "role" ? "active" : "coach" },
        second === "role" ? "status" : "role",
      ),
    ]);

  table("changeMemberRoleAction", {
    action: memberActions.changeMemberRoleAction,
    as: "admin",
    cases: () => single(memberVariants({ memberId: fx.kitId, role: "coach" }, "role")),
    valid: () => [{ memberId: fx.kitId, role: "coach" }],
  });

  table("renameMemberAction", {
    action: memberActions.renameMemberAction,
    as: "admin",
    cases: () =>
      single(
        objectVariants(
          { memberId: fx.hamishId, name: "Hamish Oyelaran" },
          "memberId",
          { memberId: { kind: "id" }, name: { kind: "name" } },
          [
            v("memberId of another club", { memberId: fx.otherClubAthleteId, name: "Hamish Oyelaran" }, "memberId"),
            v("memberId past the largest id", { memberId: 2 ** 31, name: "Hamish Oyelaran" }, "memberId"),
            v("memberId in hexadecimal", { memberId: `0x${fx.hamishId.toString(16)}`, name: "Hamish Oyelaran" }, "memberId"),
            v("name too long", { memberId: fx.hamishId, name: "n".repeat(121) }, "name"),
            v("name with a tab", { memberId: fx.hamishId, name: "Hamish\tOyelaran" }, "name"),
            v("an email beside the name", { memberId: fx.hamishId, name: "Hamish Oyelaran", email: "h@else.example" }, "email"),
            v("a role beside the name", { memberId: fx.hamishId, name: "Hamish Oyelaran", role: "admin" }, "role"),
          ],
        ),
      ),
    valid: () => [{ memberId: fx.hamishId, name: "Hamish Oyelaran" }],
  });

  // The valid call only mails Kit a link: nothing about the account changes until it is opened.
  const validMove = () => ({ memberId: fx.kitId, newEmail: "kit.moved@bad-input.example" });
  table("changeMemberEmailAction", {
    action: memberActions.changeMemberEmailAction,
    as: "admin",
    cases: () =>
      single(
        objectVariants(validMove(), "memberId", { memberId: { kind: "id" }, newEmail: { kind: "email" } }, [
          v("memberId of another club", { ...validMove(), memberId: fx.otherClubAthleteId }, "memberId"),
          v("memberId past the largest id", { ...validMove(), memberId: 2 ** 31 }, "memberId"),
          v("new e-mail without a domain", { ...validMove(), newEmail: "kit@" }, "newEmail"),
          v("new e-mail over 254 characters", { ...validMove(), newEmail: `${"k".repeat(60)}@${"d".repeat(200)}.example` }, "newEmail"),
          v("new e-mail of another member", { ...validMove(), newEmail: fx.adaEmail }, "newEmail"),
          v("new e-mail the one Kit has", { ...validMove(), newEmail: "kit@lantern-reach.example" }, "newEmail"),
          v("a name beside it", { ...validMove(), name: "Kit Abernethy" }, "name"),
        ]),
      ),
    valid: () => [validMove()],
  });

  table("setMemberStatusAction", {
    action: memberActions.setMemberStatusAction,
    as: "admin",
    cases: () => single(memberVariants({ memberId: fx.devId, status: "deactivated" }, "status")),
    valid: () => [{ memberId: fx.devId, status: "deactivated" }],
  });
});

// ---------------------------------------------------------------------------------------------------
// The roster import (admin): a FormData with one CSV file under "roster"

function rosterForm(...parts: [string, string | File][]): FormData {
  const form = new FormData();
  for (const [name, value] of parts) form.append(name, value);
  return form;
}

function csvFile(body: string | Uint8Array, type = "text/csv", name = "roster.csv"): File {
  return new File([typeof body === "string" ? body : new Uint8Array(body)], name, { type });
}

const goodCsv = "name,email,role\nRowan Tidewell,rowan.tidewell@roster-action.example,athlete\n";

describe("the roster import (as an admin)", () => {
  const good = () => csvFile(goodCsv);
  const row = (line: string) => csvFile(`name,email,role\n${line}\n`);
  table("importRosterAction", {
    action: memberActions.importRosterAction,
    as: "admin",
    cases: () => [
      ...single(
        [
          ["undefined", undefined],
          ["null", null],
          ["the CSV as text", goodCsv],
          ["an object holding the file", { roster: good() }],
          ["an array holding the file", [good()]],
          ["a number", 42],
          ["a Map holding the file", new Map([["roster", good()]])],
          ["the file itself", good()],
          ["URLSearchParams", new URLSearchParams({ roster: goodCsv })],
        ].map(([label, input]) => v(`input is ${String(label)}`, input, "_")),
      ),
      ...single([
        v("no fields", rosterForm(), "roster"),
        v("roster as text", rosterForm(["roster", goodCsv]), "roster"),
        v("roster an empty string", rosterForm(["roster", ""]), "roster"),
        v("roster twice", rosterForm(["roster", good()], ["roster", good()]), "roster"),
        v("the file under another name", rosterForm(["file", good()]), "roster"),
        v("an extra field", rosterForm(["roster", good()], ["sneaky", "1"]), "sneaky"),
        v("a __proto__ field", rosterForm(["roster", good()], ["__proto__", "x"]), "__proto__"),
        v("a constructor field", rosterForm(["roster", good()], ["constructor", "x"]), "constructor"),
        v("an image", rosterForm(["roster", csvFile(goodCsv, "image/png", "roster.png")]), "roster"),
        v("JSON", rosterForm(["roster", csvFile(JSON.stringify({ name: "Rowan" }), "application/json", "roster.json")]), "roster"),
        v("an empty file", rosterForm(["roster", csvFile("")]), "roster"),
        v("over 200 KB", rosterForm(["roster", csvFile(`name,email\n${"a,b@c.example\n".repeat(16_000)}`)]), "roster"),
        v(
          "over 500 rows",
          rosterForm([
            "roster",
            csvFile(`name,email\n${Array.from({ length: 501 }, (_, i) => `Rower ${i},rower.${i}@roster-action.example`).join("\n")}`),
          ]),
          "roster",
        ),
        v("NUL bytes", rosterForm(["roster", csvFile("name,email\nA\u0000B,ab@roster-action.example\n")]), "roster"),
        v("not UTF-8", rosterForm(["roster", csvFile(new Uint8Array([0x6e, 0x61, 0x6d, 0x65, 0x0a, 0xff, 0xfe, 0xfd]))]), "roster"),
        v("UTF-16 text", rosterForm(["roster", csvFile(new Uint8Array(Buffer.from(`\ufeff${goodCsv}`, "utf16le")))]), "roster"),
        v("a header only", rosterForm(["roster", csvFile("name,email,role\n")]), "roster"),
        v("no header", rosterForm(["roster", csvFile("Rowan Tidewell,rowan.tidewell@roster-action.example\n")]), "roster"),
        v("other columns", rosterForm(["roster", csvFile("first,last\nRowan,Tidewell\n")]), "roster"),
        v("every row without an e-mail", rosterForm(["roster", row("Rowan Tidewell,,athlete")]), "rows.2.email"),
        v("every row with a bad e-mail", rosterForm(["roster", row("Rowan Tidewell,rowan@,athlete")]), "rows.2.email"),
        v("every row without a name", rosterForm(["roster", row(",rowan.tidewell@roster-action.example,athlete")]), "rows.2.name"),
        v(
          "every row with a huge name",
          rosterForm(["roster", row(`${"n".repeat(5000)},rowan.tidewell@roster-action.example,athlete`)]),
          "rows.2.name",
        ),
        v(
          "every row with a control character in the name",
          rosterForm(["roster", row("Rowan\u0007Tidewell,rowan.tidewell@roster-action.example,athlete")]),
          "rows.2.name",
        ),
        v(
          "every row with an unknown role",
          rosterForm(["roster", row("Rowan Tidewell,rowan.tidewell@roster-action.example,captain")]),
          "rows.2.role",
        ),
        v("every row already a member", rosterForm(["roster", row(`Ada Again,${fx.adaEmail},athlete`)]), "rows.2.email"),
        v("an unclosed quote", rosterForm(["roster", row('"Rowan Tidewell,rowan.tidewell@roster-action.example,athlete')]), "rows.2"),
      ]),
    ],
    valid: () => [rosterForm(["roster", good()])],
  });
});

// ---------------------------------------------------------------------------------------------------
// Signing in and joining (anyone)

describe("signing in and joining (signed out)", () => {
  table("requestSignInLinkAction", {
    action: signInActions.requestSignInLinkAction,
    as: "anonymous",
    cases: () =>
      single(
        objectVariants({ email: fx.adaEmail }, "email", { email: { kind: "email" } }, [
          v("email without a domain", { email: "ada@" }, "email"),
          v("email without an at sign", { email: "ada.lantern-reach.example" }, "email"),
          v("email with spaces", { email: "ada w@lantern-reach.example" }, "email"),
          v("email with a line break", { email: `${fx.adaEmail}\nBcc: someone@else.example` }, "email"),
          v("email over 254 characters", { email: `${"a".repeat(60)}@${"d".repeat(200)}.example` }, "email"),
          v("a password beside the email", { email: fx.adaEmail, password: demoPassword }, "password"),
        ]),
      ),
    valid: () => [{ email: fx.adaEmail }],
  });

  const validAccept = () => ({ token: fx.invitationToken, name: "Wren Halloway", password: "tidewater heron slipway" });
  table("acceptInvitationAction", {
    action: inviteActions.acceptInvitationAction,
    as: "anonymous",
    cases: () =>
      single(
        objectVariants(validAccept(), "token", { token: { kind: "token" }, name: { kind: "name" }, password: { kind: "password" } }, [
          v("token unknown", { ...validAccept(), token: newToken() }, "token"),
          v("token too short", { ...validAccept(), token: fx.invitationToken.slice(0, 20) }, "token"),
          v("token with a character outside base64url", { ...validAccept(), token: `${fx.invitationToken.slice(0, -1)}+` }, "token"),
          v("token of another length", { ...validAccept(), token: `${fx.invitationToken}A` }, "token"),
          v("name too long", { ...validAccept(), name: "n".repeat(121) }, "name"),
          v("password too short", { ...validAccept(), password: "short" }, "password"),
          v("password too long", { ...validAccept(), password: "p".repeat(129) }, "password"),
          v("password over bcrypt's 72 bytes", { ...validAccept(), password: "heron collar ".repeat(6) }, "password"),
          v("password of 37 two-byte letters (74 bytes)", { ...validAccept(), password: "é".repeat(37) }, "password"),
          v("password a common one", { ...validAccept(), password: "password123" }, "password"),
          v("a confirm field", { ...validAccept(), confirm: validAccept().password }, "confirm"),
          v("an email field", { ...validAccept(), email: "someone@else.example" }, "email"),
          v("a role field", { ...validAccept(), role: "admin" }, "role"),
        ]),
      ),
    valid: () => [validAccept()],
  });

  const validConfirm = () => ({ token: fx.emailChangeToken });
  table("confirmEmailChangeAction", {
    action: confirmEmailActions.confirmEmailChangeAction,
    as: "anonymous",
    cases: () =>
      single(
        objectVariants(validConfirm(), "token", { token: { kind: "token" } }, [
          v("token unknown", { token: newToken() }, "token"),
          v("token too short", { token: fx.emailChangeToken.slice(0, 20) }, "token"),
          v("token with a character outside base64url", { token: `${fx.emailChangeToken.slice(0, -1)}+` }, "token"),
          v("token of another length", { token: `${fx.emailChangeToken}A` }, "token"),
          v("token of an invitation", { token: fx.invitationToken }, "token"),
          v("a new e-mail field", { ...validConfirm(), newEmail: "someone@else.example" }, "newEmail"),
          v("a member id field", { ...validConfirm(), memberId: 1 }, "memberId"),
        ]),
      ),
    valid: () => [validConfirm()],
  });
});

// ---------------------------------------------------------------------------------------------------
// "I've read it" (athlete): a plain form action that redirects. Every malformed form must go back to
// the course page (/learn) without recording a read, never to a quiz, never a thrown error of its own.

describe("finishing a lesson (as an athlete)", () => {
  function lessonForm(...parts: [string, string | File][]): FormData {
    return rosterForm(...parts);
  }

  function redirectProblems(bad: BadCase, answer: unknown, thrown?: unknown): string[] {
    if (thrown === undefined) return [`${bad.label}: answered ${JSON.stringify(answer)} instead of redirecting`];
    const digest = (thrown as { digest?: unknown } | null)?.digest;
    if (typeof digest !== "string" || !digest.startsWith("NEXT_REDIRECT")) return [`${bad.label}: threw ${describeThrown(thrown)}`];
    const target = digest.split(";")[2];
    return target === bad.field ? [] : [`${bad.label}: sent to ${target}, not ${bad.field}`];
  }

  it("sends every malformed form back to the course without recording a read, and a good one on to the quiz", async () => {
    const course = "/learn";
    const values: [string, unknown][] = [
      ["undefined", undefined],
      ["null", null],
      ["a string", "slug=overall-length"],
      ["an object", { slug: "overall-length" }],
      ["an array", [["slug", "overall-length"]]],
      ["a number", 42],
      ["a Map", new Map([["slug", "overall-length"]])],
      ["URLSearchParams", new URLSearchParams({ slug: "overall-length" })],
      ["a file", csvFile("slug=overall-length", "text/plain", "form.txt")],
      ["no fields", lessonForm()],
      ["slug empty", lessonForm(["slug", ""])],
      ["slug unknown", lessonForm(["slug", "sculling-backwards"])],
      ["slug in capitals", lessonForm(["slug", "Overall-Length"])],
      ["slug with a path", lessonForm(["slug", "../overall-length"])],
      ["slug with a slash", lessonForm(["slug", "overall-length/quiz"])],
      ["slug with a query", lessonForm(["slug", "overall-length?x=1"])],
      ["slug with a space", lessonForm(["slug", "overall length"])],
      ["slug with a NUL", lessonForm(["slug", "overall-length\u0000"])],
      ["slug with a line break", lessonForm(["slug", "overall-length\n"])],
      ["slug with a double hyphen", lessonForm(["slug", "overall--length"])],
      ["slug huge", lessonForm(["slug", huge])],
      ["slug just over the limit", lessonForm(["slug", `a${"-b".repeat(30)}`])],
      ["slug a URL", lessonForm(["slug", "https://elsewhere.example/"])],
      ["slug a number", lessonForm(["slug", "42"])],
      ["slug twice, the same", lessonForm(["slug", "overall-length"], ["slug", "overall-length"])],
      ["slug twice, different", lessonForm(["slug", "overall-length"], ["slug", "setting-inboard"])],
      ["slug a file", lessonForm(["slug", csvFile("overall-length", "text/plain", "slug.txt")])],
      ["the slug under another name", lessonForm(["module", "overall-length"])],
      ["the slug's name in capitals", lessonForm(["Slug", "overall-length"])],
      ["a __proto__ field only", lessonForm(["__proto__", "overall-length"])],
    ];
    const cases: BadCase[] = values.map(([label, input]) => ({ label, args: [input], field: course }));
    expect(cases.length).toBeGreaterThanOrEqual(30);
    const problems = await refusalProblems(actionOf(learnActions.finishLessonAction), "athlete", cases, redirectProblems);
    expect(problems, problems.join("\n")).toEqual([]);
    const before = await fingerprint();
    const thrown = await callAs("athlete", () => learnActions.finishLessonAction(lessonForm(["slug", "overall-length"]))).then(
      () => null,
      (error: unknown) => error,
    );
    expect(redirectProblems({ label: "the lesson's own form", args: [], field: "/learn/overall-length/quiz" }, undefined, thrown)).toEqual(
      [],
    );
    expect(await fingerprint(), "the read is recorded").not.toBe(before);
  });
});

// ---------------------------------------------------------------------------------------------------
// Your own name (any member)

describe("correcting your own name (as an athlete)", () => {
  const validName = () => ({ name: "Ada Whitcombe" });
  table("changeOwnNameAction", {
    action: accountActions.changeOwnNameAction,
    as: "athlete",
    cases: () =>
      single(
        objectVariants(validName(), "name", { name: { kind: "name" } }, [
          v("name too long", { name: "n".repeat(121) }, "name"),
          v("name with a tab", { name: "Ada\tWhitcombe" }, "name"),
          v("name with a carriage return", { name: "Ada\rWhitcombe" }, "name"),
          v("name with a DEL character", { name: "Ada\u007fWhitcombe" }, "name"),
          v("name with a C1 control character", { name: "Ada\u0085Whitcombe" }, "name"),
          v("name of only a line break", { name: "\n" }, "name"),
          v("an email field", { ...validName(), email: "someone@else.example" }, "email"),
          v("a role field", { ...validName(), role: "admin" }, "role"),
          v("a member id field (there is no renaming someone else)", { ...validName(), memberId: 1 }, "memberId"),
          v("a club id field", { ...validName(), clubId: 2 }, "clubId"),
        ]),
      ),
    valid: () => [validName()],
  });
});

// ---------------------------------------------------------------------------------------------------
// Your own e-mail address (any member). The valid control only mails a link: nothing changes yet.

describe("changing your own e-mail address (as an athlete)", () => {
  const validRequest = () => ({ newEmail: "ada.elsewhere@bad-input.example", currentPassword: demoPassword });
  table("requestEmailChangeAction", {
    action: accountActions.requestEmailChangeAction,
    as: "athlete",
    cases: () =>
      single(
        objectVariants(validRequest(), "newEmail", { newEmail: { kind: "email" }, currentPassword: { kind: "password" } }, [
          v("new e-mail without a domain", { ...validRequest(), newEmail: "ada@" }, "newEmail"),
          v("new e-mail with two at signs", { ...validRequest(), newEmail: "ada@@bad-input.example" }, "newEmail"),
          v("new e-mail over 254 characters", { ...validRequest(), newEmail: `${"a".repeat(60)}@${"d".repeat(200)}.example` }, "newEmail"),
          v("new e-mail the one she has", { ...validRequest(), newEmail: fx.adaEmail }, "newEmail"),
          v("current password wrong", { ...validRequest(), currentPassword: "not the password at all" }, "currentPassword"),
          v("current password longer than sign-in accepts", { ...validRequest(), currentPassword: "p".repeat(129) }, "currentPassword"),
          v("an email field", { ...validRequest(), email: "someone@else.example" }, "email"),
          v("a member id field (there is no moving someone else)", { ...validRequest(), memberId: 1 }, "memberId"),
        ]),
      ),
    valid: () => [validRequest()],
  });
});

// ---------------------------------------------------------------------------------------------------
// Your own password (any member). The valid control changes the athlete's password, which ends the
// athlete's session: the test after the table signs in again with the new one.

describe("changing your own password (as an athlete)", () => {
  const changedPassword = "tidewater heron slipway";
  const validChange = () => ({ currentPassword: demoPassword, newPassword: changedPassword });
  table("changePasswordAction", {
    action: accountActions.changePasswordAction,
    as: "athlete",
    cases: () =>
      single(
        objectVariants(validChange(), "currentPassword", { currentPassword: { kind: "password" }, newPassword: { kind: "password" } }, [
          v("current password wrong", { ...validChange(), currentPassword: "not the password at all" }, "currentPassword"),
          v("current password longer than sign-in accepts", { ...validChange(), currentPassword: "p".repeat(129) }, "currentPassword"),
          v("new password too short", { ...validChange(), newPassword: "short" }, "newPassword"),
          v("new password too long", { ...validChange(), newPassword: "p".repeat(129) }, "newPassword"),
          v("new password over bcrypt's 72 bytes", { ...validChange(), newPassword: "heron collar ".repeat(6) }, "newPassword"),
          v("new password of 37 two-byte letters (74 bytes)", { ...validChange(), newPassword: "é".repeat(37) }, "newPassword"),
          v("new password a common one", { ...validChange(), newPassword: "password123" }, "newPassword"),
          v("new password the current one", { ...validChange(), newPassword: demoPassword }, "newPassword"),
          v("a confirm field", { ...validChange(), confirm: changedPassword }, "confirm"),
          v("an email field", { ...validChange(), email: "someone@else.example" }, "email"),
          v("a member id field (there is no changing someone else's)", { ...validChange(), memberId: 1 }, "memberId"),
        ]),
      ),
    valid: () => [validChange()],
  });

  it("the athlete signs in with the new password, and not the old one", async () => {
    await expect(sessionCookieFor("ada@lantern-reach.example", demoPassword)).rejects.toThrow(/failed with 401/);
    cookies.athlete = await sessionCookieFor("ada@lantern-reach.example", changedPassword);
    expect(cookies.athlete).toContain("next-auth.session-token=");
  });
});
