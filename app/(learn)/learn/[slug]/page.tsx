import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getModule, listModules } from "@/lib/content/modules";
import { renderLesson } from "@/lib/content/render";
import { PageTitle } from "@/components/ui/page-title";
import { buttonClasses } from "@/components/ui/button-classes";
import { finishLessonAction } from "./actions";
import { FinishLessonForm } from "./_components/finish-lesson-form";

interface Props {
  params: Promise<{ slug: string }>;
}

export function generateStaticParams() {
  return listModules().map((meta) => ({ slug: meta.slug }));
}

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { slug } = await params;
  return { title: getModule(slug)?.meta.title ?? "Lesson" };
}

/** A lesson: server-rendered MDX, readable without JavaScript; the widgets enhance it when it loads. */
export default async function LessonPage({ params }: Props) {
  const { slug } = await params;
  const lesson = getModule(slug);
  if (!lesson) notFound();
  const modules = listModules();
  const prerequisites = modules.filter((meta) => lesson.meta.prerequisites.includes(meta.slug));
  const content = await renderLesson(lesson.source);
  return (
    <article className="space-y-4">
      <p className="text-sm text-slate-700">
        <Link href="/learn" className="underline">
          Your course
        </Link>{" "}
        · Module {lesson.meta.order} of {modules.length} · about {lesson.meta.minutes} min
      </p>
      <PageTitle lead={lesson.meta.summary}>{lesson.meta.title}</PageTitle>
      {prerequisites.length > 0 && (
        <p className="text-sm text-slate-700">Best read after: {prerequisites.map((meta) => meta.title).join(", ")}.</p>
      )}
      <div className="lesson-body space-y-4">{content}</div>
      <FinishLessonForm action={finishLessonAction}>
        <input type="hidden" name="slug" value={lesson.meta.slug} />
        <p className="mb-3">Finished reading? The quiz has {lesson.meta.quiz.draw} questions; some ask you to work out real settings.</p>
        <button type="submit" className={`${buttonClasses("primary")} w-full sm:w-auto`}>
          I&apos;ve read it: start the quiz
        </button>
      </FinishLessonForm>
    </article>
  );
}
