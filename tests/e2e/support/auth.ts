import { expect, type Browser, type BrowserContext, type Page } from "@playwright/test";

/** Demo accounts from lib/seed/demo-club.ts (invented). */
export const demo = {
  password: "lantern-reach-demo",
  admin: "admin@lantern-reach.example",
  coach: "coach.tobias@lantern-reach.example",
  athlete: "ada@lantern-reach.example",
  secondAthlete: "bilal@lantern-reach.example",
};

export async function signIn(page: Page, email: string, password = demo.password): Promise<void> {
  await page.goto("/sign-in");
  const form = page.getByTestId("password-sign-in");
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("Password").fill(password);
  await form.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("signed-in-as")).toBeVisible();
}

/** The newest message in the demo outbox addressed to `to`, read in the browser as the admin would. */
export async function openNewestMailTo(page: Page, to: string): Promise<string> {
  await page.goto("/club/outbox");
  await page
    .getByRole("link", { name: new RegExp(`To ${to.replace(/[.]/g, "\\.")}`) })
    .first()
    .click();
  const body = page.getByTestId("message-body");
  await expect(body).toBeVisible();
  return (await body.textContent()) ?? "";
}

/** The invented second club, seeded only for tests (SLIPWAY_SEED_SECOND_CLUB=1 in scripts/e2e-server.sh). */
export const otherClub = {
  password: "brackwater-test-only",
  admin: "admin@brackwater.example",
  coach: "coach@brackwater.example",
  athlete: "athlete@brackwater.example",
};

/** A fresh browser context signed in as one account (its own cookies, like a second device). */
export async function signedInContext(
  browser: Browser,
  email: string,
  password = demo.password,
): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext();
  const page = await context.newPage();
  await signIn(page, email, password);
  return { context, page };
}
