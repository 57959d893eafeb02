import type { Dataset, PoolAttempt } from "../dataset";
import type { LighthouseSession, PageFigures } from "../lighthouse";
import type { LoadResult } from "../load";

/** The trivial route and quiz submissions, measured in alternating rounds (see `submitRounds` in api.ts). */
export interface SubmitRounds {
  trivial: LoadResult[];
  submit: LoadResult[];
  /** Each round's submit req/s over that round's trivial req/s. */
  ratios: number[];
  /** The median round's figures (by req/s), with the worst p99 of all rounds. */
  trivialSummary: LoadResult;
  submitSummary: LoadResult;
}

/** Everything a measure function may use; results measured once and shared (baselines) are memoised here. */
export interface BenchContext {
  baseUrl: string;
  /** bench-out/: the table, raw figures and the last Lighthouse report of each page. */
  outDir: string;
  dataset: Dataset;
  /** Session cookies: a demo athlete, a demo coach, and each bench athlete by e-mail. */
  athleteCookie: string;
  coachCookie: string;
  benchCookies: Map<string, string>;
  lessonPath: string;
  staticLessonPath: string;
  minimalPath: string;
  lighthouseRuns: number;
  loadSeconds: number;
  /** Rounds of (trivial route, quiz submit) taken in turn, and the seconds of each run in a round. */
  apiRounds: number;
  roundSeconds: number;
  connections: number;
  lighthouse(): Promise<LighthouseSession>;
  log(message: string): void;
  memo: {
    pages?: Promise<{ lesson: PageFigures; staticLesson: PageFigures; minimal: PageFigures }>;
    submitRounds?: Promise<SubmitRounds>;
    roster?: Promise<LoadResult>;
    pdf?: Promise<{ certificate: { times: number[]; bytes: number }; register: { times: number[]; bytes: number } }>;
  };
  /** Raw figures for bench-out/last.json. */
  raw: Record<string, unknown>;
}

/** Hands out each open attempt once; throws when the pool is used up (the load caps stop before that). */
export function attemptQueue(pool: readonly PoolAttempt[], cookies: Map<string, string>) {
  let next = 0;
  return {
    size: pool.length,
    take(): { path: string; cookie: string; body: string } {
      const attempt = pool[next];
      if (!attempt) throw new Error("the pool of open attempts is used up");
      next += 1;
      const cookie = cookies.get(attempt.email);
      if (!cookie) throw new Error(`no session for ${attempt.email}`);
      return { path: `/api/attempts/${attempt.attemptId}/submit`, cookie, body: attempt.body };
    },
    get used() {
      return next;
    },
  };
}
