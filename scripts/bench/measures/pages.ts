import { join } from "node:path";
import { medianFigures, type LighthouseRun, type PageFigures } from "../lighthouse";
import { fixed, signed, type Row } from "../stats";
import type { BenchContext } from "./context";

const kb = 1024;

interface PageUnderTest {
  key: "lesson" | "staticLesson" | "minimal";
  path: string;
  runs: LighthouseRun[];
}

/**
 * Lighthouse on the three pages, all signed in as the same demo athlete, once per bench run. The pages
 * take turns (lesson, static, minimal, lesson, …) so that other work on a shared machine weighs on each
 * of them alike; each figure is the median of its page's runs.
 */
function pages(context: BenchContext) {
  context.memo.pages ??= (async () => {
    const session = await context.lighthouse();
    const underTest: PageUnderTest[] = [
      { key: "lesson", path: context.lessonPath, runs: [] },
      { key: "staticLesson", path: context.staticLessonPath, runs: [] },
      { key: "minimal", path: context.minimalPath, runs: [] },
    ];
    for (let round = 1; round <= context.lighthouseRuns; round += 1) {
      context.log(`Lighthouse mobile, round ${round} of ${context.lighthouseRuns}: ${underTest.map((page) => page.path).join(", ")}`);
      for (const page of underTest) {
        const report = round === context.lighthouseRuns ? join(context.outDir, `lighthouse-${page.key}.json`) : undefined;
        const run = await session.run(`${context.baseUrl}${page.path}`, context.athleteCookie, report);
        const landed = new URL(run.finalUrl).pathname;
        if (landed !== page.path) throw new Error(`Lighthouse on ${page.path} ended at ${landed}: the session cookie was not accepted`);
        page.runs.push(run);
      }
    }
    const [lesson, staticLesson, minimal] = underTest.map((page) => medianFigures(page.runs)) as [PageFigures, PageFigures, PageFigures];
    context.raw.pages = Object.fromEntries(underTest.map((page) => [page.key, page.runs]));
    return { lesson, staticLesson, minimal };
  })();
  return context.memo.pages;
}

function describe(figures: PageFigures): string {
  return `LCP ${fixed(figures.lcpMs, 0)} ms, TBT ${fixed(figures.tbtMs, 0)} ms, CLS ${fixed(figures.cls, 3)}, JS ${fixed(figures.scriptBytes / kb, 1)} KB`;
}

/** Reference rows: what the static page and the minimal page measured. */
export async function referencePages(context: BenchContext): Promise<Row[]> {
  const { staticLesson, minimal } = await pages(context);
  return [
    {
      figure: `Static page, same text (${context.staticLessonPath})`,
      value: describe(staticLesson),
      baseline: "—",
      ratio: "—",
      target: "reference",
      result: "report",
    },
    {
      figure: `Minimal app page (${context.minimalPath})`,
      value: describe(minimal),
      baseline: "—",
      ratio: "—",
      target: "reference",
      result: "report",
    },
  ];
}

/** Lesson LCP against the static page with the same text: ≤ 1.15×. */
export async function lessonLcp(context: BenchContext): Promise<Row> {
  const { lesson, staticLesson } = await pages(context);
  const ratio = lesson.lcpMs / staticLesson.lcpMs;
  return {
    figure: `Lesson LCP (${context.lessonPath}, mobile)`,
    value: `${fixed(lesson.lcpMs, 0)} ms`,
    baseline: `${fixed(staticLesson.lcpMs, 0)} ms (static page)`,
    ratio: `${fixed(ratio, 2)}×`,
    target: "≤ 1.15 × static",
    result: ratio <= 1.15 ? "pass" : "fail",
  };
}

/** Script bytes the lesson adds over the minimal page: ≤ 25 KB gz. */
export async function lessonScript(context: BenchContext): Promise<Row> {
  const { lesson, minimal } = await pages(context);
  const addedKb = (lesson.scriptBytes - minimal.scriptBytes) / kb;
  return {
    figure: "Lesson JS (transfer, gz)",
    value: `${fixed(lesson.scriptBytes / kb, 1)} KB (${signed(addedKb, 1)} KB)`,
    baseline: `${fixed(minimal.scriptBytes / kb, 1)} KB (minimal page)`,
    ratio: `${fixed(lesson.scriptBytes / minimal.scriptBytes, 2)}×`,
    target: "≤ +25 KB over minimal",
    result: addedKb <= 25 ? "pass" : "fail",
  };
}

/** Total blocking time the lesson adds over the minimal page: ≤ 50 ms. */
export async function lessonTbt(context: BenchContext): Promise<Row> {
  const { lesson, minimal } = await pages(context);
  const added = lesson.tbtMs - minimal.tbtMs;
  return {
    figure: "Lesson TBT (mobile)",
    value: `${fixed(lesson.tbtMs, 0)} ms (${signed(added, 0)} ms)`,
    baseline: `${fixed(minimal.tbtMs, 0)} ms (minimal page)`,
    ratio: minimal.tbtMs > 0 ? `${fixed(lesson.tbtMs / minimal.tbtMs, 2)}×` : "—",
    target: "≤ +50 ms over minimal",
    result: added <= 50 ? "pass" : "fail",
  };
}

/** The lesson's cumulative layout shift: ≤ 0.05. */
export async function lessonCls(context: BenchContext): Promise<Row> {
  const { lesson, minimal } = await pages(context);
  return {
    figure: "Lesson CLS (mobile)",
    value: fixed(lesson.cls, 3),
    baseline: `${fixed(minimal.cls, 3)} (minimal page)`,
    ratio: "—",
    target: "≤ 0.05",
    result: lesson.cls <= 0.05 ? "pass" : "fail",
  };
}
