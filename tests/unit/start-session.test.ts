import { afterEach, describe, expect, it, vi } from "vitest";
import { startSession } from "@/lib/auth/start-session";
import { linkSignInFormSchema, passwordSignInFormSchema } from "@/lib/validations/auth-forms";

const origin = "http://127.0.0.1:3000";
const csrfToken = "a".repeat(64);

/** A fetch that answers the CSRF request, then the callback with `callback` (or rejects with it). */
function fakeServer(callback: Response | Error) {
  const sent: { url: string; body: URLSearchParams | null }[] = [];
  const fetch = vi.fn(async (url: string, init?: RequestInit) => {
    sent.push({ url, body: (init?.body as URLSearchParams | undefined) ?? null });
    if (url === "/api/auth/csrf") return Response.json({ csrfToken });
    if (callback instanceof Error) throw callback;
    return callback;
  });
  vi.stubGlobal("fetch", fetch);
  vi.stubGlobal("window", { location: { origin, href: `${origin}/sign-in` } });
  return sent;
}

describe("startSession", () => {
  afterEach(() => vi.unstubAllGlobals());

  it("sends what the server's strict sign-in forms accept, and reads a sign-in", async () => {
    const sent = fakeServer(Response.json({ url: `${origin}/sign-in` }));
    expect(await startSession("password", { email: "ada@lantern-reach.example", password: "lantern-reach-demo" })).toEqual({ ok: true });
    expect(sent.map((entry) => entry.url)).toEqual(["/api/auth/csrf", "/api/auth/callback/password"]);
    const form = Object.fromEntries(sent[1]!.body!);
    expect(form).toMatchObject({ csrfToken, json: "true", callbackUrl: `${origin}/sign-in` });
    expect(passwordSignInFormSchema.safeParse(form).success).toBe(true);

    const link = fakeServer(Response.json({ url: `${origin}/home` }));
    expect(await startSession("link", { token: "A".repeat(43) }, "/home")).toEqual({ ok: true });
    expect(linkSignInFormSchema.safeParse(Object.fromEntries(link[1]!.body!)).success).toBe(true);
  });

  it("tells a refusal from a throttle", async () => {
    fakeServer(Response.json({ url: `${origin}/api/auth/error?error=CredentialsSignin` }, { status: 401 }));
    expect(await startSession("password", { email: "a@b.example", password: "wrong-password" })).toEqual({ ok: false, reason: "refused" });
    fakeServer(Response.json({ url: `${origin}/sign-in?error=invalid` }));
    expect(await startSession("password", { email: "a@b.example", password: "wrong-password" })).toEqual({ ok: false, reason: "refused" });
    fakeServer(Response.json({ url: `${origin}/sign-in?error=throttled` }, { status: 429 }));
    expect(await startSession("password", { email: "a@b.example", password: "wrong-password" })).toEqual({
      ok: false,
      reason: "throttled",
    });
  });

  it("says the server was not reached when the request fails or the server breaks, rather than refusing", async () => {
    fakeServer(new TypeError("Failed to fetch"));
    expect(await startSession("password", { email: "a@b.example", password: "x".repeat(12) })).toEqual({ ok: false, reason: "unreached" });
    fakeServer(new Response("Internal Server Error", { status: 500 }));
    expect(await startSession("password", { email: "a@b.example", password: "x".repeat(12) })).toEqual({ ok: false, reason: "unreached" });
  });
});
