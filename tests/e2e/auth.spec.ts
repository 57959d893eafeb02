import { expect, test } from "@playwright/test";
import { demo, openNewestMailTo, signIn } from "./support/auth";

test.describe("signing in", () => {
  for (const [role, email, landing, heading] of [
    ["athlete", demo.athlete, "/learn", "Athlete"],
    ["coach", demo.coach, "/roster", "Coach"],
    ["admin", demo.admin, "/club", "Club administrator"],
  ] as const) {
    test(`a demo ${role} lands on ${landing} and the header names them`, async ({ page }) => {
      await signIn(page, email);
      await expect(page).toHaveURL(new RegExp(`${landing}$`));
      await expect(page.getByTestId("signed-in-as")).toContainText(heading);
    });
  }

  test("a wrong password is refused without saying whether the account exists", async ({ page }) => {
    await page.goto("/sign-in");
    const form = page.getByTestId("password-sign-in");
    await form.getByLabel("E-mail").fill(demo.athlete);
    await form.getByLabel("Password").fill("not-the-password-at-all");
    await form.getByRole("button", { name: "Sign in" }).click();
    const status = page.getByTestId("sign-in-status");
    await expect(status).toContainText("do not match an active account");
    await expect(page).toHaveURL(/\/sign-in/);

    await form.getByLabel("E-mail").fill("nobody@lantern-reach.example");
    await form.getByRole("button", { name: "Sign in" }).click();
    await expect(status).toContainText("do not match an active account");
  });

  test("signing in without a connection says so, not that the password is wrong", async ({ page, context }) => {
    await page.goto("/sign-in");
    const form = page.getByTestId("password-sign-in");
    await form.getByLabel("E-mail").fill(demo.athlete);
    await form.getByLabel("Password").fill(demo.password);
    await expect(form.getByRole("button", { name: "Sign in" })).toBeEnabled();
    await context.setOffline(true);
    await form.getByRole("button", { name: "Sign in" }).click();
    const status = page.getByTestId("sign-in-status");
    await expect(status).toContainText("Slipway could not be reached, so you are not signed in yet.");
    await expect(status).not.toContainText("do not match");
    await context.setOffline(false);
    await form.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByTestId("signed-in-as")).toBeVisible();
  });

  test("the landing page's button takes a visitor to sign-in and a signed-in coach to their roster", async ({ page }) => {
    await page.goto("/");
    await page.getByRole("link", { name: "Open Slipway" }).click();
    await expect(page).toHaveURL(/\/sign-in/);
    await signIn(page, demo.coach);
    await page.goto("/");
    await page.getByRole("link", { name: "Open Slipway" }).click();
    await expect(page).toHaveURL(/\/roster$/);
  });

  test("before the page's script runs, the sign-in form waits: nothing can be typed, so nothing is lost or sent in the address", async ({
    browser,
  }) => {
    // The server's HTML alone, as a slow phone has it before hydration.
    const context = await browser.newContext({ javaScriptEnabled: false });
    const page = await context.newPage();
    try {
      await page.goto("/sign-in");
      const form = page.getByTestId("password-sign-in");
      // A typed entry would be shown but not sent (react-hook-form hears only changes made once it
      // runs), and Enter would submit the form as the browser's own GET, password in the address.
      await expect(form.getByRole("button", { name: "Sign in" })).toBeDisabled();
      await expect(form.getByLabel("E-mail")).toBeDisabled();
      await expect(form.getByLabel("Password")).toBeDisabled();
      expect(new URL(page.url()).search).toBe("");
    } finally {
      await context.close();
    }
    // With the script, the same form takes input at once.
    const live = await browser.newContext();
    const livePage = await live.newPage();
    await livePage.goto("/sign-in");
    await expect(livePage.getByTestId("password-sign-in").getByLabel("E-mail")).toBeEnabled();
    await live.close();
  });

  test("signing out ends the session; without a connection it says the session is still open", async ({ page, context }) => {
    await signIn(page, demo.athlete);
    await context.setOffline(true);
    await page.getByRole("button", { name: "Sign out" }).click();
    await expect(page.getByTestId("sign-out-status")).toHaveText("Still signed in: no answer. Try again.");
    await expect(page.getByTestId("signed-in-as")).toBeVisible();
    await context.setOffline(false);
    await page.getByRole("button", { name: "Sign out" }).click();
    await expect(page).toHaveURL(/\/sign-in/);
    await page.goto("/learn");
    await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Flearn/);
  });
});

