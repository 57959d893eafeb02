import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import { demo, signIn } from "./support/auth";

const wcagTags = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"];
const viewports = [
  { name: "phone", width: 390, height: 844 },
  { name: "desk", width: 1280, height: 800 },
];

/** Pages and main states, each with the account that sees it (null: signed out). */
const pages: { path: string; as: string | null; ready?: (page: Page) => Promise<void> }[] = [
  { path: "/", as: null },
  { path: "/sign-in", as: null },
  { path: "/invite/not-a-real-token-at-all", as: null },
  { path: "/no-such-page", as: null },
  { path: "/learn", as: demo.athlete, ready: (page) => page.getByTestId("module-list").waitFor() },
  { path: "/learn/overall-length", as: demo.athlete },
  { path: "/learn/changing-boats", as: demo.athlete },
  { path: "/learn/grip-cleaning", as: demo.athlete },
  { path: "/learn/setting-inboard/quiz", as: demo.athlete, ready: (page) => page.getByTestId("quiz-form").waitFor() },
  { path: "/learn/setting-inboard/practical", as: demo.athlete },
  { path: "/learn/certificates", as: demo.athlete },
  { path: "/rig", as: demo.athlete },
  { path: "/rig/care", as: demo.athlete },
  { path: "/roster", as: demo.coach, ready: (page) => page.getByRole("table").first().waitFor() },
  { path: "/roster/sign-offs", as: demo.coach },
  { path: "/roster/fleet", as: demo.coach },
  { path: "/roster/fleet/care", as: demo.coach },
  { path: "/roster/fleet/plans", as: demo.coach },
  { path: "/club", as: demo.admin },
  { path: "/club/members", as: demo.admin },
  { path: "/club/register", as: demo.admin },
  { path: "/club/settings", as: demo.admin },
  { path: "/club/outbox", as: demo.admin },
];

for (const viewport of viewports) {
  test.describe(`axe at ${viewport.width}×${viewport.height}`, () => {
    test.use({ viewport: { width: viewport.width, height: viewport.height } });
    for (const entry of pages) {
      test(`${entry.path} (${entry.as ?? "signed out"})`, async ({ page }) => {
        if (entry.as) await signIn(page, entry.as);
        await page.goto(entry.path);
        // Some pages stream behind a loading state: scan once the page's own heading has arrived.
        await page.getByRole("heading", { level: 1 }).first().waitFor();
        await entry.ready?.(page);
        const results = await new AxeBuilder({ page }).withTags(wcagTags).analyze();
        const summary = results.violations.map((violation) => `${violation.id}: ${violation.nodes.map((node) => node.target.join(" ")).join(", ")}`);
        expect(summary).toEqual([]);
      });
    }
  });
}

test.describe("checks axe cannot make", () => {
  test("no horizontal scrolling at 320 px on the athlete's pages", async ({ page }) => {
    await page.setViewportSize({ width: 320, height: 700 });
    await signIn(page, demo.athlete);
    for (const path of ["/learn", "/learn/overall-length", "/learn/changing-boats", "/learn/setting-inboard/quiz", "/sign-in"]) {
      await page.goto(path);
      await page.waitForLoadState("networkidle");
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow, path).toBeLessThanOrEqual(0);
    }
  });

  test("quiz answer targets are at least 44 px high", async ({ page }) => {
    await page.setViewportSize({ width: 360, height: 740 });
    await signIn(page, demo.athlete);
    await page.goto("/learn/secure-and-check/quiz");
    await page.getByTestId("quiz-form").waitFor();
    const heights = await page
      .getByTestId("quiz-form")
      .locator("label:has(input[type=radio]), label:has(input[type=checkbox]), input[type=text], button")
      .evaluateAll((elements) => elements.map((element) => element.getBoundingClientRect().height));
    expect(heights.length).toBeGreaterThan(3);
    expect(Math.min(...heights)).toBeGreaterThanOrEqual(44);
  });

  test("keyboard focus is visible and never hidden under the sticky header", async ({ page }) => {
    await page.setViewportSize({ width: 390, height: 844 });
    await signIn(page, demo.athlete);
    await page.goto("/learn/overall-length/quiz");
    await page.getByTestId("quiz-form").waitFor();
    const header = await page.locator("header").boundingBox();
    for (let step = 0; step < 25; step += 1) {
      await page.keyboard.press("Tab");
      const state = await page.evaluate(() => {
        const element = document.activeElement as HTMLElement | null;
        if (!element || element === document.body) return null;
        const rect = element.getBoundingClientRect();
        const style = getComputedStyle(element);
        return {
          tag: element.tagName,
          top: rect.top,
          bottom: rect.bottom,
          outline: style.outlineStyle !== "none" && parseFloat(style.outlineWidth) > 0,
          viewportHeight: window.innerHeight,
          // The skip link sits over the header on purpose while it has focus.
          inHeader: element.closest("header") !== null || element.getAttribute("href") === "#main",
        };
      });
      if (!state) continue;
      expect(state.outline, `${state.tag} at step ${step} has a visible outline`).toBe(true);
      if (!state.inHeader && header) expect(state.top, `${state.tag} below the header`).toBeGreaterThanOrEqual(header.height - 1);
      expect(state.bottom, `${state.tag} inside the viewport`).toBeLessThanOrEqual(state.viewportHeight + 1);
    }
  });
});
