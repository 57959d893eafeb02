import type { Metadata } from "next";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { buttonClasses } from "@/components/ui/button";
import { StageBadge } from "@/components/learn/stage-badge";
import { requirePageActor } from "@/lib/auth/session";
import { courseProgressFor } from "@/lib/data/learning";
import { nextModuleSlug } from "@/lib/learning/progress";

export const metadata: Metadata = { title: "Learn" };

function percent(score: number | null): string {
  return score === null ? "–" : `${Math.round(score * 100)}%`;
}

export default async function LearnPage() {
  const actor = await requirePageActor("member", "/learn");
  const course = await courseProgressFor(actor);
  const passedCount = course.filter((entry) => entry.progress.passed).length;
  const nextSlug = nextModuleSlug(course.map((entry) => entry.progress));
  const next = course.find((entry) => entry.meta.slug === nextSlug);
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
          {passedCount} of {course.length} quizzes passed
        </p>
        <progress className="mt-2 h-3 w-full accent-river-600" max={course.length} value={passedCount} aria-label="Quizzes passed">
          {passedCount} of {course.length}
        </progress>
        {next ? (
          <p className="mt-3">
            Next up: <strong>{next.meta.title}</strong>.{" "}
            <Link href={`/learn/${next.meta.slug}`} className="font-semibold text-river-700 underline">
              {next.progress.lessonRead ? "Take the quiz" : "Read the lesson"}
            </Link>
          </p>
        ) : (
          <p className="mt-3 font-semibold">Every quiz is passed. Ask a coach to observe your practical.</p>
        )}
      </section>

      <ol className="space-y-3" data-testid="module-list">
        {course.map(({ meta, progress }) => (
          <li key={meta.slug} className="rounded-lg bg-white p-4 shadow-sm" data-testid={`module-${meta.slug}`}>
            <div className="flex flex-wrap items-start justify-between gap-2">
              <h2 className="text-lg font-semibold">
                <span className="text-slate-600">{meta.order}.</span> {meta.title}
              </h2>
              <StageBadge stage={progress.stage} />
            </div>
            <p className="mt-1 text-slate-700">{meta.summary}</p>
            <p className="mt-1 text-sm text-slate-700">
              About {meta.minutes} min · best score {percent(progress.bestScore)} · {progress.attempts}{" "}
              {progress.attempts === 1 ? "attempt" : "attempts"}
            </p>
            <div className="mt-3 flex flex-wrap gap-2">
              <Link href={`/learn/${meta.slug}`} className={buttonClasses(progress.lessonRead ? "secondary" : "primary")}>
                {progress.lessonRead ? "Read again" : "Read the lesson"}
              </Link>
              <Link href={`/learn/${meta.slug}/quiz`} className={buttonClasses(progress.lessonRead && !progress.passed ? "primary" : "secondary")}>
                {progress.hasOpenAttempt ? "Continue the quiz" : progress.passed ? "Practise the quiz" : "Take the quiz"}
              </Link>
            </div>
          </li>
        ))}
      </ol>
    </div>
  );
}
