import { chromium } from "@playwright/test";
const base = "http://127.0.0.1:3140";
const [, , email, width, ...paths] = process.argv;
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox"] });
const ctx = await browser.newContext({ viewport: { width: Number(width), height: 844 }, deviceScaleFactor: 1 });
const page = await ctx.newPage();
await page.goto(base + "/sign-in");
const form = page.getByTestId("password-sign-in");
await form.getByLabel("E-mail").fill(email);
await form.getByLabel("Password").fill("lantern-reach-demo");
await form.getByRole("button", { name: "Sign in" }).click();
await page.getByTestId("signed-in-as").waitFor();
for (const p of paths) {
  await page.goto(base + p);
  await page.waitForLoadState("networkidle");
  const sw = await page.evaluate(() => [document.documentElement.scrollWidth, innerWidth]);
  const name = "/tmp/probe/" + p.replace(/\W+/g, "_") + "_" + width + ".png";
  await page.screenshot({ path: name, fullPage: true });
  console.log(p, sw, name);
}
await browser.close();
