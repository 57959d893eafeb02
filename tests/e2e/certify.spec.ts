import { execFileSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { expect, test, type Browser, type Locator, type Page } from "@playwright/test";
import { axeFindings } from "./support/axe";
import { demo, openNewestMailTo, signIn } from "./support/auth";

/** Seeded by lib/seed/demo-certification.ts: every quiz passed, no sign-off yet. */
const carys = "carys@lantern-reach.example";
const tinyPng = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==", "base64");
const modules = [
  { slug: "overall-length", title: "Measuring and setting the overall length" },
  { slug: "setting-inboard", title: "Setting the inboard with the collar" },
  { slug: "changing-boats", title: "Changing boats, span and overlap" },
  { slug: "secure-and-check", title: "Securing and checking before you go afloat" },
  { slug: "grip-cleaning", title: "Cleaning the grips" },
];

async function pageAs(browser: Browser, email: string): Promise<Page> {
  const context = await browser.newContext();
  const page = await context.newPage();
  await signIn(page, email);
  return page;
}

/** The coach opens the athlete's waiting sign-off from the queue and marks every item met. */
async function signOffFromQueue(coach: Page, title: string, photo = false): Promise<string | null> {
  await coach.goto("/roster/sign-offs");
  await coach.getByRole("link", { name: new RegExp(`Carys Penhallow: ${title}`) }).click();
  const form = coach.getByTestId("assessment-form");
  await expect(form).toBeVisible();
  // One fieldset an item (the form itself sits in a fieldset too: ClientForm).
  const items = form.locator('fieldset[data-testid^="checklist-"]');
  const count = await items.count();
  expect(count).toBeGreaterThanOrEqual(3);
  for (let index = 0; index < count; index += 1) {
    await items.nth(index).getByRole("radio", { name: "Met", exact: true }).check();
  }
  let photoUrl: string | null = null;
  if (photo) {
    await coach.getByLabel("Photo evidence (optional)").setInputFiles({ name: "at-the-rack.png", mimeType: "image/png", buffer: tinyPng });
    await expect(coach.getByTestId("photo-status")).toContainText("Photo 1 added");
    photoUrl = await coach.getByRole("img", { name: "Evidence photo 1" }).getAttribute("src");
  }
  await expect(coach.getByTestId("assessment-outcome")).toContainText("Every item met");
  await coach.getByRole("button", { name: "Record the sign-off" }).click();
  await expect(coach.getByTestId("assessment-status")).toContainText(/Signed off\. Certificate [A-Z]+-\d{4}-\d{4}/);
  return photoUrl;
}

test.describe.configure({ mode: "serial" });

test.describe("certification", () => {
  let verifyPath = "";
  let pdfPath = "";
  let serial = "";

  test("an athlete asks, a coach signs off with a photo, the certificate downloads and verifies as valid", async ({ browser }) => {
    const athlete = await pageAs(browser, carys);
    // Every quiz passed: her summary says only the coach's sign-offs are left, not "quiz and practical".
    await athlete.goto("/learn");
    await expect(athlete.getByTestId("clearance-summary")).toContainText(
      /(\d) of \1 required modules still to pass: \1 have their quiz passed and need a coach's practical sign-off\./,
    );
    await athlete.goto("/learn/overall-length/practical");
    await expect(athlete.getByTestId("practical-status")).toContainText("Quiz passed, practical to do");
    await athlete.getByLabel("Which coach?").selectOption({ label: "Tobias Lindqvist" });
    await athlete.getByRole("button", { name: "Ask for a sign-off" }).click();
    await expect(athlete.getByTestId("request-sign-off-status")).toContainText("Asked");
    await expect(athlete.getByTestId("practical-status")).toContainText("Waiting for sign-off");

    const coach = await pageAs(browser, demo.coach);
    const photoUrl = await signOffFromQueue(coach, modules[0]!.title, true);
    expect(photoUrl).toMatch(/^\/api\/evidence\/[0-9a-f-]{36}$/);

    await athlete.reload();
    await expect(athlete.getByTestId("practical-status")).toContainText("Passed");
    const download = athlete.getByTestId("certificate-download");
    await expect(download).toContainText(/Download certificate [A-Z]+-\d{4}-\d{4}/);
    pdfPath = (await download.getAttribute("href"))!;
    serial = /([A-Z]+-\d{4}-\d{4})/.exec((await download.textContent()) ?? "")![1]!;
    const pdf = await athlete.request.get(pdfPath);
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()["content-type"]).toBe("application/pdf");
    expect((await pdf.body()).subarray(0, 5).toString()).toBe("%PDF-");
    const ownPhoto = await athlete.request.get(photoUrl!);
    expect(ownPhoto.status()).toBe(200);
    expect(ownPhoto.headers()["x-content-type-options"]).toBe("nosniff");

    const checkLink = athlete.getByRole("link", { name: "Public check page" });
    verifyPath = new URL((await checkLink.getAttribute("href"))!).pathname;
    const visitor = await browser.newContext();
    const anonymous = await visitor.newPage();
    await anonymous.goto(verifyPath);
    await expect(anonymous.getByTestId("verify-status")).toContainText("Valid");
    await expect(anonymous.getByTestId("verify-details")).toContainText("Carys Penhallow");
    await expect(anonymous.getByTestId("verify-details")).toContainText(modules[0]!.title);
    const unknown = await anonymous.goto("/verify/AAAAAAAAAAAAAAAAAAAAAAAA");
    expect(unknown?.status()).toBe(404);
    await expect(anonymous.getByRole("heading", { level: 1 })).toHaveText("Not found");

    const other = await pageAs(browser, demo.secondAthlete);
    expect((await other.request.get(pdfPath)).status()).toBe(404);
    expect((await other.request.get(photoUrl!)).status()).toBe(404);
  });

  test("the roster shows the athlete as cleared once every required module is signed off", async ({ browser }) => {
    const athlete = await pageAs(browser, carys);
    const coach = await pageAs(browser, demo.coach);
    for (const entry of modules.slice(1)) {
      const asked = await athlete.request.post("/api/sign-offs", {
        data: { moduleSlug: entry.slug, coachId: null },
      });
      expect(asked.status()).toBe(201);
      await signOffFromQueue(coach, entry.title);
    }
    await coach.goto("/roster");
    await expect(coach.getByTestId("roster-table")).toBeVisible();
    await coach.getByLabel("Show").selectOption({ label: "Cleared to rig unsupervised" });
    const table = coach.getByTestId("roster-table");
    await expect(table.getByRole("link", { name: "Carys Penhallow" })).toBeVisible();
    await coach.getByLabel("Search by name").fill("carys");
    await expect(table.locator("tbody tr")).toHaveCount(1);
    await expect(table.locator("tbody tr").first()).toContainText("May rig unsupervised");
    const csv = await coach.request.get("/api/roster/matrix/export?filter=cleared&q=carys");
    expect(csv.headers()["content-type"]).toContain("text/csv");
    expect(await csv.text()).toContain("Carys Penhallow");

    await athlete.goto("/learn/certificates");
    await expect(athlete.getByTestId("clearance-state")).toContainText("May rig unsupervised");
    await expect(athlete.getByTestId("my-certificates")).toContainText("Rigging clearance");
  });

  test("an admin revokes the certificate and the public page says so", async ({ browser }) => {
    const admin = await pageAs(browser, demo.admin);
    const mail = await openNewestMailTo(admin, demo.coach);
    expect(mail).toMatch(/Carys Penhallow passed the quiz/);
    await admin.goto("/club/register");
    await admin.getByLabel("Module").selectOption({ label: modules[0]!.title });
    await admin.getByRole("button", { name: "Show" }).click();
    await expect(admin).toHaveURL(/module=overall-length/);
    const register = admin.getByTestId("register-table");
    await expect(register).toContainText("Carys Penhallow");
    await register.getByRole("link", { name: serial }).click();
    await expect(admin.getByTestId("certificate-status")).toContainText("Valid");
    await admin.getByLabel("Reason for revoking").fill("Recorded against the wrong module");
    await admin.getByRole("button", { name: "Revoke certificate…" }).click();
    await admin.getByTestId("revoke-dialog").getByRole("button", { name: "Yes, revoke it" }).click();
    await expect(admin.getByTestId("revoke-status")).toContainText("Revoked");

    const visitor = await browser.newContext();
    const anonymous = await visitor.newPage();
    await anonymous.goto(verifyPath);
    await expect(anonymous.getByTestId("verify-status")).toContainText("Revoked");
    await expect(anonymous.getByTestId("verify-details")).toContainText("Carys Penhallow");

    const coach = await pageAs(browser, demo.coach);
    await coach.goto("/roster");
    await coach.getByLabel("Show").selectOption({ label: "Cleared to rig unsupervised" });
    await coach.getByLabel("Search by name").fill("carys");
    await expect(coach.getByTestId("roster-empty")).toBeVisible();
  });
});

