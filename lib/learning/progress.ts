/** How far an athlete is with one module. */
export type ModuleStage = "not-started" | "lesson-read" | "quiz-failed" | "quiz-passed";

export interface AttemptSummary {
  moduleSlug: string;
  score: number | null;
  passed: boolean | null;
  submittedAt: Date | null;
}

export interface ModuleProgress {
  slug: string;
  stage: ModuleStage;
  lessonRead: boolean;
  /** Best submitted score 0–1, or null before the first submission. */
  bestScore: number | null;
  passed: boolean;
  /** Submitted attempts only. */
  attempts: number;
  /** An attempt started and not yet submitted. */
  hasOpenAttempt: boolean;
}

/** A module's stage from the lesson read state and the athlete's attempts at its quiz. */
export function moduleProgress(slug: string, lessonRead: boolean, attempts: readonly AttemptSummary[]): ModuleProgress {
  const mine = attempts.filter((attempt) => attempt.moduleSlug === slug);
  const submitted = mine.filter((attempt) => attempt.submittedAt !== null);
  const scores = submitted.map((attempt) => attempt.score ?? 0);
  const passed = submitted.some((attempt) => attempt.passed === true);
  const bestScore = scores.length > 0 ? Math.max(...scores) : null;
  let stage: ModuleStage = "not-started";
  if (passed) stage = "quiz-passed";
  else if (submitted.length > 0) stage = "quiz-failed";
  else if (lessonRead) stage = "lesson-read";
  return {
    slug,
    stage,
    lessonRead,
    bestScore,
    passed,
    attempts: submitted.length,
    hasOpenAttempt: mine.some((attempt) => attempt.submittedAt === null),
  };
}

/** The first module in course order that is not yet passed, or null when all are. */
export function nextModuleSlug(progress: readonly ModuleProgress[]): string | null {
  return progress.find((entry) => !entry.passed)?.slug ?? null;
}
