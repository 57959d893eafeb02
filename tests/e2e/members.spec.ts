import { expect, test } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { demo, openNewestMailTo, signIn, signedInContext } from "./support/auth";

test.describe("members admin", () => {
  test("the admin starts moving a member to a new e-mail address; a link goes there and nothing changes yet", async ({ page }) => {
    await signIn(page, demo.admin);
    await page.goto("/club/members");
    const row = page.getByTestId("member-row-bilal@lantern-reach.example");
    await row.getByRole("button", { name: "Change e-mail of Bilal Hartigan" }).click();
    const dialog = page.getByTestId("email-dialog");
    const field = dialog.getByLabel("New e-mail address");
    await expect(field).toBeFocused();
    expect((await new AxeBuilder({ page }).include("dialog[open]").analyze()).violations).toEqual([]);
    await field.fill(demo.athlete);
    await dialog.getByRole("button", { name: "Send the link" }).click();
    await expect(dialog.getByText("That address already has a Slipway account.")).toBeVisible();
    await expect(field).toHaveAttribute("aria-invalid", "true");
    await field.fill("bilal.hartigan@river-mail.example");
    await dialog.getByRole("button", { name: "Send the link" }).click();
    await expect(page.getByTestId("members-status")).toContainText(
      "A confirmation link is on its way to bilal.hartigan@river-mail.example. Until it is opened (within 24 hours) the member signs in with bilal@lantern-reach.example.",
    );
    await expect(row).toContainText("bilal@lantern-reach.example");
    const text = await openNewestMailTo(page, "bilal.hartigan@river-mail.example");
    expect(text).toContain("Maren Okafor, an administrator of your club, asked to move your Slipway account to this address.");
    expect(text).toMatch(/\/confirm-email\?token=[A-Za-z0-9_-]{43}/);
  });

  test("the admin corrects a member's name; a blank one is refused in the dialog; the roster shows the new name", async ({ page }) => {
    await signIn(page, demo.admin);
    await page.goto("/club/members");
    const row = page.getByTestId("member-row-kit@lantern-reach.example");
    await row.getByRole("button", { name: "Correct name of Kit Abernethy" }).click();
    const dialog = page.getByTestId("rename-dialog");
    const field = dialog.getByLabel("Name");
    await expect(field).toBeFocused();
    await field.fill("  ");
    await dialog.getByRole("button", { name: "Save name" }).click();
    await expect(dialog.getByText("Enter the member's name.")).toBeVisible();
    await expect(field).toHaveAttribute("aria-invalid", "true");
    await field.fill("Kit Abernethy-Rowe");
    await dialog.getByRole("button", { name: "Save name" }).click();
    await expect(page.getByTestId("members-status")).toContainText("Name saved: Kit Abernethy-Rowe.");
    await expect(row).toContainText("Kit Abernethy-Rowe");
    await page.goto("/roster");
    await expect(page.getByTestId("roster-table")).toContainText("Kit Abernethy-Rowe");

    // Put it back for the other specs.
    await page.goto("/club/members");
    await row.getByRole("button", { name: "Correct name of Kit Abernethy-Rowe" }).click();
    await dialog.getByLabel("Name").fill("Kit Abernethy");
    await dialog.getByRole("button", { name: "Save name" }).click();
    await expect(row).toContainText("Kit Abernethy");
    await expect(row).not.toContainText("Rowe");
  });

  test("the club page lists invitations not accepted yet; the admin sends an expired one again and withdraws another", async ({
    page,
    browser,
  }) => {
    await signIn(page, demo.admin);
    await page.goto("/club");
    const list = page.getByTestId("unanswered-invitations");
    const status = page.getByTestId("invitations-status");
    // The demo seed's two (lib/seed/demo-invitations.ts): Tamsin's is open, Oskar's expired.
    const tamsin = page.getByTestId("invitation-tamsin@lantern-reach.example");
    const oskar = page.getByTestId("invitation-oskar@lantern-reach.example");
    await expect(tamsin).toContainText("link works until");
    await expect(oskar).toContainText("expired");

    await oskar.getByRole("button", { name: "Send again to oskar@lantern-reach.example" }).click();
    // The expired link was not working any more, so nothing is said about replacing it.
    await expect(status).toHaveText("✓ Invitation sent to oskar@lantern-reach.example.");
    await expect(oskar).toContainText("link works until");
    await expect(list.getByRole("listitem").filter({ hasText: "oskar@lantern-reach.example" })).toHaveCount(1);

    await oskar.getByRole("button", { name: "Withdraw the invitation to oskar@lantern-reach.example" }).click();
    await expect(status).toContainText("Invitation to oskar@lantern-reach.example withdrawn");
    await expect(oskar).toHaveCount(0);
    // The focused button left with its row: focus is on the list, beside the message, not lost to the page.
    await expect(page.getByTestId("invitations")).toBeFocused();
    await expect(tamsin).toBeVisible();
    const mail = await openNewestMailTo(page, "oskar@lantern-reach.example");
    const link = new URL(/https?:\/\/\S+\/invite\/\S+/.exec(mail)![0]);

    // The withdrawn link no longer opens anything.
    const context = await browser.newContext();
    const invitee = await context.newPage();
    const answer = await invitee.goto(link.pathname);
    expect(answer?.status()).toBe(404);
    await expect(invitee.getByText("This invitation link is no longer valid.")).toBeVisible();
    await context.close();
  });

  test("the admin searches the member list and sees roles, status and last sign-in", async ({ page }) => {
    await signIn(page, demo.admin);
    await page.goto("/club");
    await page.getByRole("link", { name: "Manage members" }).click();
    await expect(page).toHaveURL(/\/club\/members$/);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("Members");

    const table = page.getByTestId("members-table");
    for (const header of ["Name", "E-mail", "Role", "Status", "Last sign-in"]) {
      await expect(table.getByRole("columnheader", { name: new RegExp(header) })).toBeVisible();
    }
    const adminRow = page.getByTestId(`member-row-${demo.admin}`);
    await expect(adminRow).toContainText("Club administrator");
    await expect(adminRow).toContainText("Your own account");
    await expect(adminRow.getByRole("button")).toHaveCount(0);

    // Kit is a demo athlete no other spec signs in as.
    await page.getByLabel("Search members").fill("abernethy");
    await expect(page.getByTestId("members-count")).toContainText("Showing 1 of");
    await expect(table.getByRole("row")).toHaveCount(2);
    await expect(page.getByTestId("member-row-kit@lantern-reach.example")).toContainText("Never");
    await page.getByLabel("Search members").fill("coach");
    await expect(page.getByTestId("members-count")).toContainText("Showing 2 of");
  });

  test("deactivating asks first, then the signed-in athlete's next page load goes to sign-in", async ({ page, browser }) => {
    const athlete = await signedInContext(browser, "dev@lantern-reach.example");
    await athlete.page.goto("/learn");
    await expect(athlete.page.getByTestId("learn-page")).toBeVisible();

    await signIn(page, demo.admin);
    await page.goto("/club/members");
    const row = page.getByTestId("member-row-dev@lantern-reach.example");
    await row.getByRole("button", { name: "Deactivate Dev Castellano" }).click();
    const dialog = page.getByRole("dialog", { name: "Deactivate Dev Castellano?" });
    await expect(dialog).toBeVisible();
    await expect(dialog.getByRole("button", { name: "Keep active" })).toBeFocused();
    await dialog.getByRole("button", { name: "Keep active" }).click();
    await expect(dialog).toBeHidden();
    await expect(row).toContainText("Active");

    await row.getByRole("button", { name: "Deactivate Dev Castellano" }).click();
    await page.keyboard.press("Escape");
    await expect(dialog).toBeHidden();
    await row.getByRole("button", { name: "Deactivate Dev Castellano" }).click();
    await dialog.getByRole("button", { name: "Deactivate member" }).click();
    await expect(page.getByTestId("members-status")).toContainText("Dev Castellano is deactivated");
    await expect(row).toContainText("Deactivated");

    await athlete.page.reload();
    await expect(athlete.page).toHaveURL(/\/sign-in\?callbackUrl=%2Flearn/);
    expect((await athlete.page.request.get("/api/roster")).status()).toBe(401);

    await row.getByRole("button", { name: "Reactivate Dev Castellano" }).click();
    await expect(page.getByTestId("members-status")).toContainText("Dev Castellano is active again");
    await signIn(athlete.page, "dev@lantern-reach.example");
    await expect(athlete.page.getByTestId("signed-in-as")).toContainText("Dev");
    await athlete.context.close();
  });

  test("changing a role ends the member's session; they sign in again with the new role", async ({ page, browser }) => {
    const member = await signedInContext(browser, "greta@lantern-reach.example");
    await expect(member.page.getByTestId("signed-in-as")).toContainText("Athlete");

    await signIn(page, demo.admin);
    await page.goto("/club/members");
    await page.getByTestId("member-row-greta@lantern-reach.example").getByRole("button", { name: "Change role of Greta Quennell" }).click();
    const dialog = page.getByRole("dialog", { name: "Change role of Greta Quennell" });
    await dialog.getByLabel("New role").selectOption("coach");
    await dialog.getByRole("button", { name: "Save role" }).click();
    await expect(page.getByTestId("members-status")).toContainText("Greta Quennell is now coach");
    await expect(page.getByTestId("member-row-greta@lantern-reach.example")).toContainText("Coach");

    await member.page.goto("/learn");
    await expect(member.page).toHaveURL(/\/sign-in/);
    await signIn(member.page, "greta@lantern-reach.example");
    await expect(member.page).toHaveURL(/\/roster$/);
    await expect(member.page.getByTestId("signed-in-as")).toContainText("Coach");
    await member.context.close();
  });

  test("importing a roster previews the rows, invites the good ones and reports the rest by row", async ({ page }) => {
    const stamp = Date.now();
    const first = `sorrel.${stamp}@lantern-reach.example`;
    const second = `pike.${stamp}@lantern-reach.example`;
    const csv = [
      "name,email,role",
      `Sorrel Voss,${first},athlete`,
      `Pike Amberley,${second},coach`,
      `Ada Again,${demo.athlete},athlete`,
      ",nameless@lantern-reach.example,athlete",
      "Wrong Mail,wrong-mail,athlete",
      "Odd Role,odd.role@lantern-reach.example,bowman",
      `Sorrel Twice,${first},athlete`,
    ].join("\n");

    await signIn(page, demo.admin);
    await page.goto("/club/members");
    const importer = page.getByTestId("roster-import");
    await expect(importer).toHaveAttribute("data-ready", "true");
    await importer.getByLabel("Roster file (CSV)").setInputFiles({ name: "roster.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });

    const preview = page.getByTestId("roster-preview");
    await expect(preview).toContainText("7 rows read: 3 ready to invite, 4 with problems.");
    await expect(page.getByTestId("roster-preview-problems")).toContainText("Missing name.");
    await preview.getByRole("button", { name: "Send 3 invitations" }).click();

    await expect(page.getByTestId("roster-status")).toContainText("2 invitations sent.");
    const problems = page.getByTestId("roster-report-problems");
    const rowsOf = async () => (await problems.locator("tbody tr").allInnerTexts()).map((text) => text.split("\t").slice(0, 2).join(" "));
    expect(await rowsOf()).toEqual(["4 email", "5 name", "6 email", "7 role", "8 email"]);
    await expect(problems).toContainText("Already a member");
    await expect(problems).toContainText('Unknown role "bowman"');
    await expect(problems).toContainText("Same e-mail address as row 2");

    const mail = await openNewestMailTo(page, first);
    expect(mail).toMatch(/\/invite\/\S+/);
  });

  test("a file that is not a roster is refused before anything is sent", async ({ page }) => {
    await signIn(page, demo.admin);
    await page.goto("/club/members");
    await expect(page.getByTestId("roster-import")).toHaveAttribute("data-ready", "true");
    const input = page.getByLabel("Roster file (CSV)");
    await input.setInputFiles({ name: "photo.png", mimeType: "image/png", buffer: Buffer.from([0x89, 0x50, 0x4e, 0x47]) });
    await expect(page.getByTestId("roster-import")).toContainText("Choose a CSV or plain-text file.");
    await expect(input).toHaveAttribute("aria-invalid", "true");
    await input.setInputFiles({ name: "people.csv", mimeType: "text/csv", buffer: Buffer.from("first,last\nA,B\n") });
    await expect(page.getByTestId("roster-import")).toContainText("Missing: name, email");
    await expect(page.getByTestId("roster-preview")).toHaveCount(0);
  });

  test("the members page and its confirm step have no axe violations", async ({ page }) => {
    await signIn(page, demo.admin);
    await page.goto("/club/members");
    // The club pages stream behind a loading state: scan once the page itself has arrived.
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("Members");
    const pageScan = await new AxeBuilder({ page }).analyze();
    expect(pageScan.violations.map((violation) => violation.id)).toEqual([]);
    await page.getByRole("button", { name: "Deactivate Lena Fairbrother" }).click();
    await expect(page.getByRole("dialog")).toBeVisible();
    const dialogScan = await new AxeBuilder({ page }).include("dialog[open]").analyze();
    expect(dialogScan.violations.map((violation) => violation.id)).toEqual([]);
    await page.getByRole("button", { name: "Keep active" }).click();
  });
});
