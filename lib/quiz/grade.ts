import { formatWithUnit } from "@/lib/quiz/format";
import type { Question } from "@/lib/quiz/types";
import { roundTo } from "@/lib/rigging/round";

/** Slack on numeric comparisons so float noise never fails a right answer. */
const numericSlack = 1e-9;

/** Plain numbers typed by people: "3", "-0.5", "3,5" (decimal comma), "+2", "−1" (real minus sign). */
const numericTextPattern = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)$/;

/** A number from a number or numeric text; null for anything else (including "", "3 cm", "1e3"). */
export function parseNumericAnswer(value: unknown): number | null {
  if (typeof value === "number") return Number.isFinite(value) ? value : null;
  if (typeof value !== "string") return null;
  const text = value.trim().replace(/^\u2212/, "-");
  if (!numericTextPattern.test(text)) return null;
  const parsed = Number(text.replace(",", "."));
  return Number.isFinite(parsed) ? parsed : null;
}

function isStringArray(value: unknown): value is string[] {
  return Array.isArray(value) && value.every((item) => typeof item === "string");
}

/**
 * True when `value` answers the question. numeric: within tolerance (number or numeric text);
 * single: the choice id; multiple: exactly the set of correct ids; order: every id in the right order.
 */
export function gradeAnswer(question: Question, value: unknown): boolean {
  const { answer } = question;
  switch (question.kind) {
    case "numeric": {
      const given = parseNumericAnswer(value);
      if (given === null || typeof answer !== "number") return false;
      return Math.abs(given - answer) <= (question.tolerance ?? 0) + numericSlack;
    }
    case "single":
      return typeof answer === "string" && typeof value === "string" && value === answer;
    case "multiple": {
      if (!isStringArray(answer) || !isStringArray(value)) return false;
      const givenIds = new Set(value);
      return givenIds.size === value.length && givenIds.size === answer.length && answer.every((id) => givenIds.has(id));
    }
    case "order":
      return (
        isStringArray(answer) && isStringArray(value) && value.length === answer.length && answer.every((id, index) => value[index] === id)
      );
  }
}

function labelOf(question: Question, id: string): string {
  return question.choices?.find((choice) => choice.id === id)?.label ?? id;
}

/** The right answer in words: "4 clicks", "Move the collar towards the blade", "1. … 2. …". */
export function expectedAnswerText(question: Question): string {
  const { answer } = question;
  if (typeof answer === "number") return formatWithUnit(answer, question.unit);
  if (typeof answer === "string") return labelOf(question, answer);
  if (question.kind === "order") {
    return answer.map((id, index) => `${index + 1}. ${labelOf(question, id)}`).join(" ");
  }
  return answer.map((id) => labelOf(question, id)).join("; ");
}

export interface QuestionResult {
  id: string;
  correct: boolean;
  /** The right answer in words. */
  expected: string;
  explanation: string;
}

export interface QuizGrade {
  /** Share of questions answered correctly, 0–1, three decimals. */
  score: number;
  passed: boolean;
  results: QuestionResult[];
}

/**
 * Grades a whole quiz: a missing answer is wrong; score = correct ÷ questions (3 decimals); passed when
 * the unrounded score reaches `passMark`, a fraction from 0 to 1 (0.8 means 80 %). An empty quiz fails.
 */
export function gradeQuiz(questions: readonly Question[], answers: Readonly<Record<string, unknown>>, passMark: number): QuizGrade {
  if (!(Number.isFinite(passMark) && passMark >= 0 && passMark <= 1)) {
    throw new RangeError(`passMark must be a fraction from 0 to 1, got ${passMark}`);
  }
  const results = questions.map((question) => ({
    id: question.id,
    correct: Object.hasOwn(answers, question.id) && gradeAnswer(question, answers[question.id]),
    expected: expectedAnswerText(question),
    explanation: question.explanation,
  }));
  if (results.length === 0) return { score: 0, passed: false, results };
  const share = results.filter((result) => result.correct).length / results.length;
  return { score: roundTo(share, 3), passed: share + numericSlack >= passMark, results };
}
