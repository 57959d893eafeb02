import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { createTempDataDir } from "@/tests/support/temp-data-dir";
import { installNextHeadersStandIn, withRequest } from "@/tests/support/request-scope";
import { callAuth, passwordSignIn, signOutThroughHandler, testOrigin } from "@/tests/support/auth-handler";

vi.mock("next/headers", async () => (await import("@/tests/support/request-scope")).nextHeadersStandIn);

createTempDataDir("sign-in-hardening");
installNextHeadersStandIn();

const { closeDatabase, getSequelize } = await import("@/lib/db");
const { databaseReady } = await import("@/lib/data/database");
const { seedDemoClub, demoPassword } = await import("@/lib/seed/demo-club");
const { currentActor } = await import("@/lib/auth/session");
const { signInFailureLimit } = await import("@/lib/auth/throttle");
const { User } = await import("@/models");

beforeAll(async () => {
  await databaseReady();
  await seedDemoClub(getSequelize());
});

afterAll(async () => {
  await closeDatabase();
});

afterEach(() => {
  delete process.env.SLIPWAY_TRUST_PROXY;
});

function from(address: string): Record<string, string> {
  return { "x-forwarded-for": address };
}

async function actorWithCookie(cookie: string) {
  const request = new Request(`${testOrigin}/learn`, { headers: { cookie } });
  return withRequest(request, () => currentActor());
}

describe("password sign-in through the next-auth route handler", () => {
  it("signs in with the right password and sets an HttpOnly, SameSite=Lax session cookie (not Secure over http)", async () => {
    const { response, cookie } = await passwordSignIn("coach.ines@lantern-reach.example", demoPassword, from("198.51.100.1"));
    expect(response.status).toBe(200);
    const sessionCookie = response.headers.getSetCookie().find((line) => line.startsWith("next-auth.session-token="));
    expect(sessionCookie).toBeDefined();
    expect(sessionCookie).toMatch(/HttpOnly/i);
    expect(sessionCookie).toMatch(/SameSite=Lax/i);
    expect(sessionCookie).not.toMatch(/Secure/i);
    expect(await actorWithCookie(cookie)).toMatchObject({ email: "coach.ines@lantern-reach.example", role: "coach" });
  });

  it("uses __Secure- cookies with the Secure flag when the public address is https", async () => {
    const before = process.env.NEXTAUTH_URL;
    process.env.NEXTAUTH_URL = "https://slipway.example";
    try {
      const { response } = await passwordSignIn("coach.ines@lantern-reach.example", demoPassword, from("198.51.100.2"));
      expect(response.status).toBe(200);
      const sessionCookie = response.headers.getSetCookie().find((line) => line.startsWith("__Secure-next-auth.session-token="));
      expect(sessionCookie).toMatch(/;\s*Secure/i);
      expect(sessionCookie).toMatch(/HttpOnly/i);
      expect(sessionCookie).toMatch(/SameSite=Lax/i);
    } finally {
      process.env.NEXTAUTH_URL = before;
    }
  });
});

describe("sign-in throttling", () => {
  it("answers 429 to the 11th attempt on one account within 15 minutes, even with the right password", async () => {
    process.env.SLIPWAY_TRUST_PROXY = "1";
    const account = "dev@lantern-reach.example";
    for (let attempt = 1; attempt <= signInFailureLimit; attempt += 1) {
      // A different address each time: only the per-account limit can be what stops the 11th.
      const { response } = await passwordSignIn(account, `wrong-password-${attempt}`, from(`203.0.113.${attempt}`));
      expect(response.status, `attempt ${attempt}`).toBe(401);
    }
    const eleventh = await passwordSignIn(account, demoPassword, from("203.0.113.99"));
    expect(eleventh.response.status).toBe(429);
    expect(eleventh.response.headers.get("retry-after")).toBe("900");
    expect(await eleventh.response.json()).toMatchObject({ error: "too_many_requests" });
    expect(eleventh.response.headers.getSetCookie().some((line) => line.includes("session-token"))).toBe(false);

    const otherAccount = await passwordSignIn("elin@lantern-reach.example", demoPassword, from("203.0.113.99"));
    expect(otherAccount.response.status).toBe(200);
  });

  it("answers 429 to the 11th failure from one address, whichever accounts it tried", async () => {
    process.env.SLIPWAY_TRUST_PROXY = "1";
    const address = from("192.0.2.50");
    for (let attempt = 1; attempt <= signInFailureLimit; attempt += 1) {
      const { response } = await passwordSignIn(`throwaway.${attempt}@nowhere.example`, "not-a-real-password", address);
      expect(response.status, `attempt ${attempt}`).toBe(401);
    }
    expect((await passwordSignIn("femi@lantern-reach.example", demoPassword, address)).response.status).toBe(429);
    // The client's own claim left of the proxy's entry does not move it to a fresh bucket.
    expect((await passwordSignIn("femi@lantern-reach.example", demoPassword, from("10.9.9.9, 192.0.2.50"))).response.status).toBe(429);
    expect((await passwordSignIn("femi@lantern-reach.example", demoPassword, from("192.0.2.51"))).response.status).toBe(200);
  });

  it("does not count requests refused for a missing CSRF token as failures", async () => {
    process.env.SLIPWAY_TRUST_PROXY = "1";
    for (let attempt = 1; attempt <= signInFailureLimit + 2; attempt += 1) {
      const { response } = await callAuth("POST", ["callback", "password"], {
        headers: from("192.0.2.60"),
        form: { email: "greta@lantern-reach.example", password: "whatever-it-is", json: "true" },
      });
      expect(response.status).not.toBe(429);
    }
    expect((await passwordSignIn("greta@lantern-reach.example", demoPassword, from("192.0.2.60"))).response.status).toBe(200);
  });
});

describe("sign-out", () => {
  it("moves the token version on, so a copy of the signed-out cookie no longer works", async () => {
    const { cookie } = await passwordSignIn("hamish@lantern-reach.example", demoPassword, from("198.51.100.20"));
    const copied = cookie;
    const before = await User.findOne({ where: { email: "hamish@lantern-reach.example" } });
    expect(await actorWithCookie(copied)).toMatchObject({ email: "hamish@lantern-reach.example" });

    const signedOut = await signOutThroughHandler(cookie);
    expect(signedOut.response.status).toBe(200);
    const after = await User.findOne({ where: { email: "hamish@lantern-reach.example" } });
    expect(after!.tokenVersion).toBe(before!.tokenVersion + 1);
    expect(await actorWithCookie(copied)).toBeNull();

    // Replaying the dead cookie's sign-out changes nothing more.
    await signOutThroughHandler(copied);
    expect((await User.findOne({ where: { email: "hamish@lantern-reach.example" } }))!.tokenVersion).toBe(after!.tokenVersion);

    const again = await passwordSignIn("hamish@lantern-reach.example", demoPassword, from("198.51.100.20"));
    expect(await actorWithCookie(again.cookie)).toMatchObject({ email: "hamish@lantern-reach.example" });
  });
});
