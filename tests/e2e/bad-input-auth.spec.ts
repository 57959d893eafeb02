import { expect, request, test } from "@playwright/test";
import { demo } from "./support/auth";
import { loadAthleteEmail } from "@/lib/seed/load-athletes";
import { expectAllRefusedNaming, huge, nextClientAddress, type RefusalCase } from "./support/bad-input";

/**
 * next-auth's POST endpoints (password and link sign-in, sign-out) through the real server. The auth
 * route checks each form strictly before next-auth reads it (lib/validations/auth-forms.ts): every case
 * is a 4xx JSON answer naming the field, never a 500 (next-auth itself answered malformed JSON with one).
 */

const form = "application/x-www-form-urlencoded";

/** A form case: the pairs are encoded as a browser would (repeats allowed). */
function formCase(label: string, field: string, pairs: [string, string][], extra: Partial<RefusalCase> = {}): RefusalCase {
  return { label, field, headers: { "Content-Type": form }, body: new URLSearchParams(pairs).toString(), ...extra };
}

/** Cases for one action, from its valid pairs: each breaks exactly one thing. */
function actionCases(action: string, valid: [string, string][]): RefusalCase[] {
  const url = `/api/auth/${action}`;
  const without = (name: string) => valid.filter(([key]) => key !== name);
  const replacing = (name: string, value: string): [string, string][] => valid.map(([key, old]) => [key, key === name ? value : old]);
  const cases: RefusalCase[] = [];
  for (const [name, value] of valid) {
    if (name === "json") continue;
    cases.push(formCase(`${action}: missing ${name}`, name, without(name), { url }));
    cases.push(formCase(`${action}: ${name} repeated`, name, [...valid, [name, value]], { url }));
    cases.push(formCase(`${action}: ${name} huge`, name, replacing(name, "y".repeat(9000)), { url }));
  }
  cases.push(formCase(`${action}: unknown field`, "sneaky", [...valid, ["sneaky", "1"]], { url }));
  cases.push(formCase(`${action}: json not "true"`, "json", replacing("json", "yes"), { url }));
  cases.push(formCase(`${action}: csrfToken not hex`, "csrfToken", replacing("csrfToken", "z".repeat(64)), { url }));
  return cases;
}

