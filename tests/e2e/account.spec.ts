import { expect, test, type Page } from "@playwright/test";
import { demo, openNewestMailTo, signIn } from "./support/auth";
import { axeFindings } from "./support/axe";
import { loadAthleteEmail } from "@/lib/seed/load-athletes";

/** Your account (/account): a member corrects their name, moves to another e-mail address and changes their password. Uses load athletes 41–44 only. */

async function signInFails(page: Page, email: string, password: string): Promise<void> {
  await page.goto("/sign-in");
  const form = page.getByTestId("password-sign-in");
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("Password").fill(password);
  await form.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("sign-in-status")).toContainText("That e-mail address and password do not match an active account.");
  await expect(page.getByTestId("signed-in-as")).toHaveCount(0);
}

test("a member opens Your account from the header and changes their password; the old one stops working", async ({ page }) => {
  const email = loadAthleteEmail(41);
  const changed = "boathouse ebb kestrel";
  await signIn(page, email);
  await page.getByTestId("signed-in-as").click();
  await expect(page).toHaveURL(/\/account$/);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Your account");
  await expect(page.getByTestId("account-facts")).toContainText(email);
  await expect(page.getByTestId("account-facts")).toContainText("Load Trial Rowing Club");

  const form = page.getByTestId("change-password-form");
  await form.getByLabel("Current password").fill("a wrong guess at it");
  await form.getByLabel("New password").fill(changed);
  await form.getByLabel("Type it again").fill(changed);
  await form.getByRole("button", { name: "Change password" }).click();
  await expect(form.getByText("That is not your current password.").first()).toBeVisible();
  await expect(form.getByLabel("Current password")).toHaveAttribute("aria-invalid", "true");

  await form.getByLabel("Type it again").fill("boathouse ebb kestrels");
  await form.getByLabel("Current password").fill(demo.password);
  await form.getByRole("button", { name: "Change password" }).click();
  await expect(form.getByText("The two passwords differ.")).toBeVisible();

  await form.getByLabel("Type it again").fill(changed);
  await form.getByRole("button", { name: "Change password" }).click();
  await expect(page.getByTestId("change-password-status")).toContainText("Password changed. You are signed in with the new one");
  await expect(form.getByLabel("New password")).toHaveValue("");
  // Still signed in (a fresh session with the new password), on the account page.
  await page.reload();
  await expect(page.getByTestId("signed-in-as")).toContainText("Load Athlete 41");

  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await signInFails(page, email, demo.password);
  await signIn(page, email, changed);
});

test("signed in with an e-mail link, a member sets a new password without the old one", async ({ page, browser }) => {
  const email = loadAthleteEmail(42);
  const chosen = "slack water rigger";
  const context = await browser.newContext();
  const athlete = await context.newPage();
  await athlete.goto("/sign-in");
  await expect(athlete.getByText("Forgot your password? Sign in with a link, then choose a new one under Your account")).toBeVisible();
  await athlete.getByLabel("E-mail for the link").fill(email);
  await athlete.getByRole("button", { name: "E-mail me a link" }).click();
  await expect(athlete.getByTestId("link-status")).toContainText("a sign-in link is on its way");

  await signIn(page, demo.admin);
  const text = await openNewestMailTo(page, email);
  expect(text).toContain("Forgot your password? Once signed in, choose a new one under Your account");
  const link = new URL(/https?:\/\/\S+\/sign-in\/link\?token=\S+/.exec(text)![0]);
  await athlete.goto(`${link.pathname}${link.search}`);
  await athlete.getByRole("button", { name: "Sign in to Slipway" }).click();
  await expect(athlete.getByTestId("signed-in-as")).toBeVisible();

  await athlete.goto("/account");
  await expect(athlete.getByText("You signed in with an e-mail link")).toBeVisible();
  const form = athlete.getByTestId("change-password-form");
  await expect(form.getByLabel("Current password")).toHaveCount(0);
  await form.getByLabel("New password").fill(chosen);
  await form.getByLabel("Type it again").fill(chosen);
  await form.getByRole("button", { name: "Change password" }).click();
  await expect(athlete.getByTestId("change-password-status")).toContainText("Password changed.");
  // Now a password session: the next change asks for the current password again.
  await expect(form.getByLabel("Current password")).toBeVisible();
  await context.close();

  const fresh = await browser.newContext();
  const again = await fresh.newPage();
  await signIn(again, email, chosen);
  await fresh.close();
});

test("a member corrects their name; the header shows it at once, and a blank name is refused beside the field", async ({ page }) => {
  await signIn(page, loadAthleteEmail(43));
  await page.goto("/account");
  const form = page.getByTestId("change-name-form");
  const name = form.getByLabel("Your name");
  await expect(name).toHaveValue("Load Athlete 43");
  await name.fill("   ");
  await form.getByRole("button", { name: "Save name" }).click();
  await expect(form.getByText("Enter your name.")).toBeVisible();
  await expect(name).toHaveAttribute("aria-invalid", "true");
  await name.fill("  Load Athlete Forty-Three ");
  await form.getByRole("button", { name: "Save name" }).click();
  await expect(page.getByTestId("change-name-status")).toContainText("Name saved.");
  await expect(page.getByTestId("signed-in-as")).toContainText("Load Athlete Forty-Three");
  await page.reload();
  await expect(page.getByTestId("change-name-form").getByLabel("Your name")).toHaveValue("Load Athlete Forty-Three");
});

