import { expect, test, type APIRequestContext } from "@playwright/test";
import { demo } from "./support/auth";
import { apiSession } from "./support/api-session";
import { loadAthleteEmail } from "@/lib/seed/load-athletes";

/** One malformed request: a body (object → JSON; string → sent raw) and an optional content type. */
interface BadInput {
  label: string;
  body: unknown;
  contentType?: string;
}

const huge = "x".repeat(70_000);

/** Malformed bodies every JSON endpoint must refuse with a 4xx JSON message (never 5xx, never a stack). */
function commonBadInputs(validBody: Record<string, unknown>, numericKeys: string[] = []): BadInput[] {
  const keys = Object.keys(validBody);
  const inputs: BadInput[] = [
    { label: "not JSON", body: "{not json", contentType: "application/json" },
    { label: "truncated JSON", body: JSON.stringify(validBody).slice(0, -3), contentType: "application/json" },
    { label: "empty body", body: "", contentType: "application/json" },
    { label: "JSON null", body: "null", contentType: "application/json" },
    { label: "JSON array", body: "[]", contentType: "application/json" },
    { label: "JSON string", body: '"hello"', contentType: "application/json" },
    { label: "JSON number", body: "42", contentType: "application/json" },
    { label: "form encoded", body: "a=1&b=2", contentType: "application/x-www-form-urlencoded" },
    { label: "plain text", body: JSON.stringify(validBody), contentType: "text/plain" },
    { label: "no content type", body: JSON.stringify(validBody), contentType: "" },
    { label: "empty object", body: {} },
    { label: "extra field", body: { ...validBody, sneaky: true } },
    { label: "prototype pollution", body: JSON.parse(`{"__proto__": {"admin": true}, ${JSON.stringify(validBody).slice(1)}`) as unknown },
    { label: "huge body", body: { ...validBody, padding: huge } },
  ];
  for (const key of keys) {
    const rest = { ...validBody };
    delete rest[key];
    inputs.push({ label: `missing ${key}`, body: rest });
    inputs.push({ label: `${key} null`, body: { ...validBody, [key]: null } });
    inputs.push({ label: `${key} wrong type (array)`, body: { ...validBody, [key]: [1, 2] } });
    inputs.push({ label: `${key} wrong type (boolean)`, body: { ...validBody, [key]: true } });
    inputs.push({ label: `${key} huge string`, body: { ...validBody, [key]: huge.slice(0, 5000) } });
  }
  for (const key of numericKeys) {
    inputs.push({ label: `${key} "NaN"`, body: { ...validBody, [key]: "NaN" } });
    inputs.push({ label: `${key} "Infinity"`, body: { ...validBody, [key]: "Infinity" } });
    inputs.push({ label: `${key} negative`, body: { ...validBody, [key]: -1 } });
    inputs.push({ label: `${key} huge number`, body: { ...validBody, [key]: 1e308 } });
  }
  return inputs;
}

let callNumber = 0;

async function send(session: APIRequestContext, url: string, input: BadInput, method = "POST") {
  const raw = typeof input.body === "string";
  callNumber += 1;
  // A different documentation address per call, so the public planner's per-address throttle never
  // answers these (and later specs from 127.0.0.1 keep their budget).
  const headers: Record<string, string> = { "x-forwarded-for": `198.18.${Math.floor(callNumber / 250)}.${callNumber % 250}` };
  if (input.contentType !== undefined) headers["Content-Type"] = input.contentType;
  else headers["Content-Type"] = "application/json";
  return session.fetch(url, { method, headers, data: raw ? (input.body as string) : JSON.stringify(input.body) });
}

async function expectAllRefused(session: APIRequestContext, url: string, inputs: BadInput[], method = "POST") {
  expect(inputs.length).toBeGreaterThanOrEqual(30);
  const failures: string[] = [];
  for (const input of inputs) {
    const response = await send(session, url, input, method);
    const text = await response.text();
    const status = response.status();
    let body: { message?: string; fields?: Record<string, string[]> } = {};
    try {
      body = JSON.parse(text) as typeof body;
    } catch {
      failures.push(`${input.label}: not JSON (${status})`);
      continue;
    }
    if (status < 400 || status >= 500) failures.push(`${input.label}: status ${status}`);
    if (!body.message) failures.push(`${input.label}: no message`);
    if (/\bat .+\.(js|ts):\d+/.test(text)) failures.push(`${input.label}: stack trace in body`);
  }
  expect(failures).toEqual([]);
}

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

  test("POST /api/modules/{slug}/attempts with unknown or malformed modules", async ({ baseURL }) => {
    const session = await apiSession(baseURL!, loadAthleteEmail(39));
    const cases: [string, number][] = [
      ["/api/modules/no-such-module/attempts", 404],
      ["/api/modules/BAD_SLUG/attempts", 400],
      ["/api/modules/%2e%2e%2fetc/attempts", 400],
      [`/api/modules/${"a".repeat(100)}/attempts`, 400],
    ];
    for (const [url, status] of cases) {
      const response = await session.post(url);
      expect(response.status(), url).toBe(status);
      expect(((await response.json()) as { message: string }).message).toBeTruthy();
    }
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
