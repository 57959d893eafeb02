import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getModule } from "@/lib/content/modules";
import { PageTitle } from "@/components/ui/page-title";
import { QuizForm } from "./_components/quiz-form";

interface Props {
  params: Promise<{ slug: string }>;
}

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { slug } = await params;
  return { title: `Quiz: ${getModule(slug)?.meta.title ?? "module"}` };
}

export default async function QuizPage({ params }: Props) {
  const { slug } = await params;
  const lesson = getModule(slug);
  if (!lesson) notFound();
  return (
    <div className="space-y-4">
      <p className="text-sm text-slate-700">
        <Link href={`/learn/${slug}`} className="underline">
          Back to the lesson
        </Link>
      </p>
      <PageTitle lead="Work each answer out with the numbers given. Your answers are kept if the page reloads.">
        Quiz: {lesson.meta.title}
      </PageTitle>
      <QuizForm slug={slug} />
    </div>
  );
}
