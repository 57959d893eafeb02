"use client";

import Link from "next/link";
import type { StepAfterQuizPass } from "@/lib/learning/quiz-pass";
import { Button } from "@/components/ui/button";
import { buttonClasses } from "@/components/ui/button-classes";
import { Notice } from "@/components/ui/notice";

/** What the quiz page says to an athlete who has passed it and has no attempt open (formatted on the server). */
export interface PassedQuizView {
  /** The day of the first pass, in words. */
  passedOn: string;
  /** That attempt's score in whole percent, when it has one. */
  scorePercent: number | null;
  /** The best score of every attempt, in whole percent. */
  bestPercent: number | null;
  next: StepAfterQuizPass;
}

/** The passed quiz: when and with what, the way on, and practice only when asked for. */
export function QuizPassed({ passed, onPractise }: { passed: PassedQuizView; onPractise: () => void }) {
  const { passedOn, scorePercent, bestPercent, next } = passed;
  return (
    <div className="space-y-5" data-testid="quiz-passed">
      <Notice tone="success" title="You have passed this quiz" testId="quiz-passed-summary">
        Passed on {passedOn}
        {scorePercent !== null ? ` with ${scorePercent}%` : ""}.
        {bestPercent !== null && scorePercent !== null && bestPercent > scorePercent ? ` Your best score since is ${bestPercent}%.` : ""}
      </Notice>
      <div className="rounded-lg bg-white p-4 shadow-sm">
        <p className="mb-3">{next.why}</p>
        <Link href={next.href} className={`${buttonClasses("primary")} w-full sm:w-auto`}>
          {next.label}
        </Link>
      </div>
      <section aria-labelledby="practise-heading" className="rounded-lg bg-white p-4 shadow-sm">
        <h2 id="practise-heading" className="font-semibold">
          Practise again
        </h2>
        <p className="mt-1 mb-3">A fresh set of questions is marked like any other. Your pass stays, whatever you score.</p>
        <Button type="button" variant="secondary" onClick={onPractise} className="w-full sm:w-auto">
          Practise with a fresh set of questions
        </Button>
      </section>
    </div>
  );
}
