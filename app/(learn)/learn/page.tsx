import type { Metadata } from "next";
import Link from "next/link";
import { PendingMark } from "@/components/ui/pending-mark";
import { PageTitle } from "@/components/ui/page-title";
import { buttonClasses } from "@/components/ui/button-classes";
import { ClearanceSummary } from "@/components/certify/clearance-summary";
import { ModuleStatusBadge } from "@/components/certify/status-badge";
import { requirePageActor } from "@/lib/auth/session";
import { courseProgressFor } from "@/lib/data/learning";
import { clearanceOf } from "@/lib/data/clearance";
import type { ModuleStatus } from "@/lib/clearance/rules";

export const metadata: Metadata = { title: "Learn" };

function percent(score: number | null): string {
  return score === null ? "–" : `${Math.round(score * 100)}%`;
}

const practicalStatuses = new Set<ModuleStatus>(["ready-for-sign-off", "waiting-for-sign-off", "not-yet", "passed", "expired"]);

/** The athlete's course: every module's quiz and practical state, what is next, and the clearance. */
export default async function LearnPage() {
  const actor = await requirePageActor("member", "/learn");
  const [course, { standing }] = await Promise.all([courseProgressFor(actor), clearanceOf(actor)]);
  const statusOf = new Map(standing.modules.map((entry) => [entry.slug, entry.status]));
  const passedCount = course.filter((entry) => statusOf.get(entry.meta.slug) === "passed").length;
  const quizzesPassed = course.filter((entry) => entry.progress.passed).length;
  const next = course.find((entry) => statusOf.get(entry.meta.slug) !== "passed");
  const nextStatus = next ? statusOf.get(next.meta.slug) : undefined;
  return (
    <div className="space-y-6" data-testid="learn-page">
      <PageTitle lead="Read each lesson, pass its quiz, then show a coach you can do it for real.">
        Hello, {actor.name.split(" ")[0]}
      </PageTitle>

      <section aria-labelledby="overall-heading" className="rounded-lg bg-white p-4 shadow-sm">
        <h2 id="overall-heading" className="font-semibold">
          Your course
        </h2>
        <p className="mt-1" data-testid="course-summary">
          {passedCount} of {course.length} modules passed · {quizzesPassed} of {course.length} quizzes passed
        </p>
        <progress className="mt-2 h-3 w-full accent-river-600" max={course.length} value={passedCount} aria-label="Modules passed">
          {passedCount} of {course.length}
        </progress>
        {next ? (
          <p className="mt-3">
            Next up: <strong>{next.meta.title}</strong>.{" "}
            <Link
              href={nextStatus && practicalStatuses.has(nextStatus) ? `/learn/${next.meta.slug}/practical` : `/learn/${next.meta.slug}`}
              className="font-semibold text-river-700 underline"
            >
              {nextStatus && practicalStatuses.has(nextStatus)
                ? "Practical sign-off"
                : next.progress.lessonRead
                  ? "Take the quiz"
                  : "Read the lesson"}
              <PendingMark />
            </Link>
          </p>
        ) : (
          <p className="mt-3 font-semibold">Every module is passed.</p>
        )}
      </section>

      <ClearanceSummary actor={actor} />

      <ol className="space-y-3" data-testid="module-list">
        {course.map(({ meta, progress }) => {
          const status = statusOf.get(meta.slug) ?? "not-started";
          return (
            <li key={meta.slug} className="rounded-lg bg-white p-4 shadow-sm" data-testid={`module-${meta.slug}`}>
              <div className="flex flex-wrap items-start justify-between gap-2">
                <h2 className="text-lg font-semibold">
                  <span className="text-slate-600">{meta.order}.</span> {meta.title}
                </h2>
                <ModuleStatusBadge status={status} />
              </div>
              <p className="mt-1 text-slate-700">{meta.summary}</p>
              <p className="mt-1 text-sm text-slate-700">
                About {meta.minutes} min · best score {percent(progress.bestScore)} · {progress.attempts}{" "}
                {progress.attempts === 1 ? "attempt" : "attempts"}
              </p>
              <div className="mt-3 flex flex-wrap gap-2">
                <Link href={`/learn/${meta.slug}`} className={buttonClasses(progress.lessonRead ? "secondary" : "primary")}>
                  {progress.lessonRead ? "Read again" : "Read the lesson"}
                  <PendingMark />
                </Link>
                <Link
                  href={`/learn/${meta.slug}/quiz`}
                  className={buttonClasses(progress.lessonRead && !progress.passed ? "primary" : "secondary")}
                >
                  {progress.hasOpenAttempt ? "Continue the quiz" : progress.passed ? "Practise the quiz" : "Take the quiz"}
                  <PendingMark />
                </Link>
                {practicalStatuses.has(status) && (
                  <Link
                    href={`/learn/${meta.slug}/practical`}
                    className={buttonClasses(status === "ready-for-sign-off" || status === "not-yet" ? "primary" : "secondary")}
                  >
                    Practical sign-off
                    <PendingMark />
                  </Link>
                )}
              </div>
            </li>
          );
        })}
      </ol>
    </div>
  );
}
