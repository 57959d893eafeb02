import { expect, test, type Page } from "@playwright/test";
import { planRigChange } from "@/lib/rigging/plan";
import { formatCm } from "@/components/lessons/lesson-format";
import { demo, openNewestMailTo, signIn } from "./support/auth";

// The athlete's helper is a phone page; the whole journey runs at a phone's width.
test.use({ viewport: { width: 390, height: 844 } });
test.describe.configure({ mode: "serial" });

const boatName = "Osprey";
const setName = "Osprey test sculls";
const longSetName = "Overlong test sculls";
// Default club limits (common practice, no source): sculls 280–292 cm long, inboard 85–91 cm.
const clubLimits = { minLengthCm: 280, maxLengthCm: 292, minInboardCm: 85, maxInboardCm: 91 };

async function showSteps(page: Page, boatLabel: string, measured: { lengthCm: number; inboardCm: number }, setLabel?: string) {
  await page.getByLabel("Boat you are moving to").selectOption({ label: boatLabel });
  if (setLabel) await page.getByLabel("Oar set", { exact: true }).selectOption({ label: setLabel });
  await page.getByLabel("Overall length (cm)").fill(String(measured.lengthCm));
  await page.getByLabel("Inboard (cm)").fill(String(measured.inboardCm));
  await page.getByRole("button", { name: "Show my steps" }).click();
  await expect(page.getByTestId("rig-plan")).toBeVisible();
}

/** What the engine says for a scull change; the page must show the same numbers. */
function expectedScullPlan(
  measured: { lengthCm: number; inboardCm: number },
  target: { lengthCm: number; inboardCm: number },
  spanCm: number,
) {
  return planRigChange({ oarType: "sculling", measured, target, clickCm: 0.5, spanCm, halfSwivelCm: 2, limits: clubLimits });
}

async function expectStepsMatch(page: Page, expected: ReturnType<typeof planRigChange>, target: { lengthCm: number; inboardCm: number }) {
  const handle = page.getByTestId("step-handle");
  if (expected.length.action === "none") await expect(handle).toContainText("leave the handle where it is");
  else
    await expect(handle).toContainText(
      `${expected.length.action === "lengthen" ? "Lengthen" : "Shorten"} the oar by ${formatCm(Math.abs(expected.length.changeCm))} cm`,
    );
  await expect(handle).toContainText(`it should read ${formatCm(target.lengthCm)} cm`);
  await expect(handle).toContainText(`the inboard now reads ${formatCm(expected.inboard.startCm)} cm`);
  const collar = page.getByTestId("step-collar");
  if (expected.inboard.direction === "none") await expect(collar).toContainText("No clicks");
  else
    await expect(collar).toContainText(
      `Move the collar ${expected.inboard.clicks} ${expected.inboard.clicks === 1 ? "click" : "clicks"} towards the ${expected.inboard.direction === "towards-blade" ? "blade" : "handle"}`,
    );
  const result = page.getByTestId("step-result");
  await expect(result).toContainText(`Inboard ${formatCm(target.inboardCm - expected.inboard.residualCm)} cm`);
  await expect(result).toContainText(`Outboard ${formatCm(expected.outboardCm)} cm`);
  await expect(result).toContainText(`lever ratio ${expected.leverRatio.toFixed(3)}`);
  const check = page.getByTestId("step-check");
  await expect(check).toContainText(`Overlap of the handles: ${formatCm(expected.overlapCm!)} cm`);
  await expect(check).toContainText(`it is ${formatCm(expected.simpleOverlapCm!)} cm`);
  await expect(check).toContainText("measurement-protocol convention");
  await expect(page.getByTestId("plan-cautions")).toContainText("before going afloat");
}

test("an admin adds a boat and an oar set used in it", async ({ page }) => {
  await signIn(page, demo.admin);
  await page.goto("/roster/fleet");
  await page.getByRole("link", { name: "Add a boat" }).click();
  const boatForm = page.getByTestId("boat-form");
  await boatForm.getByLabel("Boat name").fill(boatName);
  await boatForm.getByLabel("Class").selectOption("2x");
  await boatForm.getByLabel("Span (cm)").fill("139");
  await boatForm.getByRole("button", { name: "Add the boat" }).click();
  await expect(boatForm.getByText("A span is at least 140 cm")).toBeVisible();
  await boatForm.getByLabel("Span (cm)").fill("160");
  await boatForm.getByRole("button", { name: "Add the boat" }).click();
  await expect(page.getByTestId("boat-form-status")).toContainText("Boat saved.");

  await page.goto("/roster/fleet/oar-sets/new");
  const setForm = page.getByTestId("oar-set-form");
  await setForm.getByLabel("Set name").fill(setName);
  await setForm.getByLabel("Oars", { exact: true }).selectOption("sculling");
  await setForm.getByLabel("Number of oars").fill("4");
  await setForm.getByLabel("Target overall length (cm)").fill("288");
  await setForm.getByLabel("Target inboard (cm)").fill("88");
  await setForm.getByLabel("Handle").selectOption("clamped-slide");
  await setForm.getByRole("checkbox", { name: new RegExp(`^${boatName}`) }).check();
  await expect(page.getByTestId("oar-set-form-warnings")).toHaveCount(0);
  await setForm.getByRole("button", { name: "Add the oar set" }).click();
  await expect(page.getByTestId("oar-set-form-status")).toContainText("Oar set saved.");

  await page.goto("/roster/fleet");
  await expect(page.locator(`[data-testid="fleet-boat"][data-name="${boatName}"]`)).toContainText(`Oar sets: ${setName}`);
  await expect(page.locator(`[data-testid="fleet-oar-set"][data-name="${setName}"]`)).toContainText(`Used in: ${boatName}`);
});

