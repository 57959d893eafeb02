import { expect, type Page } from "@playwright/test";

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
  await page.getByRole("link", { name: new RegExp(`To ${to.replace(/[.]/g, "\\.")}`) }).first().click();
  const body = page.getByTestId("message-body");
  await expect(body).toBeVisible();
  return (await body.textContent()) ?? "";
}
