import { expect, test } from "@playwright/test";
import { demo } from "./support/auth";
import { apiSession } from "./support/api-session";
import { loadAthleteEmail } from "@/lib/seed/load-athletes";
import {
  commonBadInputs,
  demoClubRecordId,
  expectAllRefused,
  expectAllRefusedNaming,
  jsonCase,
  send,
  type BadInput,
  type RefusalCase,
} from "./support/bad-input";

test.describe("bad input is refused with 4xx JSON naming the field", () => {
  test("POST /api/attempts/{id}/submit", async ({ baseURL }) => {
    // A load-club athlete, so demo members keep their "never signed in" state for other tests.
    const session = await apiSession(baseURL!, loadAthleteEmail(40));
    const opened = await session.post("/api/modules/overall-length/attempts");
    const { attemptId } = (await opened.json()) as { attemptId: string };
    const url = `/api/attempts/${attemptId}/submit`;
    const inputs: BadInput[] = [
      ...commonBadInputs({ answers: { q1: "1" } }),
      { label: "answers as array", body: { answers: ["1"] } },
      { label: "answer object", body: { answers: { q1: { value: 1 } } } },
      { label: "answer huge number", body: { answers: { q1: 1e400 } } },
      { label: "answer too long", body: { answers: { q1: "9".repeat(300) } } },
      { label: "too many answers", body: { answers: Object.fromEntries(Array.from({ length: 25 }, (_, i) => [`q${i}`, "1"])) } },
      { label: "long question id", body: { answers: { ["q".repeat(40)]: "1" } } },
      { label: "answer list too long", body: { answers: { q1: Array(30).fill("a") } } },
      { label: "answer null", body: { answers: { q1: null } } },
      { label: "answer boolean", body: { answers: { q1: true } } },
      { label: "answer list of numbers", body: { answers: { q1: [1, 2] } } },
      { label: "answers as string", body: { answers: "q1=1" } },
      { label: "answer nested list", body: { answers: { q1: [["a"]] } } },
    ];
    await expectAllRefused(session, url, inputs);
    // A field error names the field.
    const named = await send(session, url, { label: "missing answers", body: {} });
    expect(Object.keys(((await named.json()) as { fields: Record<string, string[]> }).fields)).toContain("answers");
    // Unknown or malformed attempt ids: 400 for a malformed id, 404 for an unknown one.
    expect((await session.post("/api/attempts/not-a-uuid/submit", { data: { answers: {} } })).status()).toBe(400);
    expect((await session.post("/api/attempts/00000000-0000-4000-8000-000000000000/submit", { data: { answers: {} } })).status()).toBe(404);
    // The attempt is still open: none of the bad inputs consumed it.
    expect((await session.post(url, { data: { answers: { q1: "1" } } })).status()).toBe(200);
    await session.dispose();
  });

  test("POST /api/invitations", async ({ baseURL }) => {
    const session = await apiSession(baseURL!, demo.admin);
    const url = "/api/invitations";
    const inputs: BadInput[] = [
      ...commonBadInputs({ email: "fresh.face@lantern-reach.example", name: "Fresh Face", role: "athlete" }),
      { label: "bad e-mail", body: { email: "no-at-sign", name: "X", role: "athlete" } },
      { label: "unknown role", body: { email: "x1@lantern-reach.example", name: "X", role: "captain" } },
      { label: "blank name", body: { email: "x2@lantern-reach.example", name: "   ", role: "athlete" } },
      { label: "name too long", body: { email: "x3@lantern-reach.example", name: "N".repeat(200), role: "athlete" } },
      { label: "existing member", body: { email: demo.athlete, name: "Ada", role: "athlete" } },
    ];
    await expectAllRefused(session, url, inputs);
    const named = await send(session, url, { label: "bad role", body: { email: "x4@lantern-reach.example", name: "X", role: "captain" } });
    expect(Object.keys(((await named.json()) as { fields: Record<string, string[]> }).fields)).toContain("role");
    await session.dispose();
  });

  test("POST /api/rig/plan (public)", async ({ playwright, baseURL }) => {
    const anonymous = await playwright.request.newContext({ baseURL });
    const valid = {
      oarType: "sculling",
      measured: { lengthCm: 287, inboardCm: 87 },
      target: { lengthCm: 288, inboardCm: 88 },
    };
    const withMeasured = (measured: Record<string, unknown>) => ({ ...valid, measured: { ...valid.measured, ...measured } });
    const inputs: BadInput[] = [
      ...commonBadInputs(valid),
      { label: "span NaN text", body: { ...valid, spanCm: "NaN" } },
      { label: "span negative", body: { ...valid, spanCm: -159 } },
      { label: "span huge", body: { ...valid, spanCm: 1e308 } },
      { label: "span of a barge", body: { ...valid, spanCm: 400 } },
      { label: "unknown oar type", body: { ...valid, oarType: "canoe" } },
      { label: "length NaN text", body: withMeasured({ lengthCm: "NaN" }) },
      { label: "length negative", body: withMeasured({ lengthCm: -287 }) },
      { label: "length huge", body: withMeasured({ lengthCm: 1e308 }) },
      { label: "length as text", body: withMeasured({ lengthCm: "287" }) },
      { label: "inboard longer than the oar", body: withMeasured({ inboardCm: 300 }) },
      { label: "a 3 m scull", body: { ...valid, measured: { lengthCm: 300, inboardCm: 88 }, target: { lengthCm: 300, inboardCm: 88 } } },
      { label: "a 2 m sweep oar", body: { ...valid, oarType: "sweep", spreadCm: 85, measured: { lengthCm: 200, inboardCm: 80 }, target: { lengthCm: 200, inboardCm: 80 } } },
      { label: "click size zero", body: { ...valid, clickCm: 0 } },
      { label: "half swivel negative", body: { ...valid, halfSwivelCm: -2 } },
      { label: "target missing inboard", body: { ...valid, target: { lengthCm: 288 } } },
      { label: "measured extra field", body: withMeasured({ widthCm: 3 }) },
    ];
    await expectAllRefused(anonymous, "/api/rig/plan", inputs);
    const named = await send(anonymous, "/api/rig/plan", { label: "negative", body: withMeasured({ lengthCm: -1 }) });
    expect(Object.keys(((await named.json()) as { fields: Record<string, string[]> }).fields)).toContain("measured.lengthCm");
    await anonymous.dispose();
  });

  test("POST /api/rig/plans (saved plans)", async ({ baseURL }) => {
    // The demo coach: any member may save a plan, and the coach is signed in by many specs already.
    const session = await apiSession(baseURL!, demo.coach);
    const boatId = await demoClubRecordId("boats", "Heron");
    const oarSetId = await demoClubRecordId("oar_sets", "Short-loom sculls");
    const sweepSetId = await demoClubRecordId("oar_sets", "Eight sweeps");
    const scullChange = { oarType: "sculling", measured: { lengthCm: 287, inboardCm: 86.5 }, target: { lengthCm: 288, inboardCm: 88 } };
    const valid = { clientId: "5f0c2a7e-1d3b-4c8a-9e6f-2b7d4a1c9e30", boatId, oarSetId, request: scullChange, plannedAt: new Date().toISOString() };
    const daysFromNow = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString();
    const withRequest = (request: Record<string, unknown>) => ({ ...valid, request: { ...scullChange, ...request } });
    const fieldOfCommon = (label: string): string => {
      const key = Object.keys(valid).find((name) => label.startsWith(`missing ${name}`) || label.startsWith(`${name} `));
      if (key) return key;
      if (label === "plain text" || label === "no content type" || label === "form encoded") return "content-type";
      if (label === "extra field") return "sneaky";
      if (label === "prototype pollution") return "__proto__";
      if (label === "empty object") return "clientId";
      return "body";
    };
    const cases: RefusalCase[] = [
      ...commonBadInputs(valid, ["boatId", "oarSetId"]).map((input) => jsonCase(input, fieldOfCommon(input.label))),
      jsonCase({ label: "clientId not a UUID", body: { ...valid, clientId: "plan-1" } }, "clientId"),
      jsonCase({ label: "clientId SQL-looking", body: { ...valid, clientId: "' OR 1=1 --" } }, "clientId"),
      jsonCase({ label: "boatId zero", body: { ...valid, boatId: 0 } }, "boatId"),
      jsonCase({ label: "boatId fraction", body: { ...valid, boatId: 1.5 } }, "boatId"),
      jsonCase({ label: "boatId as text", body: { ...valid, boatId: String(boatId) } }, "boatId"),
      jsonCase({ label: "boatId past safe integers", body: { ...valid, boatId: 2 ** 60 } }, "boatId"),
      { ...jsonCase({ label: "unknown boat", body: { ...valid, boatId: 999_999 } }, "boatId"), status: 404 },
      { ...jsonCase({ label: "unknown oar set", body: { ...valid, oarSetId: 999_999 } }, "oarSetId"), status: 404 },
      jsonCase({ label: "sweep oars for a single scull", body: { ...valid, oarSetId: sweepSetId } }, "oarSetId"),
      jsonCase({ label: "plan for sweep oars with sculls", body: { ...valid, request: { oarType: "sweep", measured: { lengthCm: 372, inboardCm: 114 }, target: { lengthCm: 373, inboardCm: 115 } } } }, "oarSetId"),
      jsonCase({ label: "plannedAt tomorrow", body: { ...valid, plannedAt: daysFromNow(1) } }, "plannedAt"),
      jsonCase({ label: "plannedAt 40 days ago", body: { ...valid, plannedAt: daysFromNow(-40) } }, "plannedAt"),
      jsonCase({ label: "plannedAt a date only", body: { ...valid, plannedAt: "2026-01-01" } }, "plannedAt"),
      jsonCase({ label: "plannedAt month 13", body: { ...valid, plannedAt: "2026-13-01T10:00:00Z" } }, "plannedAt"),
      jsonCase({ label: "plannedAt as a number", body: { ...valid, plannedAt: Date.now() } }, "plannedAt"),
      jsonCase({ label: "request as text", body: { ...valid, request: "287 to 288" } }, "request"),
      jsonCase({ label: "request length negative", body: withRequest({ measured: { lengthCm: -287, inboardCm: 86.5 } }) }, "request.measured.lengthCm"),
      jsonCase({ label: "request length NaN text", body: withRequest({ target: { lengthCm: "NaN", inboardCm: 88 } }) }, "request.target.lengthCm"),
      jsonCase({ label: "request click zero", body: withRequest({ clickCm: 0 }) }, "request.clickCm"),
      jsonCase({ label: "request unknown oar type", body: withRequest({ oarType: "canoe" }) }, "request.oarType"),
      jsonCase({ label: "request extra field", body: withRequest({ limits: { maxLengthCm: 999 } }) }, "request.limits"),
      jsonCase({ label: "request handle move past the inboard", body: withRequest({ measured: { lengthCm: 299, inboardCm: 1 }, target: { lengthCm: 250, inboardCm: 88 } }) }, "request.measured.inboardCm"),
    ];
    await expectAllRefusedNaming(session, { url: "/api/rig/plans", method: "POST" }, cases);
    // None of them was recorded: the coach's first real save is new.
    const saved = await session.post("/api/rig/plans", { data: { ...valid, clientId: "0d5e8b1a-6c2f-4a9e-8b3d-7f1e2c4a6b90" } });
    expect(saved.status(), await saved.text()).toBe(201);
    await session.dispose();
  });

  test("POST /api/sign-offs", async ({ baseURL }) => {
    const session = await apiSession(baseURL!, loadAthleteEmail(38));
    const inputs: BadInput[] = [
      ...commonBadInputs({ moduleSlug: "overall-length", coachId: null }, ["coachId"]),
      { label: "unknown module", body: { moduleSlug: "no-such-module", coachId: null } },
      { label: "slug with capitals", body: { moduleSlug: "Overall-Length", coachId: null } },
      { label: "coach id as text", body: { moduleSlug: "overall-length", coachId: "7" } },
      { label: "coach id fraction", body: { moduleSlug: "overall-length", coachId: 1.5 } },
      { label: "unknown coach", body: { moduleSlug: "overall-length", coachId: 999999 } },
    ];
    await expectAllRefused(session, "/api/sign-offs", inputs);
    await session.dispose();
  });

  test("PATCH /api/members/{id}", async ({ baseURL }) => {
    const session = await apiSession(baseURL!, demo.admin);
    const roster = (await (await session.get("/api/roster")).json()) as { athletes: { id: number; email: string }[] };
    const kit = roster.athletes.find((athlete) => athlete.email === "kit@lantern-reach.example")!;
    const url = `/api/members/${kit.id}`;
    const inputs: BadInput[] = [
      ...commonBadInputs({ role: "athlete" }),
      { label: "role and status together", body: { role: "athlete", status: "active" } },
      { label: "unknown status", body: { status: "resting" } },
      { label: "unknown role", body: { role: "cox" } },
      { label: "status as boolean", body: { status: false } },
      { label: "role in capitals", body: { role: "ATHLETE" } },
      { label: "role with spaces", body: { role: " athlete " } },
      { label: "empty role", body: { role: "" } },
      { label: "empty status", body: { status: "" } },
      { label: "role as number", body: { role: 1 } },
      { label: "role as object", body: { role: { name: "coach" } } },
      { label: "status null", body: { status: null } },
      { label: "role and status null", body: { role: null, status: null } },
      { label: "id in the body", body: { id: 1, role: "athlete" } },
    ];
    await expectAllRefused(session, url, inputs, "PATCH");
    expect((await session.fetch("/api/members/not-a-number", { method: "PATCH", data: { role: "athlete" } })).status()).toBe(400);
    expect((await session.fetch("/api/members/999999", { method: "PATCH", data: { role: "athlete" } })).status()).toBe(404);
    await session.dispose();
  });
});
