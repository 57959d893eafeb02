"use client";

import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { Controller, useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { PublicQuestion } from "@/lib/quiz/types";
import { countAnswered, shownOrder } from "@/lib/quiz/answered";
import { readSavedAnswers, writeSavedAnswers, type SavedAnswers } from "@/lib/quiz/saved-answers";
import { Button } from "@/components/ui/button";
import { buttonClasses } from "@/components/ui/button-classes";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { LoadingState } from "@/components/ui/loading-state";
import { quizFormSchema, toSubmission, type QuizFormValues } from "./quiz-schema";
import { OrderQuestion } from "./order-question";
import { QuizPassed, type PassedQuizView } from "./quiz-passed";

interface Opening {
  attemptId: string;
  questions: PublicQuestion[];
  resumed: boolean;
}

interface QuizResult {
  score: number;
  passed: boolean;
  passMark: number;
  results: { id: string; correct: boolean; expected: string; explanation: string }[];
}

type Phase =
  | { kind: "passed"; passed: PassedQuizView }
  | { kind: "loading" }
  | { kind: "error"; message: string }
  | { kind: "answering"; opening: Opening; takeFocus?: boolean }
  | { kind: "graded"; opening: Opening; result: QuizResult; answers: Record<string, string | string[]> };

const storageKey = (attemptId: string) => `slipway:quiz:${attemptId}`;

interface InitialState {
  values: QuizFormValues;
  movedOrders: string[];
}

/** The form's first values: each question's default, then what this phone kept for the attempt. */
function initialState(opening: Opening): InitialState {
  const answers: Record<string, string | string[]> = {};
  for (const question of opening.questions) {
    if (question.kind === "order") answers[question.id] = shownOrder(question);
    else if (question.kind === "multiple") answers[question.id] = [];
    else answers[question.id] = "";
  }
  let saved: SavedAnswers | null = null;
  try {
    // A damaged copy reads as none: stored answers are a convenience.
    saved = readSavedAnswers(window.localStorage.getItem(storageKey(opening.attemptId)), opening.questions);
  } catch {
    // Storage may be refused (private browsing); the quiz still works.
  }
  return { values: { answers: { ...answers, ...saved?.answers } }, movedOrders: saved?.movedOrders ?? [] };
}

async function readError(response: Response): Promise<string> {
  try {
    const body = (await response.json()) as { message?: string };
    return body.message ?? `The server answered ${response.status}.`;
  } catch {
    return `The server answered ${response.status}.`;
  }
}

async function openAttempt(slug: string): Promise<Phase> {
  try {
    const response = await fetch(`/api/modules/${slug}/attempts`, { method: "POST" });
    if (!response.ok) return { kind: "error", message: await readError(response) };
    return { kind: "answering", opening: (await response.json()) as Opening };
  } catch {
    return { kind: "error", message: "Could not reach Slipway. Check your connection and try again." };
  }
}

/**
 * The practical quiz: starts or resumes an attempt, keeps answers through a reload, shows worked solutions.
 * With `passedQuiz` (passed, nothing open) it opens on that instead, and starts an attempt only on request.
 */
export function QuizForm({ slug, passedQuiz }: { slug: string; passedQuiz: PassedQuizView | null }) {
  const router = useRouter();
  const [phase, setPhase] = useState<Phase>(() => (passedQuiz ? { kind: "passed", passed: passedQuiz } : { kind: "loading" }));
  // Read once: a later refresh of the page's props must not open an attempt by itself.
  const [opensOnPass] = useState(passedQuiz !== null);

  // The router keeps this page's props for the back and forward buttons: after an attempt is opened or
  // graded, refresh them, so coming back resumes the open attempt or says the quiz is passed.
  const start = useCallback(async () => {
    setPhase({ kind: "loading" });
    const next = await openAttempt(slug);
    setPhase(next.kind === "answering" ? { ...next, takeFocus: true } : next);
    if (next.kind === "answering") router.refresh();
  }, [slug, router]);

  useEffect(() => {
    if (opensOnPass) return;
    let cancelled = false;
    void openAttempt(slug).then((next) => {
      if (!cancelled) setPhase(next);
    });
    return () => {
      cancelled = true;
    };
  }, [slug, opensOnPass]);

  if (phase.kind === "passed") return <QuizPassed passed={phase.passed} onPractise={() => void start()} />;
  if (phase.kind === "loading") return <LoadingState label="Getting your questions…" />;
  if (phase.kind === "error") {
    return (
      <div className="space-y-3">
        <Notice tone="error" title="The quiz could not start.">
          {phase.message}
        </Notice>
        <Button type="button" onClick={() => void start()}>
          Try again
        </Button>
      </div>
    );
  }
  if (phase.kind === "graded") {
    return <QuizResults opening={phase.opening} result={phase.result} answers={phase.answers} onRetake={() => void start()} slug={slug} />;
  }
  return (
    <AnsweringForm
      key={phase.opening.attemptId}
      opening={phase.opening}
      takeFocus={phase.takeFocus ?? false}
      onGraded={(result, answers) => {
        setPhase({ kind: "graded", opening: phase.opening, result, answers });
        router.refresh();
      }}
    />
  );
}

function AnsweringForm({
  opening,
  takeFocus,
  onGraded,
}: {
  opening: Opening;
  /** Opened by a button press: move focus to the form's first line, since the button is gone. */
  takeFocus: boolean;
  onGraded: (result: QuizResult, answers: Record<string, string | string[]>) => void;
}) {
  const schema = useMemo(() => quizFormSchema(opening.questions), [opening.questions]);
  const [initial] = useState(() => initialState(opening));
  const form = useForm<QuizFormValues>({ resolver: zodResolver(schema), defaultValues: initial.values });
  // Order questions the athlete has moved a step of: only these count as answered.
  const [movedOrders, setMovedOrders] = useState<ReadonlySet<string>>(() => new Set(initial.movedOrders));
  const [failure, setFailure] = useState<string | null>(null);
  const { errors, isSubmitting } = form.formState;
  const intro = useRef<HTMLParagraphElement>(null);
  useEffect(() => {
    if (takeFocus) intro.current?.focus();
  }, [takeFocus]);

  const watched = useWatch({ control: form.control, name: "answers" });
  useEffect(() => {
    try {
      window.localStorage.setItem(
        storageKey(opening.attemptId),
        writeSavedAnswers({ answers: watched ?? {}, movedOrders: [...movedOrders] }),
      );
    } catch {
      // Private browsing may refuse storage; the quiz still works.
    }
  }, [watched, movedOrders, opening.attemptId]);

  const onSubmit = form.handleSubmit(async (values) => {
    setFailure(null);
    const answers = toSubmission(opening.questions, values);
    try {
      const response = await fetch(`/api/attempts/${opening.attemptId}/submit`, {
        method: "POST",
        headers: { "Content-Type": "application/json" },
        body: JSON.stringify({ answers }),
      });
      if (response.ok || response.status === 409) {
        const body = (await response.json()) as QuizResult & { result?: QuizResult };
        window.localStorage.removeItem(storageKey(opening.attemptId));
        onGraded(response.status === 409 && body.result ? body.result : body, answers);
        return;
      }
      setFailure(await readError(response));
    } catch {
      setFailure("Could not reach Slipway. Your answers are kept on this phone; try again when you are back online.");
    }
  });

  const answered = countAnswered(opening.questions, watched, movedOrders);

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" data-testid="quiz-form" aria-describedby="quiz-progress">
      <p id="quiz-progress" ref={intro} tabIndex={takeFocus ? -1 : undefined} className="text-sm text-slate-700">
        {opening.resumed ? "Picking up where you left off. " : ""}
        {opening.questions.length} questions
      </p>
      <ol className="space-y-5">
        {opening.questions.map((question, index) => {
          const error = errors.answers?.[question.id]?.message;
          const errorId = `${question.id}-error`;
          return (
            <li key={question.id} className="rounded-lg bg-white p-4 shadow-sm" data-testid={`question-${question.id}`}>
              <fieldset aria-describedby={error ? errorId : undefined}>
                <legend className="mb-3 font-semibold">
                  <span className="text-slate-600">Question {index + 1}. </span>
                  {question.prompt}
                </legend>
                {question.kind === "numeric" && (
                  <div className="flex items-center gap-2">
                    <label htmlFor={`${question.id}-input`} className="sr-only">
                      Your answer{question.unit ? ` in ${question.unit}` : ""}
                    </label>
                    <input
                      id={`${question.id}-input`}
                      type="text"
                      inputMode="decimal"
                      autoComplete="off"
                      aria-invalid={error ? true : undefined}
                      aria-describedby={error ? errorId : undefined}
                      className="min-h-11 w-36 rounded-md border border-slate-500 px-3 text-base"
                      {...form.register(`answers.${question.id}`)}
                    />
                    {question.unit && <span aria-hidden="true">{question.unit}</span>}
                  </div>
                )}
                {(question.kind === "single" || question.kind === "multiple") && (
                  <div className="space-y-2">
                    {(question.choices ?? []).map((choice) => (
                      <label
                        key={choice.id}
                        className="flex min-h-11 cursor-pointer items-center gap-3 rounded-md border border-slate-300 px-3 py-2 has-[:checked]:border-river-700 has-[:checked]:bg-river-50"
                      >
                        <input
                          type={question.kind === "single" ? "radio" : "checkbox"}
                          value={choice.id}
                          className="h-5 w-5 shrink-0 accent-river-700"
                          {...form.register(`answers.${question.id}`)}
                        />
                        <span>{choice.label}</span>
                      </label>
                    ))}
                  </div>
                )}
                {question.kind === "order" && (
                  <p className="mb-2 text-sm text-slate-700">The steps start shuffled. Move them up or down into the right order.</p>
                )}
                {question.kind === "order" && (
                  <Controller
                    control={form.control}
                    name={`answers.${question.id}`}
                    render={({ field }) => (
                      <OrderQuestion
                        choices={question.choices ?? []}
                        value={Array.isArray(field.value) ? field.value : []}
                        onChange={(next) => {
                          field.onChange(next);
                          setMovedOrders((moved) => (moved.has(question.id) ? moved : new Set([...moved, question.id])));
                        }}
                      />
                    )}
                  />
                )}
                {error && (
                  <p id={errorId} className="mt-2 text-sm font-semibold text-alarm-800">
                    <span aria-hidden="true">⚠ </span>
                    {error}
                  </p>
                )}
              </fieldset>
            </li>
          );
        })}
      </ol>
      <LiveStatus testId="quiz-status">{failure && <Notice tone="error" title={failure} />}</LiveStatus>
      <div className="rounded-lg border border-slate-200 bg-white p-4">
        <p className="mb-2 text-sm text-slate-700">
          {answered} of {opening.questions.length} answered
        </p>
        <Button type="submit" pending={isSubmitting} pendingLabel="Marking…" className="w-full">
          Hand in my answers
        </Button>
      </div>
    </form>
  );
}

