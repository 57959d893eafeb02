import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const root = path.resolve(__dirname, "../..");
const appDir = path.join(root, "app");

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? [full, ...walk(full)] : [];
  });
}

const folders = [appDir, ...walk(appDir)];
const has = (dir: string, file: string) => readdirSync(dir).includes(file);
const relative = (dir: string) => path.relative(root, dir);

/**
 * A page under a loading.tsx streams: its status (200) is sent with the loading state, before the page
 * can call notFound(). A record page ([id], [slug]...) there would answer an unknown id with 200.
 */
describe("loading boundaries", () => {
  const loadingFolders = folders.filter((dir) => has(dir, "loading.tsx"));

  it("the app has loading states at all", () => {
    expect(loadingFolders.length).toBeGreaterThan(5);
  });

  it.each(loadingFolders.map(relative))("%s/loading.tsx has no dynamic segment below it", (dir) => {
    const top = path.join(root, dir);
    const below = walk(top)
      .filter((sub) => /\[[^\]]+\]/.test(path.relative(top, sub)) && has(sub, "page.tsx"))
      .map(relative);
    expect(below).toEqual([]);
  });
});