/** The text of the PDF the first of `links` downloads (200 expected), in content order (`pdftotext -raw`). */
async function downloadedPdfText(page: Page, links: Locator): Promise<string> {
  const response = await page.request.get((await links.first().getAttribute("href"))!);
  expect(response.status()).toBe(200);
  const file = path.join(os.tmpdir(), `slipway-download-${process.pid}-${Date.now()}.pdf`);
  fs.writeFileSync(file, await response.body());
  try {
    return execFileSync("pdftotext", ["-raw", file, "-"], { encoding: "utf8" });
  } finally {
    fs.rmSync(file);
  }
}

test("a suspended athlete reads the coach's reason with one full stop, and that they rig with a coach", async ({ page }) => {
  // hamish (lib/seed/demo-certification.ts): suspended with a reason that ends in a full stop.
  await signIn(page, "hamish@lantern-reach.example");
  await page.goto("/learn");
  const summary = page.getByTestId("clearance-summary");
  await expect(summary).toContainText("A coach has suspended your clearance: Launched with a collar not seated in a click");
  await expect(summary).toContainText("with a coach first. Rig with a coach until they lift it.");
  await expect(summary).not.toContainText("..");

  await expect(summary.getByRole("link", { name: "Your certificates" })).toBeVisible();

  // His clearance certificate, printed now, is stamped: on paper it would otherwise read as valid.
  await page.goto("/learn/certificates");
  // The same summary on the certificates page does not link to the page it is on.
  await expect(page.getByTestId("clearance-summary")).toBeVisible();
  await expect(page.getByTestId("clearance-summary").getByRole("link", { name: "Your certificates" })).toHaveCount(0);
  const text = await downloadedPdfText(page, page.getByRole("link", { name: /Download PDF of Rigging clearance/ }));
  expect(text).toContain("SUSPENDED");
  expect(text).toContain("Suspended by a coach: not valid while the suspension stands.");
});

