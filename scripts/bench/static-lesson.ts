import fs from "node:fs";
import path from "node:path";
import { chromium } from "@playwright/test";
import { chromePath } from "./lighthouse";

/** Served by the app itself from public/ during the bench only; deleted afterwards (and git-ignored). */
export const staticLessonFile = path.join(process.cwd(), "public", "bench-static-lesson.html");
export const staticLessonPath = "/bench-static-lesson.html";

interface TextBlock {
  tag: string;
  text: string;
}

function escapeHtml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

/** The page a static site would serve for the lesson: the same visible text, headings kept, no script, no web font. */
export function staticLessonHtml(title: string, blocks: readonly TextBlock[]): string {
  const body = blocks
    .map(({ tag, text }) => {
      const element = /^h[1-4]$/.test(tag) ? tag : "p";
      return `<${element}>${escapeHtml(text)}</${element}>`;
    })
    .join("\n");
  return `<!doctype html>
<html lang="en-GB">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>body{margin:0 auto;max-width:48rem;padding:1.5rem 1rem 4rem;font-family:system-ui,sans-serif;line-height:1.5;color:#0f172a}h1{font-size:1.875rem}</style>
</head>
<body>
<main>
${body}
</main>
</body>
</html>
`;
}

/**
 * Opens the lesson signed in (the session cookie) in headless Chromium, reads the visible text of its
 * main element block by block, and writes it as a plain HTML file under public/. Returns the character count.
 */
export async function writeStaticLesson(baseUrl: string, lessonPath: string, cookie: string): Promise<number> {
  const browser = await chromium.launch({ executablePath: chromePath, args: ["--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage"] });
  try {
    const context = await browser.newContext();
    const [name, ...value] = cookie.split("=");
    await context.addCookies([{ name: name!, value: value.join("="), url: baseUrl }]);
    const page = await context.newPage();
    const response = await page.goto(`${baseUrl}${lessonPath}`, { waitUntil: "load" });
    if (!response?.ok() || new URL(page.url()).pathname !== lessonPath) {
      throw new Error(`the lesson ${lessonPath} did not open signed in (status ${response?.status()}, at ${page.url()})`);
    }
    // The lesson streams in behind the segment's loading state: wait until its heading is shown.
    await page.locator("main article h1").first().waitFor({ state: "visible", timeout: 30_000 });
    const title = await page.title();
    // Every visible line of the main element (innerText, so hidden text is left out), headings kept as headings.
    const blocks = await page.$$eval("main", (mains) => {
      const main = mains[0];
      if (!main) return [];
      const headings = new Map<string, string>();
      for (const heading of main.querySelectorAll<HTMLElement>("h1,h2,h3,h4")) {
        headings.set(heading.innerText.replace(/\s+/g, " ").trim(), heading.tagName.toLowerCase());
      }
      return main.innerText
        .split("\n")
        .map((line) => line.replace(/\s+/g, " ").trim())
        .filter((line) => line.length > 0)
        .map((text) => ({ tag: headings.get(text) ?? "p", text }));
    });
    if (blocks.length === 0) throw new Error(`no text found in ${lessonPath}`);
    fs.writeFileSync(staticLessonFile, staticLessonHtml(title, blocks));
    return blocks.reduce((sum, block) => sum + block.text.length, 0);
  } finally {
    await browser.close();
  }
}

export function removeStaticLesson(): void {
  fs.rmSync(staticLessonFile, { force: true });
}
