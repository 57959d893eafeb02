import fs from "node:fs";
import path from "node:path";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { moduleFrontmatterSchema } from "@/lib/content/module-schema";
import { readClubSettings } from "@/lib/validations/club-settings";
import { checkModuleSet, getModule, LessonContentError, listModules, parseModuleFile, type LessonModule } from "@/lib/content/modules";
import { renderLesson } from "@/lib/content/render";
import { isComputedGenerator, quizRecipeSchema } from "@/lib/quiz/recipe";

const LESSON_DIR = path.join(process.cwd(), "content", "modules");
const EXPECTED_SLUGS = ["overall-length", "setting-inboard", "changing-boats", "secure-and-check", "grip-cleaning"];

const GOOD_FRONTMATTER = `---
slug: sample-lesson
title: A sample lesson
order: 1
summary: Used only by this test.
minutes: 3
prerequisites: []
quiz:
  draw: 6
  items:
    - { use: length-change, count: 3 }
    - { use: length-direction, count: 3 }
checklist:
  - { id: one, label: First thing }
  - { id: two, label: Second thing }
  - { id: three, label: Third thing }
---

## A heading

Some text.
`;

function expectLessonError(run: () => unknown, file: string, field: string) {
  let caught: unknown;
  try {
    run();
  } catch (error) {
    caught = error;
  }
  expect(caught).toBeInstanceOf(LessonContentError);
  const error = caught as LessonContentError;
  expect(error.message).toContain(file);
  expect(error.message).toContain(field);
  return error;
}

describe("the course's lessons", () => {
  const modules = listModules();

  it("loads all five lessons in course order 1 to 5", () => {
    expect(modules.map((meta) => meta.slug)).toEqual(EXPECTED_SLUGS);
    expect(modules.map((meta) => meta.order)).toEqual([1, 2, 3, 4, 5]);
  });

  it("has one lesson per .mdx file, each slug equal to its file name", () => {
    const files = fs.readdirSync(LESSON_DIR).filter((name) => name.endsWith(".mdx"));
    expect(files.map((name) => name.replace(/\.mdx$/, "")).sort()).toEqual([...EXPECTED_SLUGS].sort());
  });

  it("validates every lesson's frontmatter and quiz recipe", () => {
    for (const meta of modules) {
      expect(moduleFrontmatterSchema.safeParse(meta).success, meta.slug).toBe(true);
      expect(quizRecipeSchema.safeParse(meta.quiz).success, meta.slug).toBe(true);
      expect(meta.quiz.draw).toBeGreaterThanOrEqual(6);
      expect(meta.quiz.draw).toBeLessThanOrEqual(10);
      expect(meta.requiredForClearance).toBe(true);
    }
  });

  it("starts a new club with the modules whose frontmatter says requiredForClearance, in course order", () => {
    const fresh = readClubSettings({});
    expect(fresh.clearanceModules).toEqual(modules.filter((meta) => meta.requiredForClearance).map((meta) => meta.slug));
  });

  it("puts the cleaning chemicals' caution, not the collar's, on the grip-cleaning practical", () => {
    const caution = Object.fromEntries(modules.map((meta) => [meta.slug, meta.practicalCaution]));
    expect(caution).toEqual({
      "overall-length": "rigging",
      "setting-inboard": "rigging",
      "changing-boats": "rigging",
      "secure-and-check": "rigging",
      "grip-cleaning": "cleaning",
    });
  });

  it("gives every lesson a practical checklist of 3 to 5 observable items", () => {
    for (const meta of modules) {
      expect(meta.checklist.length, meta.slug).toBeGreaterThanOrEqual(3);
      expect(meta.checklist.length, meta.slug).toBeLessThanOrEqual(5);
    }
  });

  it("draws at least half its quiz items from computed generators, whatever the draw picks", () => {
    // The fewest computed items a module can draw: whatever `draw` cannot fill from its written banks.
    let guaranteedComputed = 0;
    let drawn = 0;
    for (const meta of modules) {
      const fixed = meta.quiz.items.filter((item) => !isComputedGenerator(item.use)).reduce((sum, item) => sum + item.count, 0);
      guaranteedComputed += Math.max(0, meta.quiz.draw - fixed);
      drawn += meta.quiz.draw;
    }
    expect(guaranteedComputed / drawn).toBeGreaterThanOrEqual(0.5);
  });

  it("keeps prerequisites to lessons that come earlier", () => {
    const orderOf = new Map(modules.map((meta) => [meta.slug, meta.order]));
    for (const meta of modules) {
      for (const prerequisite of meta.prerequisites) {
        expect(orderOf.get(prerequisite), `${meta.slug} needs ${prerequisite}`).toBeLessThan(meta.order);
      }
    }
  });

  it("returns a lesson body without its frontmatter, and null for unknown or unsafe slugs", () => {
    const lesson = getModule("setting-inboard");
    expect(lesson?.meta.title).toBe("Setting the inboard with the collar");
    expect(lesson?.source.trimStart().startsWith("---")).toBe(false);
    expect(lesson?.source).toContain("## What the inboard is");
    expect(getModule("no-such-lesson")).toBeNull();
    expect(getModule("../package")).toBeNull();
  });

  it("keeps every lesson phone-sized (400 to 900 words)", () => {
    for (const meta of modules) {
      const words = getModule(meta.slug)?.source.match(/[A-Za-z0-9]+/g)?.length ?? 0;
      expect(words, meta.slug).toBeGreaterThanOrEqual(400);
      expect(words, meta.slug).toBeLessThanOrEqual(900);
    }
  });

  it("compiles every lesson with the components map, with h2 headings and no h1", async () => {
    for (const meta of modules) {
      const lesson = getModule(meta.slug);
      expect(lesson).not.toBeNull();
      const html = renderToStaticMarkup(await renderLesson(lesson!.source));
      expect(html, meta.slug).toContain("<h2");
      expect(html, meta.slug).not.toContain("<h1");
      expect(html, meta.slug).toContain('role="note"');
    }
  });

  it("renders the widgets with their numeric props in the lessons that use them", async () => {
    const inboard = renderToStaticMarkup(await renderLesson(getModule("setting-inboard")!.source));
    expect(inboard).toContain("Clicks calculator");
    expect(inboard).toContain("Move the collar 2 clicks towards the blade.");
    const boats = renderToStaticMarkup(await renderLesson(getModule("changing-boats")!.source));
    expect(boats).toContain("measurement protocol: 2 × (inboard + half swivel width) − span, half swivel 2 cm");
    expect(boats).toContain("overlap 21 cm");
  });
});