test("a certificate printed after it has expired is stamped EXPIRED and says on which day", async ({ page }) => {
  // lena (lib/seed/demo-certification.ts): every module signed off 410 days ago, so every pass has expired.
  await signIn(page, "lena@lantern-reach.example");
  await page.goto("/learn/certificates");
  // The list says so too: "expired <day>", not "expires" with a day in the past.
  await expect(page.getByTestId("my-certificates")).toContainText(/signed off by .+ · expired \d{1,2} [A-Z]/);
  await expect(page.getByTestId("my-certificates")).not.toContainText("· expires");
  const text = await downloadedPdfText(page, page.getByRole("link", { name: /Download PDF of Setting the inboard/ }));
  expect(text).toContain("EXPIRED");
  expect(text).toMatch(/Expired on \d{1,2} [A-Z][a-z]+ \d{4}: no longer valid\. Ask a coach about renewing it\./);
});

test("the grip-cleaning practical warns about the cleaning chemicals; the rigging practicals about the collar", async ({ page }) => {
  await signIn(page, demo.athlete);
  await page.goto("/learn/grip-cleaning/practical");
  const cautions = page.getByTestId("cleaning-cautions");
  await expect(cautions).toContainText("wear gloves and eye protection");
  await expect(cautions).toContainText("Never mix cleaners");
  await expect(page.getByText("A collar that is not seated in a click")).toHaveCount(0);
  await page.goto("/learn/setting-inboard/practical");
  await expect(page.getByText("A collar that is not seated in a click")).toBeVisible();
  await expect(page.getByTestId("cleaning-cautions")).toHaveCount(0);
});

