import { expect, request, test } from "@playwright/test";
import { demo, otherClub } from "./support/auth";
import { apiSession } from "./support/api-session";
import { demoClubRecordId, expectAllRefusedNaming, type RefusalCase } from "./support/bad-input";
import { loadAthleteEmail } from "@/lib/seed/load-athletes";

/**
 * Query strings and path ids. Routes that read a query string validate all of it: a malformed value
 * of a known parameter, a repeated parameter and an unknown parameter are each 400 naming the
 * parameter. Routes addressed by a path id read no query string and ignore one. A malformed id is 400
 * naming it; a well-formed id that is unknown (or not yours) is 404.
 */

/** A URL with these query pairs (repeats allowed), encoded as a browser would. */
function withQuery(path: string, pairs: [string, string][]): string {
  return `${path}?${new URLSearchParams(pairs).toString()}`;
}

interface QueryParam {
  name: string;
  valid: string;
  /** Free text (a search): NaN, negative numbers and injection-looking strings are ordinary words there. */
  freeText?: boolean;
  /** Malformed values particular to this parameter. */
  bad?: [label: string, value: string][];
}

/** The malformed queries every parameter of a route must refuse, plus unknown and repeated parameters. */
function queryCases(path: string, params: QueryParam[]): RefusalCase[] {
  const cases: RefusalCase[] = [];
  const add = (label: string, field: string, pairs: [string, string][]) =>
    cases.push({ label, field, status: 400, url: withQuery(path, pairs) });
  for (const param of params) {
    const { name, valid } = param;
    add(`${name} repeated`, name, [
      [name, valid],
      [name, valid],
    ]);
    add(`${name} huge`, name, [[name, "x".repeat(5000)]]);
    add(`${name} with a control character`, name, [[name, `${valid}\u0000`]]);
    if (!param.freeText) {
      add(`${name} empty`, name, [[name, ""]]);
      add(`${name} NaN`, name, [[name, "NaN"]]);
      add(`${name} Infinity`, name, [[name, "Infinity"]]);
      add(`${name} negative`, name, [[name, "-1"]]);
      add(`${name} SQL-looking`, name, [[name, "' OR 1=1 --"]]);
      add(`${name} script`, name, [[name, "<script>alert(1)</script>"]]);
      add(`${name} in capitals`, name, [[name, valid.toUpperCase() === valid ? `${valid}X` : valid.toUpperCase()]]);
      add(`${name} with spaces around`, name, [[name, ` ${valid} `]]);
    }
    for (const [label, value] of param.bad ?? []) add(`${name} ${label}`, name, [[name, value]]);
  }
  add("unknown parameter", "sort", [["sort", "name"]]);
  add("unknown parameter beside valid ones", "debug", [
    ...params.map((param): [string, string] => [param.name, param.valid]),
    ["debug", "1"],
  ]);
  add("array-style parameter", `${params[0]?.name ?? "filter"}[]`, [[`${params[0]?.name ?? "filter"}[]`, params[0]?.valid ?? "all"]]);
  // (A "__proto__" parameter never reaches the handler: Next drops it while it reads the query.)
  add("constructor parameter", "constructor", [["constructor", "x"]]);
  add("parameter with a huge name", "n".repeat(300), [["n".repeat(300), "1"]]);
  return cases;
}

/** Malformed values for a path id, each sent through `url` (already encoded where it matters). */
function malformedIds(): [label: string, segment: string][] {
  return [
    ["plain words", "not-an-id"],
    ["SQL-looking", encodeURIComponent("' OR '1'='1")],
    ["script", encodeURIComponent("<script>alert(1)</script>")],
    ["huge", "9".repeat(2000)],
    ["negative number", "-1"],
    ["NaN", "NaN"],
    ["Infinity", "Infinity"],
    ["huge number", "1e308"],
    ["NUL byte", "abc%00"],
    ["encoded path", "%2e%2e%2fetc%2fpasswd"],
    ["object text", encodeURIComponent("[object Object]")],
    ["encoded percent", "%25"],
    ["accented letters", encodeURIComponent("éééééééééé")],
    ["emoji", encodeURIComponent("🚣🚣🚣")],
    ["space inside", "a%20b"],
    ["JSON", encodeURIComponent('{"id":1}')],
    ["semicolon", encodeURIComponent("1;DROP TABLE users")],
    ["wildcard", "*"],
  ];
}

