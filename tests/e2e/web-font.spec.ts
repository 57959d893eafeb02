import { expect, test, type Page } from "@playwright/test";
import { signIn } from "./support/auth";
import { loadAthleteEmail } from "@/lib/seed/load-athletes";

/** The first family of the body's computed font-family, without quotes. */
async function bodyFontFamily(page: Page): Promise<string> {
  return page.evaluate(() =>
    getComputedStyle(document.body)
      .fontFamily.split(",")[0]!
      .trim()
      .replace(/^["']|["']$/g, ""),
  );
}

/** The font files the page has requested so far (resource timing). */
async function fontRequests(page: Page): Promise<string[]> {
  return page.evaluate(() =>
    performance
      .getEntriesByType("resource")
      .map((entry) => entry.name)
      .filter((name) => name.endsWith(".woff2")),
  );
}

test.describe("Inter waits for the page to hydrate; text paints in the metric-matched fallback first", () => {
  test("without JavaScript the lesson fetches no font file and reads in the fallback face", async ({ browser, baseURL }) => {
    const context = await browser.newContext({ javaScriptEnabled: false, baseURL });
    const page = await context.newPage();
    // Signed in with scripts on (the sign-in form needs them), then the lesson read with scripts off.
    const signInPage = await browser.newContext({ baseURL });
    const signing = await signInPage.newPage();
    // A load-club athlete, so the demo members keep their "never signed in" state for other specs.
    await signIn(signing, loadAthleteEmail(37));
    await context.addCookies(await signInPage.cookies());
    await signInPage.close();

    const response = await page.goto("/learn/setting-inboard", { waitUntil: "load" });
    expect(response?.status()).toBe(200);
    await expect(page.getByRole("heading", { level: 1 })).toContainText("inboard", { ignoreCase: true });
    expect(await page.evaluate(() => document.documentElement.dataset.webFont)).toBeUndefined();
    expect(await bodyFontFamily(page)).toBe("Slipway Fallback");
    expect(await fontRequests(page)).toEqual([]);
    await context.close();
  });

  test("with JavaScript the page switches to Inter after hydrating, and the font files arrive", async ({ page }) => {
    await page.goto("/", { waitUntil: "load" });
    await expect(page.locator("html[data-web-font=on]")).toBeAttached();
    // next/font names the face after the variable it is declared in (slipwaySans), hashed or not.
    expect(await bodyFontFamily(page)).toMatch(/slipwaySans/);
    await page.evaluate(() => document.fonts.ready);
    await expect.poll(() => fontRequests(page)).not.toEqual([]);
    expect(await page.evaluate(() => [...document.fonts].some((face) => face.status === "loaded" && /slipwaySans/.test(face.family)))).toBe(
      true,
    );
  });
});