function QuizResults({
  opening,
  result,
  answers,
  onRetake,
  slug,
}: {
  opening: Opening;
  result: QuizResult;
  answers: Record<string, string | string[]>;
  onRetake: () => void;
  slug: string;
}) {
  const byId = new Map(result.results.map((entry) => [entry.id, entry]));
  const correctCount = result.results.filter((entry) => entry.correct).length;
  const labelOf = (question: PublicQuestion, value: string | string[] | undefined): string => {
    if (value === undefined || value === "" || (Array.isArray(value) && value.length === 0)) return "no answer";
    const ids = Array.isArray(value) ? value : [value];
    if (!question.choices) return `${ids.join(", ")}${question.unit ? ` ${question.unit}` : ""}`;
    return ids
      .map((id) => question.choices?.find((choice) => choice.id === id)?.label ?? id)
      .join(question.kind === "order" ? " → " : "; ");
  };
  return (
    <div className="space-y-5" data-testid="quiz-results">
      <div role="status" aria-live="polite">
        <Notice
          tone={result.passed ? "success" : "warning"}
          title={result.passed ? `Passed: ${Math.round(result.score * 100)}%` : `Not passed yet: ${Math.round(result.score * 100)}%`}
          testId="quiz-outcome"
        >
          {correctCount} of {result.results.length} right; the pass mark is {Math.round(result.passMark * 100)}%.{" "}
          {result.passed
            ? "Next, ask a coach to watch you do it on a real oar."
            : "Read the worked solutions below, then try a fresh set of questions."}
        </Notice>
      </div>
      <ol className="space-y-4">
        {opening.questions.map((question, index) => {
          const entry = byId.get(question.id);
          return (
            <li key={question.id} className="rounded-lg bg-white p-4 shadow-sm">
              <p className="font-semibold">
                <span className="text-slate-600">Question {index + 1}. </span>
                {question.prompt}
              </p>
              <p className={`mt-2 font-semibold ${entry?.correct ? "text-reed-800" : "text-alarm-800"}`}>
                <span aria-hidden="true">{entry?.correct ? "✓ " : "✕ "}</span>
                {entry?.correct ? "Right" : "Not right"}: you answered {labelOf(question, answers[question.id])}
              </p>
              {!entry?.correct && <p className="mt-1">Expected: {entry?.expected}</p>}
              <p className="mt-2 text-slate-800">{entry?.explanation}</p>
            </li>
          );
        })}
      </ol>
      <div className="flex flex-wrap gap-2">
        {!result.passed && (
          <Button type="button" onClick={onRetake}>
            Try a fresh set of questions
          </Button>
        )}
        {result.passed && (
          <Link href={`/learn/${slug}/practical`} className={buttonClasses("primary")}>
            Ask a coach for the practical
          </Link>
        )}
        <Link href="/learn" className={buttonClasses("secondary")}>
          Back to your course
        </Link>
        <Link href={`/learn/${slug}`} className={buttonClasses("secondary")}>
          Read the lesson again
        </Link>
      </div>
    </div>
  );
}