function uuidIdCases(url: (id: string) => string, method: string): RefusalCase[] {
  const real = "3f2b8c1e-7d4a-4e9b-a6c5-1b2d3e4f5a6b";
  return [
    ...malformedIds().map(([label, segment]): RefusalCase => ({
      label: `id ${label}`,
      field: "id",
      status: 400,
      url: url(segment),
      method,
    })),
    { label: "id a UUID without dashes", field: "id", status: 400, url: url(real.replace(/-/g, "")), method },
    { label: "id a UUID in braces", field: "id", status: 400, url: url(encodeURIComponent(`{${real}}`)), method },
    { label: "id a UUID with a character more", field: "id", status: 400, url: url(`${real}0`), method },
    { label: "id a UUID with a character less", field: "id", status: 400, url: url(real.slice(0, -1)), method },
    { label: "id a UUID with a non-hex letter", field: "id", status: 400, url: url(`${real.slice(0, -1)}g`), method },
    { label: "id null", field: "id", status: 400, url: url("null"), method },
    { label: "id undefined", field: "id", status: 400, url: url("undefined"), method },
    { label: "id zero", field: "id", status: 400, url: url("0"), method },
    { label: "unknown id", field: "id", status: 404, url: url(real), method },
    { label: "unknown id in capitals", field: "id", status: 404, url: url(real.toUpperCase()), method },
    { label: "the nil UUID", field: "id", status: 404, url: url("00000000-0000-0000-0000-000000000000"), method },
    { label: "unknown id with a query string", field: "id", status: 404, url: `${url(real)}?download=1`, method },
  ];
}

