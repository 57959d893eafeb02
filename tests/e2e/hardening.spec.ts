import { expect, test, type APIRequestContext } from "@playwright/test";
import { demo, openNewestMailTo, signIn } from "./support/auth";

test.describe("sessions", () => {
  test("signing out ends the session for real: a copied cookie stops working", async ({ page, browser, baseURL }) => {
    await signIn(page, demo.athlete);
    const copied = (await page.context().cookies()).filter((cookie) => cookie.name.includes("next-auth.session-token"));
    expect(copied).toHaveLength(1);

    const thief = await browser.newContext();
    await thief.addCookies(copied);
    const thiefPage = await thief.newPage();
    await thiefPage.goto("/learn");
    await expect(thiefPage.getByTestId("learn-page")).toBeVisible();
    expect((await thiefPage.request.get("/api/roster")).status()).toBe(403);

    await page.getByRole("button", { name: "Sign out" }).click();
    await expect(page).toHaveURL(/\/sign-in/);

    await thiefPage.goto("/learn");
    await expect(thiefPage).toHaveURL(/\/sign-in\?callbackUrl=%2Flearn/);
    const api = await thiefPage.request.get("/api/roster");
    expect(api.status()).toBe(401);
    expect(await api.json()).toMatchObject({ error: "unauthenticated" });
    expect(new URL(thiefPage.url()).origin).toBe(baseURL);
    await thief.close();
  });

  test("the session cookie is HttpOnly and SameSite=Lax (Secure only over https)", async ({ page }) => {
    await signIn(page, demo.coach);
    const session = (await page.context().cookies()).find((cookie) => cookie.name === "next-auth.session-token");
    expect(session).toMatchObject({ httpOnly: true, sameSite: "Lax", secure: false, path: "/" });
  });
});

test.describe("security headers", () => {
  function expectSecurityHeaders(headers: Record<string, string>) {
    expect(headers["content-security-policy"]).toContain("frame-ancestors 'none'");
    expect(headers["content-security-policy"]).toContain("default-src 'self'");
    expect(headers["x-content-type-options"]).toBe("nosniff");
    expect(headers["referrer-policy"]).toBe("strict-origin-when-cross-origin");
    expect(headers["x-frame-options"]).toBe("DENY");
    expect(headers["x-powered-by"]).toBeUndefined();
  }

  test("are set on pages and on API responses", async ({ page, request }) => {
    const response = await page.goto("/");
    expectSecurityHeaders(response!.headers());
    expectSecurityHeaders((await request.get("/api/health")).headers());
    expectSecurityHeaders((await request.get("/api/roster")).headers());
  });

  test("every page names the app's icon, which is served as SVG with the same headers", async ({ page, request }) => {
    await page.goto("/");
    const href = await page.locator('head link[rel="icon"]').first().getAttribute("href");
    expect(href).toMatch(/^\/icon\.svg/);
    const icon = await request.get(href!);
    expect(icon.status()).toBe(200);
    expect(icon.headers()["content-type"]).toContain("image/svg+xml");
    expectSecurityHeaders(icon.headers());
  });
});

test.describe("cross-origin writes", () => {
  const invitation = (email: string) => ({ email, name: "Cross Check", role: "athlete" });

  test("route handlers refuse another site's POST and accept the same origin", async ({ page, baseURL }) => {
    await signIn(page, demo.admin);
    const stamp = Date.now();
    const evil = await page.request.post("/api/invitations", {
      data: invitation(`evil.origin.${stamp}@lantern-reach.example`),
      headers: { Origin: "https://evil.example" },
    });
    expect(evil.status()).toBe(403);
    const crossSite = await page.request.post("/api/invitations", {
      data: invitation(`evil.site.${stamp}@lantern-reach.example`),
      headers: { "Sec-Fetch-Site": "cross-site" },
    });
    expect(crossSite.status()).toBe(403);
    const same = await page.request.post("/api/invitations", {
      data: invitation(`same.origin.${stamp}@lantern-reach.example`),
      headers: { Origin: baseURL!, "Sec-Fetch-Site": "same-origin" },
    });
    expect(same.status()).toBe(201);

    await page.goto("/club/outbox");
    await expect(page.getByRole("link", { name: new RegExp(`same\\.origin\\.${stamp}`) })).toHaveCount(1);
    await expect(page.getByRole("link", { name: new RegExp(`evil\\.(origin|site)\\.${stamp}`) })).toHaveCount(0);
  });

  test("a server action replayed from another origin is refused with 403 and does nothing", async ({ page }) => {
    await signIn(page, demo.admin);
    await page.goto("/club");
    const stamp = Date.now();
    const captured = page.waitForRequest((request) => request.method() === "POST" && !!request.headers()["next-action"]);
    const form = page.getByTestId("invite-form");
    await form.getByLabel("Name").fill("Action Check");
    await form.getByLabel("E-mail").fill(`action.real.${stamp}@lantern-reach.example`);
    await form.getByRole("button", { name: "Send invitation" }).click();
    const action = await captured;
    await expect(page.getByTestId("invite-status")).toContainText("Invitation sent");

    const replayAs = (origin: string, local: string) => {
      const headers: Record<string, string> = { ...action.headers(), origin };
      delete headers["content-length"];
      return page.request.post(action.url(), { headers, data: action.postData()!.replace(`action.real.${stamp}`, local), maxRedirects: 0 });
    };
    // The same replay from the app's own origin works, so what refuses the forged one is the origin alone.
    expect((await replayAs(new URL(page.url()).origin, `action.replayed.${stamp}`)).status()).toBe(200);
    // The proxy refuses it (Next's own origin check behind it would answer 500).
    expect((await replayAs("https://evil.example", `action.forged.${stamp}`)).status()).toBe(403);

    await openNewestMailTo(page, `action.replayed.${stamp}@lantern-reach.example`);
    await page.goto("/club/outbox");
    await expect(page.getByRole("link", { name: new RegExp(`action\\.forged\\.${stamp}`) })).toHaveCount(0);
  });
});

test.describe("sign-in throttling", () => {
  async function attempt(request: APIRequestContext, email: string, password: string, forwardedFor: string) {
    const { csrfToken } = (await (await request.get("/api/auth/csrf")).json()) as { csrfToken: string };
    return request.post("/api/auth/callback/password", {
      form: { email, password, csrfToken, json: "true" },
      headers: { "X-Forwarded-For": forwardedFor },
    });
  }

  test("the 11th failure in 15 minutes for one account gets 429", async ({ request }) => {
    // A throwaway account, and a different X-Forwarded-For each time: without SLIPWAY_TRUST_PROXY the
    // header is a client's claim, which keeps 127.0.0.1 (every other test's address) out of the count.
    const throwaway = `throttle.${Date.now()}@nowhere.example`;
    for (let index = 1; index <= 10; index += 1) {
      const response = await attempt(request, throwaway, "wrong-password-here", `198.51.100.${index}`);
      expect(response.status(), `attempt ${index}`).toBe(401);
    }
    const eleventh = await attempt(request, throwaway, "wrong-password-here", "198.51.100.77");
    expect(eleventh.status()).toBe(429);
    expect(eleventh.headers()["retry-after"]).toBe("900");
  });
});
