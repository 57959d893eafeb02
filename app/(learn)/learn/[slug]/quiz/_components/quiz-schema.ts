import { z } from "zod";
import { parseNumericAnswer } from "@/lib/quiz/grade";
import type { PublicQuestion } from "@/lib/quiz/types";

/** Answers as the form holds them: text for numeric and single, id lists for multiple and order. */
export type QuizFormValues = { answers: Record<string, string | string[]> };

const answerValue = z.union([z.string(), z.array(z.string())]);

function problemWith(question: PublicQuestion, value: string | string[] | undefined): string | null {
  if (question.kind === "numeric") {
    if (typeof value !== "string" || value.trim() === "") return "Enter a number.";
    // The same reading the server grades with, so nothing it would mark ("+2", ".5", "3,5") is refused here.
    return parseNumericAnswer(value) !== null ? null : "Enter a number, for example 3 or 2.5.";
  }
  if (question.kind === "single") return typeof value === "string" && value !== "" ? null : "Choose one answer.";
  if (question.kind === "multiple") return Array.isArray(value) && value.length > 0 ? null : "Tick at least one answer.";
  return Array.isArray(value) && value.length === (question.choices?.length ?? 0) ? null : "Put every step in order.";
}

/** The client-side check that every question has an answer of the right shape; the server grades. */
export function quizFormSchema(questions: readonly PublicQuestion[]): z.ZodType<QuizFormValues, QuizFormValues> {
  return z.object({ answers: z.record(z.string(), answerValue) }).superRefine((values, context) => {
    for (const question of questions) {
      const problem = problemWith(question, values.answers[question.id]);
      if (problem) context.addIssue({ code: "custom", path: ["answers", question.id], message: problem });
    }
  });
}

/** The submission body: numeric text is sent as typed; the server parses "2,5" and "2.5" alike. */
export function toSubmission(questions: readonly PublicQuestion[], values: QuizFormValues): Record<string, string | string[]> {
  const answers: Record<string, string | string[]> = {};
  for (const question of questions) {
    const value = values.answers[question.id];
    if (value !== undefined) answers[question.id] = typeof value === "string" ? value.trim().replace("−", "-") : value;
  }
  return answers;
}