test("after a name correction the admin reissues the current certificates; the printed ones check as replaced", async ({
  page,
  browser,
}) => {
  // Elin (lib/seed/demo-certification.ts) holds two module passes signed off about 40 days ago.
  const elinRow = "member-row-elin@lantern-reach.example";
  async function rename(from: string, to: string) {
    await page.goto("/club/members");
    await page
      .getByTestId(elinRow)
      .getByRole("button", { name: `Correct name of ${from}` })
      .click();
    const dialog = page.getByTestId("rename-dialog");
    await dialog.getByLabel("Name").fill(to);
    await dialog.getByRole("button", { name: "Save name" }).click();
    await expect(page.getByTestId("members-status")).toContainText(
      `Name saved: ${to}. 2 current certificates still carry the earlier name: reissue them on the athlete's page.`,
    );
    await page
      .getByTestId("members-status")
      .getByRole("link", { name: `Reissue ${to}'s certificates` })
      .click();
    await expect(page).toHaveURL(/\/roster\/athletes\/\d+#certificates$/);
  }
  async function reissue(from: string, to: string, scan = false): Promise<[string, string][]> {
    const panel = page.getByTestId("reissue-panel");
    await expect(panel).toContainText(`2 current certificates carry an earlier spelling (“${from}”). Reissue them under “${to}”`);
    if (scan) expect(await axeFindings(page)).toEqual([]);
    await panel.getByRole("button", { name: "Reissue under the current name…" }).click();
    const dialog = page.getByTestId("reissue-dialog");
    await expect(dialog.getByRole("button", { name: "Not now" })).toBeFocused();
    if (scan) expect(await axeFindings(page, "dialog[open]")).toEqual([]);
    await dialog.getByRole("button", { name: "Yes, reissue" }).click();
    const status = page.getByTestId("reissue-status");
    await expect(status).toContainText(`Reissued under ${to}: `);
    await expect(panel).toHaveCount(0);
    const pairs = [...((await status.textContent()) ?? "").matchAll(/([A-Z0-9-]+) → ([A-Z0-9-]+)/g)].map((match) => [match[1], match[2]]);
    expect(pairs).toHaveLength(2);
    return pairs as [string, string][];
  }

  await signIn(page, demo.admin);
  await rename("Elin Marchetti", "Elin Marchetti-Vos");
  // A coach sees that the certificates carry the earlier name, and who can reissue them; not the button.
  const coach = await browser.newContext();
  const coachPage = await coach.newPage();
  await signIn(coachPage, demo.coach);
  await coachPage.goto(new URL(page.url()).pathname);
  await expect(coachPage.getByTestId("reissue-note")).toContainText(
    "2 current certificates carry an earlier spelling of the name: a club administrator can reissue them under “Elin Marchetti-Vos”.",
  );
  await expect(coachPage.getByTestId("reissue-panel")).toHaveCount(0);
  await coach.close();
  // Each certificate's page says the name was corrected and where to reissue.
  await page.getByTestId("athlete-certificates").getByRole("link", { name: "Manage" }).first().click();
  await expect(page.getByTestId("name-corrected")).toContainText("Issued to “Elin Marchetti”; the member is now “Elin Marchetti-Vos”.");
  await page.getByTestId("name-corrected").getByRole("link", { name: "on the athlete's page" }).click();
  await expect(page).toHaveURL(/\/roster\/athletes\/\d+#certificates$/);
  const pairs = await reissue("Elin Marchetti", "Elin Marchetti-Vos", true);
  const list = page.getByTestId("athlete-certificates");
  const [oldSerial, newSerial] = pairs[0]!;
  const oldItem = list.getByRole("listitem").filter({ hasText: `${oldSerial}:` });
  await expect(oldItem).toContainText(`revoked: Replaced by ${newSerial}, reissued under the corrected name Elin Marchetti-Vos.`);
  await expect(oldItem).toContainText("issued to Elin Marchetti");
  await expect(list.getByRole("listitem").filter({ hasText: `${newSerial}:` })).toContainText("Valid");

  // Elin's own list says which certificate replaced the revoked one.
  const elin = await browser.newContext();
  const elinPage = await elin.newPage();
  await signIn(elinPage, "elin@lantern-reach.example");
  await elinPage.goto("/learn/certificates");
  await expect(
    elinPage
      .getByTestId("my-certificates")
      .getByRole("listitem")
      .filter({ hasText: `${oldSerial} ·` }),
  ).toContainText(`Replaced by ${newSerial}, reissued under your corrected name: print that one instead.`);
  await elin.close();

  // The old certificate's page points to its replacement, whose record carries the new name.
  await oldItem.getByRole("link", { name: "Manage" }).click();
  await expect(page.getByTestId("certificate-status")).toContainText("Revoked");
  const publicCheck = await page.getByRole("link", { name: "Public check page" }).getAttribute("href");
  await page.getByTestId("replaced-by").click();
  await expect(page.getByRole("heading", { level: 1 })).toContainText(`Certificate ${newSerial}`);
  await expect(page.getByTestId("certificate-record")).toContainText("Elin Marchetti-Vos");
  await expect(page.getByTestId("certificate-status")).toContainText("Valid");

  // Whoever scans the printed copy learns it was replaced, but not the new name.
  await page.goto(new URL(publicCheck!).pathname);
  await expect(page.getByTestId("verify-status")).toContainText("replaced this certificate with one reissued under a corrected name");
  await expect(page.getByTestId("verify-details")).toContainText("Elin Marchetti");
  await expect(page.getByTestId("verify-details")).not.toContainText("Marchetti-Vos");

  // Put the name back for the other specs, reissuing once more.
  await rename("Elin Marchetti-Vos", "Elin Marchetti");
  await reissue("Elin Marchetti-Vos", "Elin Marchetti");
});