test.describe("query strings and path ids are checked: 4xx JSON naming the parameter", () => {
  test("GET /api/roster", async ({ baseURL }) => {
    const session = await apiSession(baseURL!, demo.coach);
    const cases = queryCases("/api/roster", [
      {
        name: "limit",
        valid: "10",
        bad: [
          ["zero", "0"],
          ["over 500", "501"],
          ["fraction", "1.5"],
          ["exponent", "1e2"],
          ["hex", "0x10"],
          ["plus sign", "+10"],
          ["twenty digits", "9".repeat(20)],
          ["words", "ten"],
        ],
      },
      {
        name: "offset",
        valid: "0",
        bad: [
          ["fraction", "0.5"],
          ["over a billion", "1000000001"],
          ["exponent", "1e9"],
        ],
      },
    ]);
    await expectAllRefusedNaming(session, { url: "/api/roster" }, cases);
    await session.dispose();
  });

  test("GET /api/rig/plans", async ({ baseURL }) => {
    const session = await apiSession(baseURL!, demo.coach);
    const heronId = String(await demoClubRecordId("boats", "Heron"));
    const path = "/api/rig/plans";
    const unknownBoat = (label: string, value: string): RefusalCase => ({
      label,
      field: "boat",
      status: 404,
      url: withQuery(path, [["boat", value]]),
    });
    const cases: RefusalCase[] = [
      ...queryCases(path, [
        {
          name: "boat",
          valid: heronId,
          bad: [
            ["zero", "0"],
            ["negative zero", "-0"],
            ["fraction", "1.5"],
            ["exponent", "1e2"],
            ["hex", "0x10"],
            ["plus sign", "+1"],
            ["twenty digits", "9".repeat(20)],
            ["a boat's name", "Heron"],
            ["a list", `${heronId},${heronId}`],
            ["JSON", `[${heronId}]`],
            ["with a unit", `${heronId}cm`],
          ],
        },
      ]),
      unknownBoat("unknown boat", "999999"),
      unknownBoat("unknown boat: the largest id", "999999999"),
      unknownBoat("unknown boat with leading zeros", "000999999"),
    ];
    await expectAllRefusedNaming(session, { url: path }, cases);
    // The list itself and one boat's plans still answer.
    expect((await session.get(path)).status()).toBe(200);
    expect((await session.get(withQuery(path, [["boat", heronId]]))).status()).toBe(200);
    await session.dispose();
    // Another club's coach is told the boat does not exist.
    const stranger = await apiSession(baseURL!, otherClub.coach, otherClub.password);
    const hidden = await stranger.get(withQuery(path, [["boat", heronId]]));
    expect(hidden.status()).toBe(404);
    expect(((await hidden.json()) as { fields: Record<string, string[]> }).fields).toHaveProperty("boat");
    await stranger.dispose();
  });

  /** Routes that take no parameters: every one is unknown, whatever its value. */
  const noParameterRoutes: [path: string, account: (() => string) | null][] = [
    ["/api/roster/matrix", () => demo.coach],
    // A load-club athlete: reading progress changes nothing, but keep demo members out of it anyway.
    ["/api/me/progress", () => loadAthleteEmail(35)],
    // Public: no session.
    ["/api/health", null],
    ["/api/bench/ping", null],
  ];
  for (const [path, account] of noParameterRoutes) {
    test(`GET ${path} (takes no parameters${account ? "" : ", public"})`, async ({ baseURL }) => {
      const session = account ? await apiSession(baseURL!, account()) : await request.newContext({ baseURL });
      const unknown = (label: string, pairs: [string, string][], field: string): RefusalCase => ({
        label,
        field,
        status: 400,
        url: withQuery(path, pairs),
      });
      const cases: RefusalCase[] = [
        ...["filter", "q", "limit", "offset", "sort", "module", "athlete", "page", "format", "debug"].flatMap((name) => [
          unknown(`${name}=NaN`, [[name, "NaN"]], name),
          unknown(`${name} huge`, [[name, "x".repeat(5000)]], name),
          unknown(`${name} SQL-looking`, [[name, "' OR 1=1 --"]], name),
        ]),
        unknown(
          "repeated parameter",
          [
            ["limit", "1"],
            ["limit", "2"],
          ],
          "limit",
        ),
        unknown("negative limit", [["limit", "-1"]], "limit"),
        unknown("array-style parameter", [["filter[]", "all"]], "filter[]"),
        unknown("constructor parameter", [["constructor", "x"]], "constructor"),
      ];
      await expectAllRefusedNaming(session, { url: path }, cases);
      expect((await session.get(path)).status()).toBe(200);
      await session.dispose();
    });
  }

  test("GET /api/roster/matrix/export", async ({ baseURL }) => {
    const session = await apiSession(baseURL!, demo.coach);
    const cases = queryCases("/api/roster/matrix/export", [
      {
        name: "filter",
        valid: "cleared",
        bad: [
          ["unknown", "everyone"],
          ["a near miss", "waiting_for_me"],
          ["a number", "1"],
          ["a list", "cleared,not-cleared"],
          ["true", "true"],
          ["with a plus", "not+cleared"],
          ["accented", "cléared"],
        ],
      },
      {
        name: "q",
        valid: "ada",
        freeText: true,
        bad: [
          ["of 101 characters", "a".repeat(101)],
          ["with a line break", "ada\nbilal"],
          ["with a tab", "ada\tbilal"],
          ["with an escape character", "\u001b[31mada"],
        ],
      },
    ]);
    await expectAllRefusedNaming(session, { url: "/api/roster/matrix/export" }, cases);
    // What the roster page links to still works, an empty search included.
    expect(
      (
        await session.get(
          withQuery("/api/roster/matrix/export", [
            ["filter", "all"],
            ["q", ""],
          ]),
        )
      ).status(),
    ).toBe(200);
    await session.dispose();
  });

  for (const format of ["csv", "pdf"] as const) {
    test(`GET /api/register/${format}`, async ({ baseURL }) => {
      test.setTimeout(120_000);
      const session = await apiSession(baseURL!, demo.admin);
      const path = `/api/register/${format}`;
      const dateBad: [string, string][] = [
        ["not a date", "yesterday"],
        ["30 February", "2026-02-30"],
        ["month 13", "2026-13-01"],
        ["without zeros", "2026-1-1"],
        ["with a time", "2026-01-01T00:00:00Z"],
        ["a five-digit year", "20260-01-01"],
      ];
      const cases: RefusalCase[] = [
        ...queryCases(path, [
          {
            name: "module",
            valid: "overall-length",
            bad: [
              ["unknown", "no-such-module"],
              ["path-like", "../overall-length"],
            ],
          },
          { name: "kind", valid: "module", bad: [["unknown", "badge"]] },
          {
            name: "status",
            valid: "valid",
            bad: [
              ["unknown", "lapsed"],
              ["a list", "valid,expired"],
            ],
          },
          { name: "from", valid: "2026-01-01", bad: dateBad },
          { name: "to", valid: "2026-12-31", bad: dateBad },
        ]),
        {
          label: "from after to",
          field: "to",
          status: 400,
          url: withQuery(path, [
            ["from", "2026-06-01"],
            ["to", "2026-05-01"],
          ]),
        },
      ];
      await expectAllRefusedNaming(session, { url: path }, cases);
      // The page's own links still work.
      const linked = await session.get(
        withQuery(path, [
          ["module", "overall-length"],
          ["kind", "module"],
          ["status", "valid"],
          ["from", "2020-01-01"],
          ["to", "2099-12-31"],
        ]),
      );
      expect(linked.status()).toBe(200);
      await session.dispose();
    });
  }

  test("GET /api/verify/{code} (public)", async ({ playwright, baseURL }) => {
    const admin = await apiSession(baseURL!, demo.admin);
    const register = await (await admin.get("/api/register/csv")).text();
    const code = /\/verify\/([A-Za-z0-9_-]{24})/.exec(register)?.[1];
    expect(code, "a verification code in the register").toBeTruthy();
    await admin.dispose();
    const anonymous = await playwright.request.newContext({ baseURL });
    const url = (segment: string) => `/api/verify/${segment}`;
    const flipped = code!.replace(/[a-zA-Z]/, (letter) => (letter === letter.toLowerCase() ? letter.toUpperCase() : letter.toLowerCase()));
    const cases: RefusalCase[] = [
      ...malformedIds().map(([label, segment]): RefusalCase => ({ label: `code ${label}`, field: "code", status: 400, url: url(segment) })),
      { label: "code one character short", field: "code", status: 400, url: url(code!.slice(0, -1)) },
      { label: "code one character long", field: "code", status: 400, url: url(`${code!}A`) },
      { label: "code with base64 padding", field: "code", status: 400, url: url(`${code!}${encodeURIComponent("==")}`) },
      { label: "code with a file extension", field: "code", status: 400, url: url(`${code!}.json`) },
      { label: "code in standard base64", field: "code", status: 400, url: url(encodeURIComponent(`${code!.slice(0, -1)}+`)) },
      { label: "code null", field: "code", status: 400, url: url("null") },
      {
        label: "code with a slash inside",
        field: "code",
        status: 400,
        url: url(encodeURIComponent(`${code!.slice(0, 12)}/${code!.slice(13)}`)),
      },
      { label: "code with a space inside", field: "code", status: 400, url: url(`${code!.slice(0, 12)}%20${code!.slice(13)}`) },
      { label: "unknown code", field: "code", status: 404, url: url("A".repeat(24)) },
      { label: "unknown code of dashes", field: "code", status: 404, url: url("-".repeat(24)) },
      { label: "code with one letter's case changed", field: "code", status: 404, url: url(flipped) },
      { label: "unknown code with a query string", field: "code", status: 404, url: `${url("Z".repeat(24))}?utm_source=chat` },
    ];
    await expectAllRefusedNaming(anonymous, { url: url(code!) }, cases);
    // Query strings are ignored on id routes: a shared link with tracking parameters still verifies.
    expect((await anonymous.get(`${url(code!)}?utm_source=chat`)).status()).toBe(200);
    await anonymous.dispose();
  });

  test("GET /api/certificates/{id}/pdf", async ({ baseURL }) => {
    const session = await apiSession(baseURL!, demo.admin);
    await expectAllRefusedNaming(
      session,
      { url: "/api/certificates" },
      uuidIdCases((id) => `/api/certificates/${id}/pdf`, "GET"),
    );
    await session.dispose();
  });

  test("GET /api/evidence/{id}", async ({ baseURL }) => {
    const session = await apiSession(baseURL!, demo.coach);
    await expectAllRefusedNaming(
      session,
      { url: "/api/evidence" },
      uuidIdCases((id) => `/api/evidence/${id}`, "GET"),
    );
    await session.dispose();
  });

  test("DELETE /api/evidence/{id}", async ({ baseURL }) => {
    // Only malformed and unknown ids: no case may remove a real photo.
    const session = await apiSession(baseURL!, demo.coach);
    await expectAllRefusedNaming(
      session,
      { url: "/api/evidence" },
      uuidIdCases((id) => `/api/evidence/${id}`, "DELETE"),
    );
    await session.dispose();
  });

  test("POST /api/modules/{slug}/attempts", async ({ baseURL }) => {
    // A load-club athlete, so demo members keep their state; no case may open an attempt.
    const session = await apiSession(baseURL!, loadAthleteEmail(39));
    const url = (slug: string) => `/api/modules/${slug}/attempts`;
    const cases: RefusalCase[] = [
      ...malformedIds()
        // Kebab-case words are well-formed slugs (unknown modules, 404 below), not malformed ones.
        .filter(([label]) => !["plain words", "huge number"].includes(label))
        .map(([label, segment]): RefusalCase => ({ label: `slug ${label}`, field: "slug", status: 400, url: url(segment) })),
      { label: "slug in capitals", field: "slug", status: 400, url: url("OVERALL-LENGTH") },
      { label: "slug with an underscore", field: "slug", status: 400, url: url("overall_length") },
      { label: "slug with a dot", field: "slug", status: 400, url: url("overall.length") },
      { label: "slug with a double dash", field: "slug", status: 400, url: url("overall--length") },
      { label: "slug with a leading dash", field: "slug", status: 400, url: url("-overall-length") },
      { label: "slug with a trailing dash", field: "slug", status: 400, url: url("overall-length-") },
      { label: "slug of 61 characters", field: "slug", status: 400, url: url("a".repeat(61)) },
      { label: "slug with a space", field: "slug", status: 400, url: url("overall%20length") },
      { label: "unknown module", field: "slug", status: 404, url: url("no-such-module") },
      { label: "unknown module: a number", field: "slug", status: 404, url: url("12345") },
      { label: "unknown module: 1e308", field: "slug", status: 404, url: url("1e308") },
      { label: "unknown module: null", field: "slug", status: 404, url: url("null") },
      { label: "unknown module: a longer name", field: "slug", status: 404, url: url("overall-length-advanced") },
      {
        label: "unknown module with a JSON body",
        field: "slug",
        status: 404,
        url: url("no-such-module"),
        body: "{not json",
        headers: { "Content-Type": "application/json" },
      },
    ];
    await expectAllRefusedNaming(session, { url: url("overall-length"), method: "POST" }, cases);
    await session.dispose();
  });
});

test("paths under /api that no route serves answer a JSON 404 for every method", async ({ baseURL }) => {
  const session = await apiSession(baseURL!, demo.coach);
  for (const [method, path] of [
    ["GET", "/api/verify/a/b"],
    ["GET", "/api/no-such-thing"],
    ["POST", "/api/roster/nope"],
    ["DELETE", "/api/certificates"],
  ] as const) {
    const response = await session.fetch(path, { method, ...(method === "POST" ? { data: {} } : {}) });
    expect(response.status(), `${method} ${path}`).toBe(404);
    expect(response.headers()["content-type"]).toContain("application/json");
    expect(((await response.json()) as { error: string }).error).toBe("not_found");
  }
  await session.dispose();
});
