import { expect, test } from "@playwright/test";
import { demo } from "./support/auth";
import { apiSession } from "./support/api-session";
import { loadAthleteEmail } from "@/lib/seed/load-athletes";
import { commonRefusalCases, demoClubRecordId, expectAllRefusedNaming, jsonCase, type RefusalCase } from "./support/bad-input";

test.describe("bad input is refused with 4xx JSON naming the field", () => {
  test("POST /api/attempts/{id}/submit", async ({ baseURL }) => {
    // A load-club athlete, so demo members keep their "never signed in" state for other tests.
    const session = await apiSession(baseURL!, loadAthleteEmail(40));
    const opened = await session.post("/api/modules/overall-length/attempts");
    const { attemptId } = (await opened.json()) as { attemptId: string };
    const url = `/api/attempts/${attemptId}/submit`;
    const answers = (value: unknown) => ({ answers: { q1: value } });
    const otherAttempt = (label: string, id: string, status: number): RefusalCase => ({
      ...jsonCase({ label, body: { answers: {} } }, "id"),
      url: `/api/attempts/${id}/submit`,
      status,
    });
    const cases: RefusalCase[] = [
      ...commonRefusalCases({ answers: { q1: "1" } }, { emptyObject: "answers" }),
      jsonCase({ label: "answers as array", body: { answers: ["1"] } }, "answers"),
      jsonCase({ label: "answer object", body: answers({ value: 1 }) }, "answers.q1"),
      jsonCase({ label: "answer huge number", body: { answers: { q1: 1e400 } } }, "answers.q1"),
      jsonCase({ label: "answer too long", body: answers("9".repeat(300)) }, "answers.q1"),
      jsonCase(
        { label: "too many answers", body: { answers: Object.fromEntries(Array.from({ length: 25 }, (_, i) => [`q${i}`, "1"])) } },
        "answers",
      ),
      jsonCase({ label: "long question id", body: { answers: { ["q".repeat(40)]: "1" } } }, "answers"),
      jsonCase({ label: "answer list too long", body: answers(Array(30).fill("a")) }, "answers.q1"),
      jsonCase({ label: "answer null", body: answers(null) }, "answers.q1"),
      jsonCase({ label: "answer boolean", body: answers(true) }, "answers.q1"),
      jsonCase({ label: "answer list of numbers", body: answers([1, 2]) }, "answers.q1"),
      jsonCase({ label: "answers as string", body: { answers: "q1=1" } }, "answers"),
      jsonCase({ label: "answer nested list", body: answers([["a"]]) }, "answers.q1"),
      otherAttempt("malformed attempt id", "not-a-uuid", 400),
      otherAttempt("unknown attempt id", "00000000-0000-4000-8000-000000000000", 404),
    ];
    await expectAllRefusedNaming(session, { url, method: "POST" }, cases);
    // The attempt is still open: none of the bad inputs consumed it.
    expect((await session.post(url, { data: { answers: { q1: "1" } } })).status()).toBe(200);
    await session.dispose();
  });

  test("POST /api/invitations", async ({ baseURL }) => {
    const session = await apiSession(baseURL!, demo.admin);
    const invite = (email: string, name: string, role: string) => ({ email, name, role });
    const cases: RefusalCase[] = [
      ...commonRefusalCases(invite("fresh.face@lantern-reach.example", "Fresh Face", "athlete"), { emptyObject: "email" }),
      jsonCase({ label: "bad e-mail", body: invite("no-at-sign", "X", "athlete") }, "email"),
      jsonCase({ label: "unknown role", body: invite("x1@lantern-reach.example", "X", "captain") }, "role"),
      jsonCase({ label: "blank name", body: invite("x2@lantern-reach.example", "   ", "athlete") }, "name"),
      jsonCase({ label: "name too long", body: invite("x3@lantern-reach.example", "N".repeat(200), "athlete") }, "name"),
      { ...jsonCase({ label: "existing member", body: invite(demo.athlete, "Ada", "athlete") }, "email"), status: 409 },
    ];
    await expectAllRefusedNaming(session, { url: "/api/invitations", method: "POST" }, cases);
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
    const cases: RefusalCase[] = [
      ...commonRefusalCases(valid, { emptyObject: "oarType" }),
      jsonCase({ label: "span NaN text", body: { ...valid, spanCm: "NaN" } }, "spanCm"),
      jsonCase({ label: "span negative", body: { ...valid, spanCm: -159 } }, "spanCm"),
      jsonCase({ label: "span huge", body: { ...valid, spanCm: 1e308 } }, "spanCm"),
      jsonCase({ label: "span of a barge", body: { ...valid, spanCm: 400 } }, "spanCm"),
      jsonCase({ label: "unknown oar type", body: { ...valid, oarType: "canoe" } }, "oarType"),
      jsonCase({ label: "length NaN text", body: withMeasured({ lengthCm: "NaN" }) }, "measured.lengthCm"),
      jsonCase({ label: "length negative", body: withMeasured({ lengthCm: -287 }) }, "measured.lengthCm"),
      jsonCase({ label: "length huge", body: withMeasured({ lengthCm: 1e308 }) }, "measured.lengthCm"),
      jsonCase({ label: "length as text", body: withMeasured({ lengthCm: "287" }) }, "measured.lengthCm"),
      jsonCase({ label: "inboard longer than the oar", body: withMeasured({ inboardCm: 300 }) }, "measured.inboardCm"),
      jsonCase(
        { label: "a 3 m scull", body: { ...valid, measured: { lengthCm: 300, inboardCm: 88 }, target: { lengthCm: 300, inboardCm: 88 } } },
        "measured.lengthCm",
      ),
      jsonCase(
        {
          label: "a 2 m sweep oar",
          body: {
            ...valid,
            oarType: "sweep",
            spreadCm: 85,
            measured: { lengthCm: 200, inboardCm: 80 },
            target: { lengthCm: 200, inboardCm: 80 },
          },
        },
        "measured.lengthCm",
      ),
      jsonCase({ label: "click size zero", body: { ...valid, clickCm: 0 } }, "clickCm"),
      jsonCase({ label: "half swivel negative", body: { ...valid, halfSwivelCm: -2 } }, "halfSwivelCm"),
      jsonCase({ label: "target missing inboard", body: { ...valid, target: { lengthCm: 288 } } }, "target.inboardCm"),
      jsonCase({ label: "measured extra field", body: withMeasured({ widthCm: 3 }) }, "measured.widthCm"),
    ];
    await expectAllRefusedNaming(anonymous, { url: "/api/rig/plan", method: "POST" }, cases);
    await anonymous.dispose();
  });

  test("POST /api/rig/plans (saved plans)", async ({ baseURL }) => {
    // The demo coach: any member may save a plan, and the coach is signed in by many specs already.
    const session = await apiSession(baseURL!, demo.coach);
    const boatId = await demoClubRecordId("boats", "Heron");
    const oarSetId = await demoClubRecordId("oar_sets", "Short-loom sculls");
    const sweepSetId = await demoClubRecordId("oar_sets", "Eight sweeps");
    const scullChange = { oarType: "sculling", measured: { lengthCm: 287, inboardCm: 86.5 }, target: { lengthCm: 288, inboardCm: 88 } };
    const valid = {
      clientId: "5f0c2a7e-1d3b-4c8a-9e6f-2b7d4a1c9e30",
      boatId,
      oarSetId,
      request: scullChange,
      plannedAt: new Date().toISOString(),
    };
    const daysFromNow = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString();
    const withRequest = (request: Record<string, unknown>) => ({ ...valid, request: { ...scullChange, ...request } });
    const cases: RefusalCase[] = [
      ...commonRefusalCases(valid, { emptyObject: "clientId", numericKeys: ["boatId", "oarSetId"] }),
      jsonCase({ label: "clientId not a UUID", body: { ...valid, clientId: "plan-1" } }, "clientId"),
      jsonCase({ label: "clientId SQL-looking", body: { ...valid, clientId: "' OR 1=1 --" } }, "clientId"),
      jsonCase({ label: "boatId zero", body: { ...valid, boatId: 0 } }, "boatId"),
      jsonCase({ label: "boatId fraction", body: { ...valid, boatId: 1.5 } }, "boatId"),
      jsonCase({ label: "boatId as text", body: { ...valid, boatId: String(boatId) } }, "boatId"),
      jsonCase({ label: "boatId past safe integers", body: { ...valid, boatId: 2 ** 60 } }, "boatId"),
      { ...jsonCase({ label: "unknown boat", body: { ...valid, boatId: 999_999 } }, "boatId"), status: 404 },
      { ...jsonCase({ label: "unknown oar set", body: { ...valid, oarSetId: 999_999 } }, "oarSetId"), status: 404 },
      jsonCase({ label: "sweep oars for a single scull", body: { ...valid, oarSetId: sweepSetId } }, "oarSetId"),
      jsonCase(
        {
          label: "plan for sweep oars with sculls",
          body: {
            ...valid,
            request: { oarType: "sweep", measured: { lengthCm: 372, inboardCm: 114 }, target: { lengthCm: 373, inboardCm: 115 } },
          },
        },
        "oarSetId",
      ),
      jsonCase({ label: "plannedAt tomorrow", body: { ...valid, plannedAt: daysFromNow(1) } }, "plannedAt"),
      jsonCase({ label: "plannedAt 40 days ago", body: { ...valid, plannedAt: daysFromNow(-40) } }, "plannedAt"),
      jsonCase({ label: "plannedAt a date only", body: { ...valid, plannedAt: "2026-01-01" } }, "plannedAt"),
      jsonCase({ label: "plannedAt month 13", body: { ...valid, plannedAt: "2026-13-01T10:00:00Z" } }, "plannedAt"),
      jsonCase({ label: "plannedAt as a number", body: { ...valid, plannedAt: Date.now() } }, "plannedAt"),
      jsonCase({ label: "request as text", body: { ...valid, request: "287 to 288" } }, "request"),
      jsonCase(
        { label: "request length negative", body: withRequest({ measured: { lengthCm: -287, inboardCm: 86.5 } }) },
        "request.measured.lengthCm",
      ),
      jsonCase(
        { label: "request length NaN text", body: withRequest({ target: { lengthCm: "NaN", inboardCm: 88 } }) },
        "request.target.lengthCm",
      ),
      jsonCase({ label: "request click zero", body: withRequest({ clickCm: 0 }) }, "request.clickCm"),
      jsonCase({ label: "request unknown oar type", body: withRequest({ oarType: "canoe" }) }, "request.oarType"),
      jsonCase({ label: "request extra field", body: withRequest({ limits: { maxLengthCm: 999 } }) }, "request.limits"),
      jsonCase(
        {
          label: "request handle move past the inboard",
          body: withRequest({ measured: { lengthCm: 299, inboardCm: 1 }, target: { lengthCm: 250, inboardCm: 88 } }),
        },
        "request.measured.inboardCm",
      ),
    ];
    await expectAllRefusedNaming(session, { url: "/api/rig/plans", method: "POST" }, cases);
    // None of them was recorded: the coach's first real save is new.
    const saved = await session.post("/api/rig/plans", { data: { ...valid, clientId: "0d5e8b1a-6c2f-4a9e-8b3d-7f1e2c4a6b90" } });
    expect(saved.status(), await saved.text()).toBe(201);
    await session.dispose();
  });

  test("POST /api/sign-offs", async ({ baseURL }) => {
    // A load-club athlete who has not passed the quiz, so no case can open a sign-off.
    const session = await apiSession(baseURL!, loadAthleteEmail(38));
    const valid = { moduleSlug: "overall-length", coachId: null };
    const withCoach = (coachId: unknown) => ({ ...valid, coachId });
    // coachId null or left out is "any coach": those bodies are well formed, refused (409) only because the quiz is not passed.
    const wellFormed = new Set(["missing coachId", "coachId null"]);
    const cases: RefusalCase[] = [
      ...commonRefusalCases(valid, { emptyObject: "moduleSlug", numericKeys: ["coachId"] }).map((refusal) =>
        wellFormed.has(refusal.label) ? { ...refusal, field: "moduleSlug", status: 409 } : refusal,
      ),
      { ...jsonCase({ label: "unknown module", body: { ...valid, moduleSlug: "no-such-module" } }, "moduleSlug"), status: 404 },
      jsonCase({ label: "slug with capitals", body: { ...valid, moduleSlug: "Overall-Length" } }, "moduleSlug"),
      { ...jsonCase({ label: "slug of 61 characters", body: { ...valid, moduleSlug: "a".repeat(61) } }, "moduleSlug"), status: 400 },
      jsonCase({ label: "coach id as text", body: withCoach("7") }, "coachId"),
      jsonCase({ label: "coach id fraction", body: withCoach(1.5) }, "coachId"),
      jsonCase({ label: "unknown coach", body: withCoach(999_999) }, "coachId"),
    ];
    await expectAllRefusedNaming(session, { url: "/api/sign-offs", method: "POST" }, cases);
    await session.dispose();
  });

  test("PATCH /api/members/{id}", async ({ baseURL }) => {
    const session = await apiSession(baseURL!, demo.admin);
    const roster = (await (await session.get("/api/roster")).json()) as { athletes: { id: number; email: string }[] };
    const kit = roster.athletes.find((athlete) => athlete.email === "kit@lantern-reach.example")!;
    const otherMember = (label: string, id: string, status: number): RefusalCase => ({
      ...jsonCase({ label, body: { role: "athlete" } }, "id"),
      url: `/api/members/${id}`,
      status,
    });
    const cases: RefusalCase[] = [
      ...commonRefusalCases({ role: "athlete" }, { emptyObject: "role" }),
      jsonCase({ label: "role and status together", body: { role: "athlete", status: "active" } }, "status"),
      jsonCase({ label: "unknown status", body: { status: "resting" } }, "status"),
      jsonCase({ label: "unknown role", body: { role: "cox" } }, "role"),
      jsonCase({ label: "status as boolean", body: { status: false } }, "status"),
      jsonCase({ label: "role in capitals", body: { role: "ATHLETE" } }, "role"),
      jsonCase({ label: "role with spaces", body: { role: " athlete " } }, "role"),
      jsonCase({ label: "empty role", body: { role: "" } }, "role"),
      jsonCase({ label: "empty status", body: { status: "" } }, "status"),
      jsonCase({ label: "role as number", body: { role: 1 } }, "role"),
      jsonCase({ label: "role as object", body: { role: { name: "coach" } } }, "role"),
      jsonCase({ label: "status null", body: { status: null } }, "status"),
      jsonCase({ label: "role and status null", body: { role: null, status: null } }, "role"),
      jsonCase({ label: "id in the body", body: { id: 1, role: "athlete" } }, "id"),
      otherMember("malformed member id", "not-a-number", 400),
      otherMember("unknown member id", "999999", 404),
    ];
    await expectAllRefusedNaming(session, { url: `/api/members/${kit.id}`, method: "PATCH" }, cases);
    await session.dispose();
  });
});