test("an athlete picks that boat in the helper and follows the engine's steps, then saves the plan", async ({ page }) => {
  await signIn(page, demo.athlete);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Rig" }).click();
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Change boats");
  const measured = { lengthCm: 287, inboardCm: 86.5 };
  const target = { lengthCm: 288, inboardCm: 88 };
  await showSteps(page, `${boatName}: double scull (2x)`, measured);
  await expect(page.getByTestId("helper-target")).toContainText(`${setName} in ${boatName}: overall length 288 cm, inboard 88 cm`);
  const expected = expectedScullPlan(measured, target, 160);
  // Handle out 1 cm takes the inboard to 87.5 cm; 0.5 cm more is one click towards the blade.
  expect(expected.inboard).toMatchObject({ startCm: 87.5, clicks: 1, direction: "towards-blade" });
  await expectStepsMatch(page, expected, target);
  await expect(page.getByTestId("plan-warnings")).toHaveCount(0);
  await expect(page.getByTestId("plan-offline")).toHaveCount(0);
  await page.getByRole("button", { name: "Save this plan" }).click();
  await expect(page.getByTestId("save-status")).toContainText("Plan saved: your coach can see it.");
});

test("a target outside the club's limits warns the admin while typing and the athlete in the steps", async ({ page, browser }) => {
  await signIn(page, demo.admin);
  await page.goto("/roster/fleet/oar-sets/new");
  const setForm = page.getByTestId("oar-set-form");
  await setForm.getByLabel("Set name").fill(longSetName);
  await setForm.getByLabel("Number of oars").fill("2");
  await setForm.getByLabel("Target overall length (cm)").fill("293");
  await setForm.getByLabel("Target inboard (cm)").fill("88");
  await expect(page.getByTestId("oar-set-form-warnings")).toContainText("above your club's range for sculls (280–292 cm)");
  await setForm.getByRole("checkbox", { name: new RegExp(`^${boatName}`) }).check();
  await setForm.getByRole("button", { name: "Add the oar set" }).click();
  await expect(page.getByTestId("oar-set-form-status")).toContainText("Oar set saved, with a warning.");

  const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const athlete = await context.newPage();
  await signIn(athlete, demo.athlete);
  await athlete.goto("/rig");
  const measured = { lengthCm: 288, inboardCm: 88 };
  await showSteps(athlete, `${boatName}: double scull (2x)`, measured, longSetName);
  const expected = expectedScullPlan(measured, { lengthCm: 293, inboardCm: 88 }, 160);
  expect(expected.warnings.join(" ")).toContain("ask your coach before going afloat");
  await expect(athlete.getByTestId("plan-warnings")).toContainText("The overall length of 293 cm is above your club's range for sculls");
  await expect(athlete.getByTestId("plan-warnings")).toContainText("ask your coach before going afloat");
  await expectStepsMatch(athlete, expected, { lengthCm: 293, inboardCm: 88 });
  await athlete.getByRole("button", { name: "Save this plan" }).click();
  await expect(athlete.getByTestId("save-status")).toContainText("Plan saved");
  await context.close();
});

