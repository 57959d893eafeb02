import { expect, test } from "@playwright/test";
import { demo, signIn, signedInContext } from "./support/auth";
import { formatIsoDate, isoDateInZone, localIsoDate } from "@/lib/care/calendar";
import { addDaysIso } from "@/lib/care/dates";

/** Edges of the coach's and the administrator's pages: stale links, stale pages, stale messages. */
test.describe("coach and admin edges", () => {
  test("a record that does not exist answers 404 with the not-found page, not the error page", async ({ browser }) => {
    // Status 404, not a 200 carrying the not-found page: these pages must not sit under a loading.tsx,
    // or the response has started streaming before the page finds out (tests/unit/route-loading.test.ts).
    const unknownUuid = "00000000-0000-4000-8000-000000000000";
    const detailPages: { as: string; paths: string[] }[] = [
      {
        as: demo.coach,
        paths: [
          "/roster/athletes/999999",
          `/roster/sign-offs/${unknownUuid}`,
          "/roster/fleet/boats/999999",
          "/roster/fleet/oar-sets/999999",
          "/rig/boats/999999",
        ],
      },
      { as: demo.admin, paths: [`/club/register/${unknownUuid}`, "/club/outbox/999999"] },
      { as: demo.athlete, paths: ["/rig/boats/999999", "/rig/boats/not-a-number"] },
    ];
    for (const { as, paths } of detailPages) {
      const { context, page } = await signedInContext(browser, as);
      for (const path of paths) {
        const response = await page.goto(path);
        expect(response?.status(), `${as} ${path}`).toBe(404);
        await expect(page.getByRole("heading", { level: 1 }), path).toHaveText("Not found");
      }
      await context.close();
    }
  });

  test("a link to a record page shows it is on its way while the page loads", async ({ page }) => {
    // Record pages have no loading.tsx (their unknown ids are 404s): the link itself says it was taken.
    await signIn(page, demo.coach);
    await page.goto("/roster");
    let release = () => {};
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route(/\/roster\/athletes\/\d+/, async (route) => {
      const headers = route.request().headers();
      if (headers["rsc"] && !headers["next-router-prefetch"]) await held;
      await route.continue();
    });
    const link = page.getByRole("link", { name: "Femi Ashdown" });
    const mark = link.getByTestId("link-pending");
    await expect(mark).toHaveCount(0);
    await link.click();
    await expect(mark).toBeVisible();
    await expect(page.getByTestId("roster-table")).toBeVisible();
    release();
    await expect(page.getByTestId("athlete-clearance-state")).toBeVisible();
    await expect(page.getByTestId("link-pending")).toHaveCount(0);
    await page.unrouteAll({ behavior: "wait" });
  });

  test("a coach whose page is stale when another coach suspends sees the suspension after the refusal", async ({ browser }) => {
    const first = await signedInContext(browser, demo.coach);
    const second = await signedInContext(browser, "coach.ines@lantern-reach.example");
    await first.page.goto("/roster");
    await first.page.getByRole("link", { name: "Femi Ashdown" }).click();
    await expect(first.page.getByTestId("athlete-clearance-state")).toContainText("May rig unsupervised");
    const athletePath = new URL(first.page.url()).pathname;
    await second.page.goto(athletePath);
    await expect(second.page.getByTestId("athlete-clearance-state")).toContainText("May rig unsupervised");

    await first.page.getByLabel("Reason for suspending").fill("Clamp screw left loose on the rack");
    await first.page.getByRole("button", { name: "Suspend clearance" }).click();
    await expect(first.page.getByTestId("athlete-clearance-state")).toContainText("Suspended by a coach");

    // The second coach's page still offers to suspend: the refusal must also show the real state.
    await second.page.getByLabel("Reason for suspending").fill("Also saw the loose screw");
    await second.page.getByRole("button", { name: "Suspend clearance" }).click();
    await expect(second.page.getByTestId("suspension-status")).toContainText("already suspended");
    await expect(second.page.getByTestId("athlete-clearance-state")).toContainText("Suspended by a coach");
    await expect(second.page.getByTestId("athlete-clearance")).toContainText("Clamp screw left loose on the rack");

    // Put the demo athlete back as the other specs expect her.
    await second.page.getByRole("button", { name: "Lift the suspension" }).click();
    await expect(second.page.getByTestId("athlete-clearance-state")).toContainText("May rig unsupervised");
    await first.context.close();
    await second.context.close();
  });

  test("an admin's stale certificate page shows the revocation after the refusal", async ({ browser }) => {
    const { context, page: first } = await signedInContext(browser, demo.admin);
    await first.goto("/club/register");
    // Lena's (lib/seed/demo-certification.ts) long-expired grip-cleaning pass: no other spec reads it.
    await first
      .getByRole("row", { name: /Lena Fairbrother.*Cleaning the grips/ })
      .getByRole("link")
      .click();
    await expect(first.getByTestId("certificate-status")).toContainText("Expired");
    const second = await context.newPage();
    await second.goto(first.url());
    await expect(second.getByTestId("certificate-status")).toContainText("Expired");

    // Revoking asks once more, with the reason; "Keep it" (where focus starts) changes nothing.
    await first.getByLabel("Reason for revoking").fill("Issued against the wrong athlete");
    await first.getByRole("button", { name: "Revoke certificate…" }).click();
    const dialog = first.getByTestId("revoke-dialog");
    await expect(dialog).toContainText("“Issued against the wrong athlete”");
    await expect(dialog.getByRole("button", { name: "Keep it" })).toBeFocused();
    await first.keyboard.press("Enter");
    await expect(dialog).toBeHidden();
    await first.reload();
    await expect(first.getByTestId("certificate-status")).toContainText("Expired");

    await first.getByLabel("Reason for revoking").fill("Issued against the wrong athlete");
    await first.getByRole("button", { name: "Revoke certificate…" }).click();
    await first.getByTestId("revoke-dialog").getByRole("button", { name: "Yes, revoke it" }).click();
    await expect(first.getByTestId("certificate-status")).toContainText("Revoked");

    await second.getByLabel("Reason for revoking").fill("Issued against the wrong athlete");
    await second.getByRole("button", { name: "Revoke certificate…" }).click();
    await second.getByTestId("revoke-dialog").getByRole("button", { name: "Yes, revoke it" }).click();
    await expect(second.getByTestId("revoke-status")).toContainText("already revoked");
    await expect(second.getByTestId("certificate-status")).toContainText("Revoked");
    await expect(second.getByTestId("revoke-form")).toHaveCount(0);
    await context.close();
  });

  test("register filters with the dates swapped say so instead of offering downloads that fail", async ({ page }) => {
    await signIn(page, demo.admin);
    await page.goto("/club/register");
    const filters = page.getByTestId("register-filters");
    await filters.getByLabel("Issued from").fill("2026-12-01");
    await filters.getByLabel("Issued to").fill("2026-11-01");
    await filters.getByRole("button", { name: "Show" }).click();
    await expect(page.getByTestId("register-filter-problem")).toContainText("“Issued to” is before “Issued from”");
    await expect(page.getByRole("link", { name: "Print-ready PDF" })).toHaveCount(0);
    await expect(page.getByRole("link", { name: "Download CSV" })).toHaveCount(0);

    // Good filters keep both downloads, and they answer.
    await filters.getByLabel("Issued to").fill("2099-12-31");
    await filters.getByRole("button", { name: "Show" }).click();
    const pdf = page.getByRole("link", { name: "Print-ready PDF" });
    await expect(pdf).toBeVisible();
    const response = await page.request.get((await pdf.getAttribute("href"))!);
    expect(response.status()).toBe(200);
  });

  test("on a desk screen the register shows every column without scrolling sideways", async ({ page }) => {
    await page.setViewportSize({ width: 1280, height: 800 });
    await signIn(page, demo.admin);
    await page.goto("/club/register");
    const region = page.getByRole("region", { name: "Register, scrolls sideways" });
    await expect(page.getByTestId("register-table")).toBeVisible();
    const fits = () => region.evaluate((element) => element.scrollWidth <= element.clientWidth);
    expect(await fits(), "the register table fits its box at 1280 px").toBe(true);
    const box = (await region.boundingBox())!;
    expect(box.x, "the wider box stays inside the window").toBeGreaterThanOrEqual(0);
    expect(box.x + box.width).toBeLessThanOrEqual(1280);

    // A phone keeps the page's width: the table scrolls inside its box, the page does not.
    await page.setViewportSize({ width: 390, height: 844 });
    const pageScrolls = await page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth);
    expect(pageScrolls, "no sideways scrolling of the page at 390 px").toBe(false);
  });

  test("the roster keeps its filter and search through opening an athlete, the back button and a reload", async ({ page }) => {
    await signIn(page, demo.coach);
    await page.goto("/roster");
    await page.getByLabel("Show").selectOption({ label: "Cleared to rig unsupervised" });
    await page.getByLabel("Search by name").fill("femi");
    await expect(page).toHaveURL(/\/roster\?filter=cleared&q=femi$/);
    await page.getByRole("link", { name: "Femi Ashdown" }).click();
    await expect(page.getByTestId("athlete-clearance")).toBeVisible();
    await page.goBack();
    await expect(page.getByLabel("Show")).toHaveValue("cleared");
    await expect(page.getByLabel("Search by name")).toHaveValue("femi");
    await expect(page.getByRole("row", { name: /Femi Ashdown/ })).toBeVisible();
    await page.reload();
    await expect(page.getByLabel("Search by name")).toHaveValue("femi");
    await expect(page.getByRole("row")).toHaveCount(2); // the header and Femi

    // Back to everyone: the address drops what is not needed.
    await page.getByLabel("Show").selectOption({ label: "Everyone" });
    await page.getByLabel("Search by name").fill("");
    await expect(page).toHaveURL(/\/roster$/);
  });

  test("a coach reads the last day a clearance holds, never 'until' the day it has already run out", async ({ page }) => {
    // Femi (lib/seed/demo-certification.ts) is cleared. Not Greta, whom members.spec.ts makes a coach.
    await signIn(page, demo.coach);
    await page.goto("/roster");
    const row = page.getByRole("row", { name: /Femi Ashdown/ });
    await expect(row).toContainText("May rig unsupervised");
    await expect(row).toContainText(/expires \d{1,2} \w+ \d{4}/);
    await expect(row).not.toContainText("until");

    await row.getByRole("link", { name: "Femi Ashdown" }).click();
    const clearance = page.getByTestId("athlete-clearance");
    await expect(clearance).toContainText(/Cleared up to and including (\d{1,2} \w+ \d{4}): the first required pass expires on/);
    await expect(clearance).not.toContainText("until");
    // His certificates give the day each one expires, not a range that reads as including it.
    const certificates = page.getByTestId("athlete-certificates");
    await expect(certificates).toContainText(/Issued \d{1,2} \w+ \d{4} · expires \d{1,2} \w+ \d{4}/);
    await expect(certificates).not.toContainText(/\d{4} to \d/);
  });

  test("on a phone the athlete's modules keep their names readable, and an expired pass says it has expired", async ({ browser }) => {
    // Lena (lib/seed/demo-certification.ts) passed every module long enough ago for the passes to lapse.
    const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    await signIn(page, demo.coach);
    await page.goto("/roster");
    await page.getByRole("link", { name: "Lena Fairbrother" }).click();
    const modules = page.getByTestId("athlete-modules");
    await expect(modules.getByRole("columnheader")).toHaveText(["Module", "Status"]);
    const firstRow = modules.getByRole("row").nth(1);
    await expect(firstRow).toContainText(/Best quiz score \d+ % · pass expired \d{1,2} \w+ \d{4}/);
    const table = modules.getByRole("table");
    expect(await table.evaluate((element) => element.scrollWidth <= element.parentElement!.clientWidth)).toBe(true);

    // At a desk the same facts have their own columns.
    await page.setViewportSize({ width: 1280, height: 800 });
    await expect(modules.getByRole("columnheader")).toHaveText(["Module", "Status", "Best quiz score", "Pass expires"]);
    await expect(firstRow.getByRole("cell").nth(2)).toHaveText(/^expired \d{1,2} \w+ \d{4}$/);
    await context.close();
  });

  test("the invitation form drops the last answer when the next try fails its own check", async ({ page }) => {
    await signIn(page, demo.admin);
    await page.goto("/club");
    const form = page.getByTestId("invite-form");
    await form.getByLabel("Name").fill("Ada Again");
    await form.getByLabel("E-mail").fill(demo.athlete);
    await form.getByRole("button", { name: "Send invitation" }).click();
    await expect(page.getByTestId("invite-status")).toContainText("already a member");

    await form.getByLabel("Name").fill("Someone New");
    await form.getByLabel("E-mail").fill("not-an-address");
    await form.getByRole("button", { name: "Send invitation" }).click();
    await expect(form.getByText("Enter an e-mail address like name@example.org.")).toBeVisible();
    await expect(page.getByTestId("invite-status")).not.toContainText("already a member");
  });

  test("the race-day form says when a day is already on the calendar, and drops its last answer", async ({ page }) => {
    await signIn(page, demo.coach);
    await page.goto("/roster/fleet/care");
    const form = page.getByTestId("race-day-form");
    const status = page.getByTestId("race-day-status");
    const day = addDaysIso(localIsoDate(), 400); // the form takes days up to two years ahead
    const add = async (value: string) => {
      await form.getByLabel("Add a race day").fill(value);
      await form.getByRole("button", { name: "Add race day" }).click();
    };
    await add(day);
    await expect(status).toHaveText("✓ Race day added.");
    await add(day);
    await expect(status).toHaveText("✓ That day is already a race day.");
    await expect(
      page
        .getByTestId("race-days")
        .getByRole("listitem")
        .filter({ hasText: formatIsoDate(day) }),
    ).toHaveCount(1);

    // A day the form itself refuses (blank) leaves no earlier answer standing beside its error.
    await add("");
    await expect(status).toBeEmpty();

    // Leave the calendar as the other specs expect it.
    await page.getByRole("button", { name: `Remove the race day ${formatIsoDate(day)}` }).click();
    await expect(status).toHaveText("✓ Race day removed.");
  });

  test("a form whose action gets no answer says so, keeps its entries, and works once the connection is back", async ({ browser }) => {
    const { context, page } = await signedInContext(browser, demo.coach);
    await page.goto("/roster/fleet/care");
    const humidOn = page.getByRole("button", { name: "Switch the humid spell on" });
    await expect(humidOn).toBeEnabled();
    await context.setOffline(true);

    // A button whose action runs in a transition: before, the rejection brought up the error page.
    await humidOn.click();
    await expect(page.getByTestId("humid-spell-status")).toContainText("You are offline, so nothing was saved.");
    await expect(page.getByTestId("humid-spell-state")).toContainText("Humid spell is off");
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("Cleaning due");

    // A form: the message beside it, and the day typed is still there to send again.
    const form = page.getByTestId("race-day-form");
    const status = page.getByTestId("race-day-status");
    const day = addDaysIso(localIsoDate(), 401);
    await form.getByLabel("Add a race day").fill(day);
    await form.getByRole("button", { name: "Add race day" }).click();
    await expect(status).toContainText("You are offline, so nothing was saved.");
    await expect(form.getByLabel("Add a race day")).toHaveValue(day);
    await expect(form.getByRole("button", { name: "Add race day" })).toBeEnabled();

    await context.setOffline(false);
    await form.getByRole("button", { name: "Add race day" }).click();
    await expect(status).toHaveText("✓ Race day added.");
    // Leave the calendar as the other specs expect it.
    await page.getByRole("button", { name: `Remove the race day ${formatIsoDate(day)}` }).click();
    await expect(status).toHaveText("✓ Race day removed.");
    await context.close();
  });

  test("a form on a page opened before an update (its action unknown to the server) says to reload; nothing is saved", async ({ page }) => {
    await signIn(page, demo.coach);
    await page.goto("/roster/fleet/care");
    const form = page.getByTestId("race-day-form");
    await expect(form.getByRole("button", { name: "Add race day" })).toBeEnabled();
    // What a tab older than the running build sends: an action id the server was not built with.
    let refused = 0;
    await page.route("**/roster/fleet/care", async (route) => {
      const request = route.request();
      if (request.method() !== "POST" || !request.headers()["next-action"]) return route.continue();
      const response = await route.fetch({ headers: { ...request.headers(), "next-action": "7f".repeat(21) } });
      // Next's answer to an unknown action: 409, plain text, flagged by this header.
      refused += response.status() === 409 && response.headers()["x-nextjs-action-not-found"] === "1" ? 1 : 0;
      return route.fulfill({ response });
    });
    const day = addDaysIso(localIsoDate(), 402);
    await form.getByLabel("Add a race day").fill(day);
    await form.getByRole("button", { name: "Add race day" }).click();
    await expect(page.getByTestId("race-day-status")).toContainText(
      "Slipway was updated after this page was opened, so nothing was saved.",
    );
    expect(refused).toBe(1);
    await expect(form.getByLabel("Add a race day")).toHaveValue(day);
    await page.unroute("**/roster/fleet/care");
    await page.reload();
    await expect(page.getByRole("button", { name: `Remove the race day ${formatIsoDate(day)}` })).toHaveCount(0);
  });

  test("a roster that cannot be fetched says so in words, not the browser's", async ({ page }) => {
    await signIn(page, demo.coach);
    await page.route("**/api/roster/matrix", (route) => route.abort("internetdisconnected"));
    await page.goto("/roster");
    await expect(page.getByText("No answer from Slipway: the roster could not be loaded.")).toBeVisible();
    await expect(page.getByText("Failed to fetch")).toHaveCount(0);
  });

  test("the club's time zone sets the day of the cleaning log, on the athletes' page too, and the clock of times shown", async ({
    page,
  }) => {
    // A zone whose date differs from UTC's right now: UTC+14 from 10:00 UTC, UTC-11 before 11:00 UTC
    // (IANA Time Zone Database, IANA, 2025).
    const zone = new Date().getUTCHours() >= 10 ? "Pacific/Kiritimati" : "Pacific/Pago_Pago";
    await signIn(page, demo.admin);
    await page.goto("/club/settings");
    const timeZone = page.getByLabel("Time zone");
    const original = await timeZone.inputValue();
    const save = async (value: string) => {
      await page.goto("/club/settings");
      await page.getByLabel("Time zone").selectOption(value);
      await page.getByRole("button", { name: "Save settings" }).click();
      await expect(page.getByTestId("settings-status")).toContainText("Settings saved.");
    };
    await save(zone);
    try {
      await page.reload();
      await expect(page.getByLabel("Time zone")).toHaveValue(zone);
      const clubDay = isoDateInZone(zone);
      await page.goto("/rig/care");
      await expect(page.getByText(`Oar sets on ${formatIsoDate(clubDay)}`)).toBeVisible();
      await expect(page.getByLabel("Day of the cleaning")).toHaveValue(clubDay);
      await expect(page.getByLabel("Day of the cleaning")).toHaveAttribute("max", clubDay);
      // Times are on the club's clock and say so: the administrator signed in minutes ago.
      await page.goto("/club/members");
      const offset = zone === "Pacific/Kiritimati" ? "GMT+14" : "GMT-11";
      await expect(
        page
          .getByRole("cell", { name: new RegExp(`^${formatIsoDate(clubDay).slice(4)}, \\d{2}:\\d{2} ${offset.replace("+", "\\+")}$`) })
          .first(),
      ).toBeVisible();
    } finally {
      // Leave the club in the zone the other specs expect (the server's, where they compute "today").
      await save(original);
    }
  });

  test("inviting an address again with another role says the earlier link no longer works", async ({ page }) => {
    await signIn(page, demo.admin);
    await page.goto("/club");
    const form = page.getByTestId("invite-form");
    const invite = async (role: string) => {
      await form.getByLabel("Name").fill("Wren Salter");
      await form.getByLabel("E-mail").fill("wren.salter@lantern-reach.example");
      await form.getByLabel("Role").selectOption(role);
      await form.getByRole("button", { name: "Send invitation" }).click();
    };
    await invite("coach");
    await expect(page.getByTestId("invite-status")).toHaveText("✓ Invitation sent to wren.salter@lantern-reach.example.");
    await invite("athlete");
    await expect(page.getByTestId("invite-status")).toContainText("The earlier invitation to this address no longer works.");
  });
});
