import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageActor } from "@/lib/auth/session";
import { getModule } from "@/lib/content/modules";
import { quizStandingFor } from "@/lib/data/learning";
import { stepAfterQuizPass } from "@/lib/learning/quiz-pass";
import { formatLongDate } from "@/lib/clearance/dates";
import { PageTitle } from "@/components/ui/page-title";
import { QuizForm } from "./_components/quiz-form";
import type { PassedQuizView } from "./_components/quiz-passed";

interface Props {
  params: Promise<{ slug: string }>;
}

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { slug } = await params;
  return { title: `Quiz: ${getModule(slug)?.meta.title ?? "module"}` };
}

const percent = (score: number | null): number | null => (score === null ? null : Math.round(score * 100));

/**
 * A module's quiz. An athlete who has passed it, with no attempt open, first sees the pass and the way
 * on; an attempt starts only when they ask to practise. Anyone else goes straight to their questions.
 */
export default async function QuizPage({ params }: Props) {
  const { slug } = await params;
  const actor = await requirePageActor("member", `/learn/${slug}/quiz`);
  const lesson = getModule(slug);
  if (!lesson) notFound();
  const standing = await quizStandingFor(actor, slug);
  const passedQuiz: PassedQuizView | null =
    standing.pass && !standing.hasOpenAttempt
      ? {
          passedOn: formatLongDate(standing.pass.passedOn),
          scorePercent: percent(standing.pass.score),
          bestPercent: percent(standing.bestScore),
          next: stepAfterQuizPass(slug, standing.status),
        }
      : null;
  return (
    <div className="space-y-4">
      <p className="text-sm text-slate-700">
        <Link href={`/learn/${slug}`} className="underline">
          Back to the lesson
        </Link>
      </p>
      {/* The page is refreshed once an attempt opens, so practice gets the working lead. */}
      <PageTitle lead={passedQuiz ? undefined : "Work each answer out with the numbers given. Your answers are kept if the page reloads."}>
        Quiz: {lesson.meta.title}
      </PageTitle>
      <QuizForm slug={slug} passedQuiz={passedQuiz} />
    </div>
  );
}