test("offline, the helper still works out the steps and keeps a saved plan until the phone is back online", async ({ page, context }) => {
  await signIn(page, demo.athlete);
  await page.goto("/rig");
  await expect(page.getByTestId("rig-helper")).toBeVisible();
  await context.setOffline(true);
  const measured = { lengthCm: 289, inboardCm: 89.5 };
  const target = { lengthCm: 288, inboardCm: 88 };
  await showSteps(page, "Kittiwake: double scull (2x)", measured);
  await expect(page.getByTestId("plan-offline")).toContainText("Worked out on this phone");
  await expectStepsMatch(page, expectedScullPlan(measured, target, 159), target);
  await page.getByRole("button", { name: "Save this plan" }).click();
  await expect(page.getByTestId("save-status")).toContainText("Kept on this phone");
  await expect(page.getByTestId("pending-status")).toContainText("1 plan is kept on this phone");
  expect(await page.evaluate(() => window.localStorage.getItem("slipway.rig.pending-plans.v1"))).toContain('"boatId"');

  await context.setOffline(false);
  await expect(page.getByTestId("pending-status")).toContainText("1 plan kept on this phone was sent to your club.");
  expect(await page.evaluate(() => window.localStorage.getItem("slipway.rig.pending-plans.v1"))).toBe("[]");
});

test("a length typed with its unit ('289 cm', '89,5 cm') gives the same steps as the bare number", async ({ page }) => {
  await signIn(page, demo.athlete);
  await page.goto("/rig");
  await page.getByLabel("Boat you are moving to").selectOption({ label: "Kittiwake: double scull (2x)" });
  await page.getByLabel("Overall length (cm)").fill("289 cm");
  await page.getByLabel("Inboard (cm)").fill("89,5 cm");
  await page.getByRole("button", { name: "Show my steps" }).click();
  await expect(page.getByTestId("rig-plan")).toBeVisible();
  const target = { lengthCm: 288, inboardCm: 88 };
  await expectStepsMatch(page, expectedScullPlan({ lengthCm: 289, inboardCm: 89.5 }, target, 159), target);
});

test("a coach sees who rigged what and when, filtered by boat", async ({ page }) => {
  await signIn(page, demo.coach);
  await page.goto("/roster/fleet/plans");
  await page.getByLabel("Boat").selectOption({ label: "Kittiwake (2x)" });
  await page.getByRole("button", { name: "Show" }).click();
  await expect(page).toHaveURL(/\/roster\/fleet\/plans\?boat=\d+/);
  const entries = page.getByTestId("plan-entry");
  await expect(entries).toHaveCount(1);
  await expect(entries.first()).toContainText("Ada Whitcombe · Kittiwake (2x) · Green-band sculls");
  await expect(entries.first()).toContainText("Measured 289 cm, inboard 89.5 cm → target 288 cm, inboard 88 cm.");
  await expect(entries.first()).toContainText("Handle in 1 cm, then collar 1 click towards the handle.");

  await page.getByLabel("Boat").selectOption({ label: `${boatName} (2x)` });
  await page.getByRole("button", { name: "Show" }).click();
  await expect(entries).toHaveCount(2);
  await expect(entries.filter({ hasText: longSetName })).toContainText("1 warning shown to the athlete");
  await expect(entries.filter({ hasText: `· ${setName}` })).toContainText("No warnings.");

  await page.getByLabel("Boat").selectOption({ label: "Grebe (8+)" });
  await page.getByRole("button", { name: "Show" }).click();
  await expect(page.getByTestId("plans-empty")).toHaveText("No saved plans for Grebe yet.");
});

test("a boat's settings read in plain words, with the overlap convention named", async ({ page }) => {
  await signIn(page, demo.athlete);
  await page.goto("/rig");
  await page.getByLabel("Boat you are moving to").selectOption({ label: "Kittiwake: double scull (2x)" });
  await page.getByRole("link", { name: "All of Kittiwake's settings" }).click();
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Kittiwake");
  await expect(page.getByTestId("boat-settings")).toContainText("Span: 159 cm, the distance between the centres of the two pins.");
  const set = page.getByTestId("boat-oar-set").filter({ hasText: "Green-band sculls" });
  // L 288, I 88, span 159: O 200, lever ratio 2.273, overlap 21 (protocol) / 17 (simple), span gearing 2.516 (FISA 2006 protocol; Kleshnev 2006).
  await expect(set).toContainText("Set each to an overall length of 288 cm and an inboard of 88 cm.");
  await expect(set).toContainText("Outboard 200 cm; lever ratio (outboard ÷ inboard) 2.273.");
  await expect(set).toContainText("Overlap 21 cm by the measurement-protocol convention");
  await expect(set).toContainText("half swivel width of 2 cm; 17 cm without the swivel term");
  await expect(set).toContainText("Span gearing 2.516.");

  await page.goto("/rig");
  await page
    .getByTestId("rig-boats")
    .getByRole("link", { name: /^Grebe/ })
    .click();
  await expect(page.getByTestId("boat-settings")).toContainText("Spread: 84 cm, from the boat's centre line to the centre of the pin.");
  // Sweep, I 116, spread 84: 116 + 2 − 84 = 34 cm past the centre line (FISA 2006 protocol), 32 cm simple.
  await expect(page.getByTestId("boat-oar-set")).toContainText(
    "The handle reaches 34 cm past the centre line by the measurement-protocol convention",
  );
  await expect(page.getByTestId("boat-oar-set")).toContainText("32 cm without the swivel term");
});