describe("a bad lesson", () => {
  it("accepts the good fixture, so the failures below are caused by the change alone", () => {
    const lesson = parseModuleFile("sample-lesson.mdx", GOOD_FRONTMATTER);
    expect(lesson.meta.requiredForClearance).toBe(true);
    expect(lesson.source).toContain("## A heading");
  });

  it("names the file and the field when a quiz generator does not exist", () => {
    const raw = GOOD_FRONTMATTER.replace("use: length-change", "use: guess-the-length");
    const error = expectLessonError(() => parseModuleFile("sample-lesson.mdx", raw), "sample-lesson.mdx", "quiz.items.0.use");
    expect(error.field).toBe("quiz.items.0.use");
  });

  it("names a missing required field", () => {
    const raw = GOOD_FRONTMATTER.replace("title: A sample lesson\n", "");
    expectLessonError(() => parseModuleFile("sample-lesson.mdx", raw), "sample-lesson.mdx", "title");
  });

  it("rejects a checklist that is too short", () => {
    const raw = GOOD_FRONTMATTER.replace("  - { id: three, label: Third thing }\n", "");
    expectLessonError(() => parseModuleFile("sample-lesson.mdx", raw), "sample-lesson.mdx", "checklist");
  });

  it("rejects a pass mark below 0.5 and a misspelt key", () => {
    const lowPass = GOOD_FRONTMATTER.replace("minutes: 3", "minutes: 3\npassMark: 0.3");
    expectLessonError(() => parseModuleFile("sample-lesson.mdx", lowPass), "sample-lesson.mdx", "passMark");
    const typo = GOOD_FRONTMATTER.replace("minutes: 3", "minutes: 3\nrequiredForClearence: false");
    expectLessonError(() => parseModuleFile("sample-lesson.mdx", typo), "sample-lesson.mdx", "requiredForClearence");
  });

  it("rejects a slug that differs from the file name", () => {
    expectLessonError(() => parseModuleFile("other-name.mdx", GOOD_FRONTMATTER), "other-name.mdx", "slug");
  });

  it("rejects a level-1 heading in the body", () => {
    const raw = GOOD_FRONTMATTER.replace("## A heading", "# A heading");
    expectLessonError(() => parseModuleFile("sample-lesson.mdx", raw), "sample-lesson.mdx", "level-1 heading");
  });

  it("rejects broken YAML and a file with no frontmatter", () => {
    expectLessonError(
      () => parseModuleFile("sample-lesson.mdx", GOOD_FRONTMATTER.replace("order: 1", "order: [1")),
      "sample-lesson.mdx",
      "YAML",
    );
    expectLessonError(() => parseModuleFile("sample-lesson.mdx", "## Just a body\n"), "sample-lesson.mdx", "frontmatter");
  });

  describe("in a set of lessons", () => {
    const first = parseModuleFile("sample-lesson.mdx", GOOD_FRONTMATTER);
    const second: LessonModule = {
      meta: { ...first.meta, slug: "second-lesson", order: 2, prerequisites: ["sample-lesson"] },
      source: first.source,
    };

    it("accepts unique orders and earlier prerequisites, sorted by order", () => {
      expect(checkModuleSet([second, first]).map((lesson) => lesson.meta.slug)).toEqual(["sample-lesson", "second-lesson"]);
    });

    it("rejects two lessons with the same order", () => {
      const clash = { ...second, meta: { ...second.meta, order: 1 } };
      expectLessonError(() => checkModuleSet([first, clash]), "second-lesson.mdx", "order");
    });

    it("rejects a prerequisite that does not exist or comes later", () => {
      const missing = { ...second, meta: { ...second.meta, prerequisites: ["no-such-lesson"] } };
      expectLessonError(() => checkModuleSet([first, missing]), "second-lesson.mdx", "prerequisites");
      const later = { ...first, meta: { ...first.meta, prerequisites: ["second-lesson"] } };
      expectLessonError(() => checkModuleSet([later, second]), "sample-lesson.mdx", "prerequisites");
    });
  });
});