test.describe("guards", () => {
  test("an anonymous visitor to a coach page is sent to sign-in", async ({ page }) => {
    await page.goto("/roster");
    await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Froster/);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("Sign in to Slipway");
  });

  test("an anonymous API call gets 401 JSON", async ({ request }) => {
    const response = await request.get("/api/roster");
    expect(response.status()).toBe(401);
    expect(await response.json()).toMatchObject({ error: "unauthenticated" });
  });

  test("an athlete opening a coach page or API is refused with 403", async ({ page }) => {
    await signIn(page, demo.athlete);
    const response = await page.goto("/roster");
    expect(response?.status()).toBe(403);
    await expect(page.getByTestId("forbidden")).toContainText("This page is for coaches and club administrators.");
    const club = await page.goto("/club");
    expect(club?.status()).toBe(403);
    await expect(page.getByTestId("forbidden")).toContainText("This page is for club administrators.");
    const api = await page.request.get("/api/roster");
    expect(api.status()).toBe(403);
    expect(await api.json()).toMatchObject({ error: "forbidden" });
  });

  test("a coach opening an administrators' page is told it is for club administrators", async ({ page }) => {
    await signIn(page, demo.coach);
    const response = await page.goto("/club/register");
    expect(response?.status()).toBe(403);
    await expect(page.getByTestId("forbidden")).toContainText("This page is for club administrators.");
    await expect(page.getByTestId("forbidden")).not.toContainText("coaches");
  });

  test("a coach sees the roster API, and the health check reports the database", async ({ page }) => {
    await signIn(page, demo.coach);
    const api = await page.request.get("/api/roster");
    expect(api.status()).toBe(200);
    const body = (await api.json()) as { athletes: { email: string }[] };
    expect(body.athletes.map((athlete) => athlete.email)).toContain(demo.athlete);
    const health = await page.request.get("/api/health");
    expect(await health.json()).toMatchObject({ ok: true, database: "reachable" });
  });

  test("bad input to an API gets 400 naming the field", async ({ page }) => {
    await signIn(page, demo.admin);
    const response = await page.request.post("/api/invitations", {
      data: { email: "not-an-address", name: "Someone", role: "athlete" },
    });
    expect(response.status()).toBe(400);
    const body = (await response.json()) as { fields: Record<string, string[]> };
    expect(Object.keys(body.fields)).toContain("email");
  });
});

test.describe("mail", () => {
  test("invitation round trip: admin invites, the mail arrives, the link sets a password and signs in", async ({ page, browser }) => {
    const invitee = `new.rower.${Date.now()}@lantern-reach.example`;
    await signIn(page, demo.admin);
    const form = page.getByTestId("invite-form");
    await form.getByLabel("Name").fill("Noor Ellery");
    await form.getByLabel("E-mail").fill(invitee);
    await form.getByRole("button", { name: "Send invitation" }).click();
    await expect(page.getByTestId("invite-status")).toContainText(`Invitation sent to ${invitee}`);

    const text = await openNewestMailTo(page, invitee);
    const link = /https?:\/\/\S+\/invite\/\S+/.exec(text)?.[0];
    expect(link).toBeTruthy();

    const context = await browser.newContext();
    const newcomer = await context.newPage();
    await newcomer.goto(new URL(link!).pathname);
    await expect(newcomer.getByRole("heading", { level: 1 })).toHaveText("Join your club on Slipway");
    await newcomer.getByLabel("Choose a password").fill("password123");
    await newcomer.getByLabel("Type it again").fill("password123");
    await newcomer.getByRole("button", { name: "Create account and sign in" }).click();
    await expect(newcomer.getByText(/too common|at least 10/).first()).toBeVisible();

    await newcomer.getByLabel("Choose a password").fill("spray deck heron lantern");
    await newcomer.getByLabel("Type it again").fill("spray deck heron lantern");
    await newcomer.getByRole("button", { name: "Create account and sign in" }).click();
    await expect(newcomer).toHaveURL(/\/learn$/);
    await expect(newcomer.getByTestId("signed-in-as")).toContainText("Noor Ellery");

    const used = await newcomer.goto(new URL(link!).pathname);
    expect(used?.status()).toBe(404);
    await expect(newcomer.getByText("This invitation link is no longer valid.")).toBeVisible();
    const unknown = await newcomer.goto(`/invite/${"z".repeat(40)}`);
    expect(unknown?.status()).toBe(404);
    await expect(newcomer.getByText("This invitation link is no longer valid.")).toBeVisible();
    await context.close();
  });

  test("a one-time sign-in link signs in once", async ({ page, browser }) => {
    const context = await browser.newContext();
    const athletePage = await context.newPage();
    await athletePage.goto("/sign-in");
    await athletePage.getByLabel("E-mail for the link").fill(demo.secondAthlete);
    await athletePage.getByRole("button", { name: "E-mail me a link" }).click();
    await expect(athletePage.getByTestId("link-status")).toContainText("a sign-in link is on its way");

    await signIn(page, demo.admin);
    const text = await openNewestMailTo(page, demo.secondAthlete);
    const link = /https?:\/\/\S+\/sign-in\/link\?token=\S+/.exec(text)?.[0];
    expect(link).toBeTruthy();
    const url = new URL(link!);

    await athletePage.goto(`${url.pathname}${url.search}`);
    await athletePage.getByRole("button", { name: "Sign in to Slipway" }).click();
    await expect(athletePage).toHaveURL(/\/learn$/);
    await expect(athletePage.getByTestId("signed-in-as")).toContainText("Bilal");

    const again = await browser.newContext();
    const replay = await again.newPage();
    await replay.goto(`${url.pathname}${url.search}`);
    await replay.getByRole("button", { name: "Sign in to Slipway" }).click();
    await expect(replay.getByText("This link has expired or was already used.")).toBeVisible();
    await again.close();
    await context.close();
  });
});