test("Your account is for members only: a visitor is sent to sign in and brought back", async ({ page }) => {
  await page.goto("/account");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Faccount/);
});

test("a member moves their account to a new e-mail address: nothing changes until the link from the new address is pressed", async ({
  page,
  browser,
}) => {
  const email = loadAthleteEmail(44);
  const moved = "load044.moved@river-mail.example";
  const context = await browser.newContext();
  const athlete = await context.newPage();
  await signIn(athlete, email);
  await athlete.goto("/account");
  const form = athlete.getByTestId("change-email-form");
  await form.getByLabel("New e-mail address").fill("not an address");
  await form.getByRole("button", { name: "Send a confirmation link" }).click();
  await expect(form.getByLabel("New e-mail address")).toHaveAttribute("aria-invalid", "true");
  await form.getByLabel("New e-mail address").fill(moved);
  await form.getByLabel("Current password").fill("a wrong guess at it");
  await form.getByRole("button", { name: "Send a confirmation link" }).click();
  await expect(form.getByLabel("Current password")).toHaveAttribute("aria-invalid", "true");
  await expect(athlete.getByTestId("change-email-status")).toContainText("That is not your current password.");
  await form.getByLabel("Current password").fill(demo.password);
  await form.getByRole("button", { name: "Send a confirmation link" }).click();
  await expect(athlete.getByTestId("change-email-status")).toContainText(`A confirmation link is on its way to ${moved}.`);
  await expect(athlete.getByTestId("pending-email-change")).toContainText(`Waiting for you to open the link sent to ${moved}`);
  await expect(athlete.getByTestId("account-facts")).toContainText(email);

  await signIn(page, demo.admin);
  const text = await openNewestMailTo(page, moved);
  const link = new URL(/https?:\/\/\S+\/confirm-email\?token=\S+/.exec(text)![0]);
  // Signed out, or signed in as someone else, the link only says whose account it is: whoever reads a mistyped address cannot confirm.
  const notice = `This moves Load Athlete 44's Slipway account to ${moved}. Only Load Athlete 44, signed in with the address they use now, can confirm it.`;
  await page.goto(`${link.pathname}${link.search}`);
  await expect(page.getByTestId("confirm-email-sign-in")).toContainText(notice);
  await expect(page.getByRole("button", { name: "Confirm the new address" })).toHaveCount(0);
  // The member opens it on another device, signed out: signing in brings them back to the link.
  const phone = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const member = await phone.newPage();
  await member.goto(`${link.pathname}${link.search}`);
  await expect(member.getByTestId("confirm-email-sign-in")).toContainText(notice);
  await expect(member).toHaveTitle(/Slipway/);
  expect(await axeFindings(member)).toEqual([]);
  await member.getByRole("link", { name: "Sign in, then come back here" }).click();
  const signInForm = member.getByTestId("password-sign-in");
  await signInForm.getByLabel("E-mail").fill(email);
  await signInForm.getByLabel("Password").fill(demo.password);
  await signInForm.getByRole("button", { name: "Sign in" }).click();
  // Signed in, opening the link changes nothing by itself (a mail scanner may open it): the button does.
  await expect(member.getByRole("heading", { level: 1 })).toHaveText("Confirm your new e-mail address");
  await expect(member).toHaveURL(new RegExp(`/confirm-email\\?token=${link.searchParams.get("token")}$`));
  await expect(member).toHaveTitle(/Slipway/);
  expect(await axeFindings(member)).toEqual([]);
  await member.getByRole("button", { name: "Confirm the new address" }).click();
  await expect(member.getByTestId("confirm-email-status")).toContainText(`Your Slipway account now signs in with ${moved}.`);
  // Every session ended: the header no longer shows the member, on this device or the first one.
  await expect(member.getByTestId("signed-in-as")).toHaveCount(0);
  await expect(member).toHaveTitle(/Slipway/);
  expect(await axeFindings(member)).toEqual([]);
  await member.goto(`${link.pathname}${link.search}`);
  await expect(member.getByText("This link is no longer valid.")).toBeVisible();
  await expect(member.getByRole("button", { name: "Confirm the new address" })).toHaveCount(0);
  await phone.close();
  await athlete.goto("/account");
  await expect(athlete).toHaveURL(/\/sign-in\?callbackUrl=%2Faccount/);
  await context.close();

  // The old address is told, and only the new one signs in.
  expect(await openNewestMailTo(page, email)).toContain(`now signs in with ${moved}`);
  const fresh = await browser.newContext();
  const again = await fresh.newPage();
  await signInFails(again, email, demo.password);
  await signIn(again, moved);
  await again.goto("/account");
  await expect(again.getByTestId("account-facts")).toContainText(moved);
  await expect(again.getByTestId("pending-email-change")).toHaveCount(0);
  await fresh.close();
});

test("a confirmation link cut short says so instead of offering the button", async ({ page }) => {
  await page.goto("/confirm-email?token=too-short");
  await expect(page.getByText("This confirmation link is incomplete.")).toBeVisible();
  await expect(page.getByRole("button", { name: "Confirm the new address" })).toHaveCount(0);
});
