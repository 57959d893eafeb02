import { z } from "zod";
import { shownOrder, type AnswerValue } from "@/lib/quiz/answered";
import type { PublicQuestion } from "@/lib/quiz/types";

/** What the quiz page keeps in the browser for one attempt, so a reload loses nothing. */
export interface SavedAnswers {
  answers: Record<string, AnswerValue>;
  /** Ids of the order questions whose steps the athlete has moved. */
  movedOrders: string[];
}

const savedAnswersSchema = z.object({
  answers: z.record(z.string(), z.union([z.string(), z.array(z.string())])),
  // Absent from copies saved before the page kept it.
  movedOrders: z.array(z.string()).optional(),
});

function sameOrder(left: readonly string[], right: readonly string[]): boolean {
  return left.length === right.length && left.every((id, index) => id === right[index]);
}

/**
 * Reads a stored copy for this attempt's questions, or null when there is none or it is damaged. Only
 * the attempt's own question ids are kept. A copy saved before `movedOrders` existed counts an order
 * question as moved when its saved order differs from the order shown (a moved-and-moved-back order then
 * reads as unmoved: the most that copy can tell).
 */
export function readSavedAnswers(text: string | null, questions: readonly PublicQuestion[]): SavedAnswers | null {
  if (text === null) return null;
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    return null;
  }
  const parsed = savedAnswersSchema.safeParse(json);
  if (!parsed.success) return null;
  const answers: Record<string, AnswerValue> = {};
  const movedOrders: string[] = [];
  for (const question of questions) {
    const value = parsed.data.answers[question.id];
    if (value !== undefined) answers[question.id] = value;
    if (question.kind !== "order") continue;
    const moved = parsed.data.movedOrders
      ? parsed.data.movedOrders.includes(question.id)
      : Array.isArray(value) && !sameOrder(value, shownOrder(question));
    if (moved) movedOrders.push(question.id);
  }
  return { answers, movedOrders };
}

/** The stored form of a copy (the answers as before, plus the moved order questions). */
export function writeSavedAnswers(saved: SavedAnswers): string {
  return JSON.stringify({ answers: saved.answers, movedOrders: saved.movedOrders });
}