test("recording a cleaning makes a due set not due", async ({ page, browser }) => {
  await signIn(page, demo.athlete);
  await page.goto("/rig/care");
  await expect(page.getByTestId("cleaning-cautions")).toContainText("never a steel brush");
  await expect(page.getByTestId("cleaning-cautions")).toContainText("gloves and eye protection");
  const row = page.locator('[data-testid="cleaning-row"][data-set="Eight sweeps"]');
  await expect(row.getByTestId("due-badge")).toHaveText("⚠Overdue");
  const form = page.getByTestId("cleaning-form");
  await form.getByLabel("Oar set").selectOption({ label: "Eight sweeps" });
  await form.getByRole("radio", { name: /Mild detergent and a soft brass brush/ }).check();
  await form.getByRole("button", { name: "Record the cleaning" }).click();
  await expect(page.getByTestId("cleaning-status")).toContainText("Cleaning recorded.");
  await expect(row.getByTestId("due-badge")).toHaveText("✓Clean");
  await expect(row).toContainText("By Ada Whitcombe.");

  const context = await browser.newContext();
  const coach = await context.newPage();
  await signIn(coach, demo.coach);
  await coach.goto("/roster/fleet/care");
  await expect(coach.locator('[data-testid="cleaning-row"][data-set="Eight sweeps"]').getByTestId("due-badge")).toHaveText("✓Clean");
  await expect(coach.locator('[data-testid="cleaning-row"][data-set="Pair sweeps"]').getByTestId("due-badge")).toHaveText("⚠Due now");
  await context.close();
});

test("a coach switches the humid spell and sends the digest now; it reaches the outbox", async ({ page, browser }) => {
  await signIn(page, demo.coach);
  await page.goto("/roster/fleet/care");
  await page.getByRole("button", { name: "Switch the humid spell on" }).click();
  await expect(page.getByTestId("humid-spell-state")).toContainText("Humid spell is on");
  await expect(page.locator('[data-testid="cleaning-row"][data-set="Green-band sculls"]').getByTestId("due-badge")).toHaveText(
    "⚠Due today (humid spell)",
  );
  await page.getByRole("button", { name: "Switch the humid spell off" }).click();
  await expect(page.getByTestId("humid-spell-state")).toContainText("Humid spell is off");

  await page.getByRole("button", { name: "Send the digest now" }).click();
  // Other specs may add coaches before this one runs: the count is the club's coaches and admins then.
  await expect(page.getByTestId("digest-status")).toContainText(/sent to \d+ coaches and admins/);

  const context = await browser.newContext();
  const admin = await context.newPage();
  await signIn(admin, demo.admin);
  const text = await openNewestMailTo(admin, demo.coach);
  expect(text).toContain("weekly grip-cleaning digest for Lantern Reach Rowing Club");
  expect(text).toContain("- Pair sweeps: due now. No cleaning on record.");
  await context.close();
});

test("the plan API is public, answers the engine's numbers, and refuses bad values with 400", async ({ request }) => {
  const body = { oarType: "sweep", measured: { lengthCm: 376, inboardCm: 117 }, target: { lengthCm: 374, inboardCm: 116 }, spreadCm: 85 };
  const response = await request.post("/api/rig/plan", { data: body });
  expect(response.status()).toBe(200);
  const expected = planRigChange({ ...body, oarType: "sweep", clickCm: 0.5, halfSwivelCm: 2 });
  // L 374, I 116, spread 85: O 258, lever ratio 2.224, span gearing 3.035, overlap 33 (FISA 2006 protocol).
  expect(await response.json()).toEqual({
    length: expected.length,
    inboard: {
      changeCm: expected.inboard.changeCm,
      clicks: expected.inboard.clicks,
      direction: expected.inboard.direction,
      residualCm: expected.inboard.residualCm,
    },
    outboardCm: 258,
    leverRatio: 2.224,
    spanGearing: 3.035,
    overlapCm: 33,
    warnings: [],
  });
  const bad = await request.post("/api/rig/plan", { data: { ...body, measured: { lengthCm: 200, inboardCm: 80 } } });
  expect(bad.status()).toBe(400);
  expect(Object.keys(((await bad.json()) as { fields: Record<string, string[]> }).fields)).toContain("measured.lengthCm");
});

test("athletes cannot open the fleet pages", async ({ page }) => {
  await signIn(page, demo.athlete);
  const response = await page.goto("/roster/fleet");
  expect(response?.status()).toBe(403);
  const plans = await page.request.get("/api/rig/plans");
  expect(plans.status()).toBe(403);
});
