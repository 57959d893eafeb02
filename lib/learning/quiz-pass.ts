import type { ModuleStatus } from "@/lib/clearance/rules";
import type { AttemptSummary } from "@/lib/learning/progress";

/** The submission that passed a module's quiz. */
export interface QuizPass {
  submittedAt: Date;
  /** 0–1; null only for a stored attempt without a score. */
  score: number | null;
}

/**
 * The athlete's first passing submission of a module's quiz: the quiz counts as passed from then on,
 * whatever later practice attempts score. Null while it is not passed.
 */
export function firstQuizPass(slug: string, attempts: readonly AttemptSummary[]): QuizPass | null {
  let first: QuizPass | null = null;
  for (const attempt of attempts) {
    if (attempt.moduleSlug !== slug || attempt.passed !== true || attempt.submittedAt === null) continue;
    if (first === null || attempt.submittedAt < first.submittedAt) first = { submittedAt: attempt.submittedAt, score: attempt.score };
  }
  return first;
}

/** Where to send an athlete who has passed a module's quiz, and why. */
export interface StepAfterQuizPass {
  href: string;
  label: string;
  why: string;
}

/**
 * The next step after a module's quiz is passed, from the module's status: a current practical pass
 * has its certificate; otherwise the practical page, where the athlete asks for (or renews, or follows)
 * the coach's sign-off.
 */
export function stepAfterQuizPass(slug: string, status: ModuleStatus): StepAfterQuizPass {
  const practical = `/learn/${slug}/practical`;
  switch (status) {
    case "passed":
      return { href: "/learn/certificates", label: "See your certificates", why: "A coach has signed off your practical too." };
    case "waiting-for-sign-off":
      return { href: practical, label: "See your sign-off request", why: "You have asked a coach to watch your practical." };
    case "not-yet":
      return {
        href: practical,
        label: "Read the coach's note",
        why: "A coach would like you to practise before signing off the practical.",
      };
    case "expired":
      return { href: practical, label: "Renew the practical", why: "Your practical pass has run out; a coach can sign you off again." };
    default:
      return { href: practical, label: "Ask a coach for the practical", why: "Next, show a coach you can do it on a real oar." };
  }
}
