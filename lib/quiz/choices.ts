import { shuffle } from "@/lib/quiz/random";
import type { Choice, Rng } from "@/lib/quiz/types";

const choiceIds = ["a", "b", "c", "d", "e", "f", "g", "h", "i", "j"] as const;

function assertUnique(labels: readonly string[]): void {
  if (new Set(labels).size !== labels.length) throw new RangeError(`choice labels repeat: ${labels.join(" | ")}`);
  if (labels.length > choiceIds.length) throw new RangeError(`at most ${choiceIds.length} choices`);
}

/**
 * Shuffles labels and names them a, b, c… in the order shown, so an id says nothing about the answer.
 * Returns the choices and a lookup from label to id.
 */
export function shuffledChoices(rng: Rng, labels: readonly string[]): { choices: Choice[]; idOf: (label: string) => string } {
  assertUnique(labels);
  const choices = shuffle(rng, labels).map((label, index) => ({ id: choiceIds[index] as string, label }));
  const idOf = (label: string): string => {
    const choice = choices.find((c) => c.label === label);
    if (choice === undefined) throw new RangeError(`no choice labelled "${label}"`);
    return choice.id;
  };
  return { choices, idOf };
}

/** A single-choice set: one correct label among wrong ones, shuffled. */
export function singleChoice(rng: Rng, correct: string, wrong: readonly string[]): { choices: Choice[]; answer: string } {
  const { choices, idOf } = shuffledChoices(rng, [correct, ...wrong]);
  return { choices, answer: idOf(correct) };
}

/** A multiple-choice set: the answer lists the correct ids in the order shown. */
export function multipleChoice(rng: Rng, correct: readonly string[], wrong: readonly string[]): { choices: Choice[]; answer: string[] } {
  const { choices } = shuffledChoices(rng, [...correct, ...wrong]);
  const answer = choices.filter((c) => correct.includes(c.label)).map((c) => c.id);
  return { choices, answer };
}

/** An ordering set: steps shown shuffled (never already in order); the answer is their ids in the right order. */
export function orderChoices(rng: Rng, steps: readonly string[]): { choices: Choice[]; answer: string[] } {
  assertUnique(steps);
  let shown = shuffle(rng, steps);
  if (steps.length > 1 && shown.every((step, index) => step === steps[index])) {
    shown = [...shown.slice(1), ...shown.slice(0, 1)];
  }
  const choices = shown.map((label, index) => ({ id: choiceIds[index] as string, label }));
  const answer = steps.map((step) => (choices.find((c) => c.label === step) as Choice).id);
  return { choices, answer };
}