test.describe("bad input: next-auth's endpoints", () => {
  test("POST /api/auth/callback/password, callback/link, signout, and the actions served to neither GET nor POST", async ({ baseURL }) => {
    // The CSRF token must be well-formed for the cases that break something else; its value does not matter.
    const session = await request.newContext({ baseURL });
    // A load-club athlete: its one wrong password below never adds up with other specs' sign-ins.
    const athlete = loadAthleteEmail(36);
    const { csrfToken } = (await (await session.get("/api/auth/csrf")).json()) as { csrfToken: string };
    const password: [string, string][] = [
      ["email", athlete],
      ["password", demo.password],
      ["csrfToken", csrfToken],
      ["json", "true"],
    ];
    const link: [string, string][] = [
      ["token", "A".repeat(43)],
      ["csrfToken", csrfToken],
      ["json", "true"],
    ];
    const signout: [string, string][] = [
      ["csrfToken", csrfToken],
      ["json", "true"],
    ];
    const validBody = new URLSearchParams(password).toString();
    const notTakingPost = (path: string): RefusalCase => formCase(`POST ${path}`, "path", password, { url: path, status: 404 });

    const cases: RefusalCase[] = [
      {
        label: "JSON body",
        field: "content-type",
        status: 415,
        headers: { "Content-Type": "application/json" },
        body: JSON.stringify(Object.fromEntries(password)),
      },
      { label: "malformed JSON", field: "content-type", status: 415, headers: { "Content-Type": "application/json" }, body: "{not json" },
      { label: "plain text", field: "content-type", status: 415, headers: { "Content-Type": "text/plain" }, body: validBody },
      { label: "no content type", field: "content-type", status: 415, headers: { "Content-Type": "" }, body: validBody },
      { label: "multipart", field: "content-type", status: 415, multipart: Object.fromEntries(password) },
      { label: "body over 32 KB", field: "body", status: 413, headers: { "Content-Type": form }, body: `${validBody}&callbackUrl=${huge}` },
      formCase("empty form", "email", []),
      formCase("email not an address", "email", [["email", "not-an-address"], ...password.slice(1)]),
      formCase("email with a NUL byte", "email", [["email", `${athlete}\u0000`], ...password.slice(1)]),
      formCase("password empty", "password", [password[0]!, ["password", ""], ...password.slice(2)]),
      formCase("password of 129 characters", "password", [password[0]!, ["password", "p".repeat(129)], ...password.slice(2)]),
      formCase("csrfToken too short", "csrfToken", [...password.slice(0, 2), ["csrfToken", "abc"], ["json", "true"]]),
      formCase("csrfToken in capitals", "csrfToken", [...password.slice(0, 2), ["csrfToken", csrfToken.toUpperCase()], ["json", "true"]]),
      formCase("__proto__ field", "__proto__", [...password, ["__proto__", "x"]]),
      formCase("array-style field", "email[]", [...password, ["email[]", athlete]]),
      formCase("redirect neither true nor false", "redirect", [...password, ["redirect", "maybe"]]),
      formCase("charset in the content type, csrfToken missing", "csrfToken", password.slice(0, 2), {
        headers: { "Content-Type": `${form}; charset=UTF-8` },
      }),
      ...actionCases("callback/password", password),
      ...actionCases("callback/link", link),
      formCase("link token of the wrong length", "token", [["token", "A".repeat(42)], ...link.slice(1)], {
        url: "/api/auth/callback/link",
      }),
      formCase("link with a password field", "password", [...link, ["password", "x"]], { url: "/api/auth/callback/link" }),
      ...actionCases("signout", signout),
      formCase("signout with an e-mail field", "email", [...signout, ["email", athlete]], { url: "/api/auth/signout" }),
      notTakingPost("/api/auth/session"),
      notTakingPost("/api/auth/signin/password"),
      notTakingPost("/api/auth/callback/no-such-provider"),
      notTakingPost("/api/auth/csrf"),
      notTakingPost("/api/auth/_log"),
      // GET: only the session, CSRF token, provider list, sign-in and error; next-auth answered a GET of
      // the credentials callback with a 500 and unknown actions with plain text.
      ...[
        "/api/auth/callback/password",
        "/api/auth/callback/password?code=1&state=2",
        "/api/auth/callback/no-such-provider",
        "/api/auth/signout",
        "/api/auth/verify-request",
        "/api/auth/_log",
        "/api/auth/no-such-action",
        "/api/auth/session/extra",
        "/api/auth/signin/password",
        "/api/auth/csrf/%00",
      ].map((path): RefusalCase => ({ label: `GET ${path}`, field: "path", status: 404, url: path, method: "GET" })),
    ];
    await expectAllRefusedNaming(session, { url: "/api/auth/callback/password", method: "POST" }, cases);

    // Refusals carry the `url` next-auth's client reads, so a refused sign-in shows the form's own message.
    const refused = await session.post("/api/auth/callback/password", {
      headers: { "x-forwarded-for": nextClientAddress() },
      form: { email: "not-an-address", password: "x", csrfToken, json: "true" },
    });
    expect(refused.status()).toBe(400);
    expect(((await refused.json()) as { url: string }).url).toMatch(/\/sign-in\?error=invalid$/);

    // The same form, well-formed, still reaches next-auth: a wrong password is its 401, a right one signs in.
    const wrong = await session.post("/api/auth/callback/password", {
      headers: { "x-forwarded-for": nextClientAddress() },
      form: { email: athlete, password: "not-the-password", csrfToken, json: "true" },
    });
    expect(wrong.status()).toBe(401);
    const right = await session.post("/api/auth/callback/password", {
      headers: { "x-forwarded-for": nextClientAddress() },
      form: { email: athlete, password: demo.password, csrfToken, json: "true" },
    });
    expect(right.status()).toBe(200);
    expect(((await (await session.get("/api/auth/session")).json()) as { user?: { email?: string } }).user?.email).toBe(athlete);
    await session.dispose();
  });
});
