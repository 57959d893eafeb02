import type { PublicQuestion } from "@/lib/quiz/types";

/** An answer as the quiz form holds it: text for numeric and single, id lists for multiple and order. */
export type AnswerValue = string | string[];

/** The order an order question's steps are shown in before the athlete moves one: the shuffled order. */
export function shownOrder(question: PublicQuestion): string[] {
  return (question.choices ?? []).map((choice) => choice.id);
}

/**
 * Whether a question counts as answered: a number typed, a choice made, at least one box ticked; an
 * order question only once the athlete has moved a step, since its shown order is a default, not a choice.
 */
export function isAnswered(question: PublicQuestion, value: AnswerValue | undefined, movedOrders: ReadonlySet<string>): boolean {
  if (question.kind === "order") return movedOrders.has(question.id);
  if (Array.isArray(value)) return value.length > 0;
  return typeof value === "string" && value.trim() !== "";
}

/** How many of the attempt's questions count as answered (see isAnswered); stray saved ids do not count. */
export function countAnswered(
  questions: readonly PublicQuestion[],
  answers: Readonly<Record<string, AnswerValue | undefined>> | undefined,
  movedOrders: ReadonlySet<string>,
): number {
  return questions.filter((question) => isAnswered(question, answers?.[question.id], movedOrders)).length;
}

/** What a screen reader hears after a step of an order question moves: `index` is its new 0-based place. */
export function orderMoveAnnouncement(label: string, index: number, count: number): string {
  return `"${label}" is now step ${index + 1} of ${count}.`;
}
