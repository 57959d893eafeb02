import { describe, expect, it } from "vitest";

import { expectedAnswerText, gradeAnswer, gradeQuiz, parseNumericAnswer } from "@/lib/quiz/grade";
import type { Question } from "@/lib/quiz/types";

const clicks: Question = {
  id: "q1",
  kind: "numeric",
  prompt: "How many clicks?",
  unit: "clicks",
  answer: 4,
  tolerance: 0,
  explanation: "2 ÷ 0.5 = 4 clicks.",
  generator: "inboard-clicks",
};

const overlap: Question = {
  id: "q2",
  kind: "numeric",
  prompt: "Overlap?",
  unit: "cm",
  answer: 3.5,
  tolerance: 0.05,
  explanation: "…",
  generator: "overlap-sweep",
};

const direction: Question = {
  id: "q3",
  kind: "single",
  prompt: "Which way?",
  choices: [
    { id: "a", label: "Move the collar towards the handle" },
    { id: "b", label: "Move the collar towards the blade" },
    { id: "c", label: "No change: leave the collar where it is" },
  ],
  answer: "b",
  explanation: "Longer inboard: towards the blade.",
  generator: "click-direction",
};

const frequency: Question = {
  id: "q4",
  kind: "multiple",
  prompt: "When?",
  choices: [
    { id: "a", label: "Before every race" },
    { id: "b", label: "Once a season" },
    { id: "c", label: "At least once a week" },
  ],
  answer: ["a", "c"],
  explanation: "Weekly and before races.",
  generator: "fact:cleaning-frequency",
};

const steps: Question = {
  id: "q5",
  kind: "order",
  prompt: "Order?",
  choices: [
    { id: "a", label: "Set the inboard" },
    { id: "b", label: "Set the length" },
    { id: "c", label: "Check again" },
  ],
  answer: ["b", "a", "c"],
  explanation: "Length, inboard, check.",
  generator: "order:rig-change-steps",
};

describe("parseNumericAnswer", () => {
  it("reads numbers and numeric text, including a decimal comma and a real minus sign", () => {
    expect(parseNumericAnswer(3)).toBe(3);
    expect(parseNumericAnswer("3")).toBe(3);
    expect(parseNumericAnswer(" 3.5 ")).toBe(3.5);
    expect(parseNumericAnswer("3,5")).toBe(3.5);
    expect(parseNumericAnswer("-0.5")).toBe(-0.5);
    expect(parseNumericAnswer("−0.5")).toBe(-0.5);
    expect(parseNumericAnswer(".5")).toBe(0.5);
  });

  it("refuses anything else", () => {
    for (const value of ["", " ", "3 cm", "1e3", "0x10", "3.5.1", "abc", null, undefined, [], {}, Number.NaN, Number.POSITIVE_INFINITY]) {
      expect(parseNumericAnswer(value)).toBeNull();
    }
  });
});

describe("gradeAnswer", () => {
  it("numeric: exact when the tolerance is 0", () => {
    expect(gradeAnswer(clicks, 4)).toBe(true);
    expect(gradeAnswer(clicks, "4")).toBe(true);
    expect(gradeAnswer(clicks, 3)).toBe(false);
    expect(gradeAnswer(clicks, 4.1)).toBe(false);
  });

  it("numeric: within the tolerance, either side, with float slack", () => {
    expect(gradeAnswer(overlap, 3.55)).toBe(true);
    expect(gradeAnswer(overlap, "3,45")).toBe(true);
    expect(gradeAnswer(overlap, 3.56)).toBe(false);
    expect(gradeAnswer({ ...overlap, answer: 0.3, tolerance: 0 }, 0.1 + 0.2)).toBe(true);
  });

  it("numeric: refuses non-numbers", () => {
    expect(gradeAnswer(overlap, "3.5 cm")).toBe(false);
    expect(gradeAnswer(overlap, ["3.5"])).toBe(false);
  });

  it("single: the id only", () => {
    expect(gradeAnswer(direction, "b")).toBe(true);
    expect(gradeAnswer(direction, "a")).toBe(false);
    expect(gradeAnswer(direction, ["b"])).toBe(false);
    expect(gradeAnswer(direction, "Move the collar towards the blade")).toBe(false);
  });

  it("multiple: the same set in any order, no extras, no repeats", () => {
    expect(gradeAnswer(frequency, ["a", "c"])).toBe(true);
    expect(gradeAnswer(frequency, ["c", "a"])).toBe(true);
    expect(gradeAnswer(frequency, ["a"])).toBe(false);
    expect(gradeAnswer(frequency, ["a", "b", "c"])).toBe(false);
    expect(gradeAnswer(frequency, ["a", "a"])).toBe(false);
    expect(gradeAnswer(frequency, ["a", "c", "c"])).toBe(false);
    expect(gradeAnswer(frequency, "a")).toBe(false);
  });

  it("order: the exact sequence", () => {
    expect(gradeAnswer(steps, ["b", "a", "c"])).toBe(true);
    expect(gradeAnswer(steps, ["a", "b", "c"])).toBe(false);
    expect(gradeAnswer(steps, ["b", "a"])).toBe(false);
    expect(gradeAnswer(steps, ["b", "a", "c", "c"])).toBe(false);
  });
});

describe("expectedAnswerText", () => {
  it("says it in words", () => {
    expect(expectedAnswerText(clicks)).toBe("4 clicks");
    expect(expectedAnswerText({ ...clicks, answer: 1 })).toBe("1 click");
    expect(expectedAnswerText(overlap)).toBe("3.5 cm");
    expect(expectedAnswerText({ ...overlap, unit: undefined, answer: 2.27 })).toBe("2.27");
    expect(expectedAnswerText(direction)).toBe("Move the collar towards the blade");
    expect(expectedAnswerText(frequency)).toBe("Before every race; At least once a week");
    expect(expectedAnswerText(steps)).toBe("1. Set the length 2. Set the inboard 3. Check again");
  });
});

describe("gradeQuiz", () => {
  const quiz = [clicks, overlap, direction, frequency, steps];

  it("scores all right as 1 and passes", () => {
    const grade = gradeQuiz(quiz, { q1: 4, q2: "3.5", q3: "b", q4: ["c", "a"], q5: ["b", "a", "c"] }, 0.8);
    expect(grade.score).toBe(1);
    expect(grade.passed).toBe(true);
    expect(grade.results.every((r) => r.correct)).toBe(true);
  });

  it("counts missing answers wrong and reports each result with words and the explanation", () => {
    const grade = gradeQuiz(quiz, { q1: 4, q3: "a" }, 0.8);
    expect(grade.score).toBe(0.2);
    expect(grade.passed).toBe(false);
    expect(grade.results).toEqual([
      { id: "q1", correct: true, expected: "4 clicks", explanation: clicks.explanation },
      { id: "q2", correct: false, expected: "3.5 cm", explanation: overlap.explanation },
      {
        id: "q3",
        correct: false,
        expected: "Move the collar towards the blade",
        explanation: direction.explanation,
      },
      {
        id: "q4",
        correct: false,
        expected: "Before every race; At least once a week",
        explanation: frequency.explanation,
      },
      {
        id: "q5",
        correct: false,
        expected: "1. Set the length 2. Set the inboard 3. Check again",
        explanation: steps.explanation,
      },
    ]);
  });

  it("rounds the score to 3 decimals but passes on the exact share", () => {
    const three = [clicks, { ...clicks, id: "q2" }, { ...clicks, id: "q3" }];
    const grade = gradeQuiz(three, { q1: 4, q2: 4, q3: 0 }, 2 / 3);
    expect(grade.score).toBe(0.667);
    expect(grade.passed).toBe(true);
    expect(gradeQuiz(three, { q1: 4, q2: 4, q3: 0 }, 0.667).passed).toBe(false);
  });

  it("passes exactly at the pass mark", () => {
    const grade = gradeQuiz(quiz, { q1: 4, q2: 3.5, q3: "b", q4: ["a", "c"] }, 0.8);
    expect(grade.score).toBe(0.8);
    expect(grade.passed).toBe(true);
  });

  it("ignores answers to unknown ids and inherited keys", () => {
    const answers = Object.create({ q1: 4 }) as Record<string, unknown>;
    answers.q9 = 4;
    expect(gradeQuiz([clicks], answers, 0.5).score).toBe(0);
  });

  it("fails an empty quiz and refuses a pass mark outside 0–1", () => {
    expect(gradeQuiz([], {}, 0.8)).toEqual({ score: 0, passed: false, results: [] });
    expect(() => gradeQuiz(quiz, {}, 80)).toThrow(RangeError);
    expect(() => gradeQuiz(quiz, {}, -0.1)).toThrow(RangeError);
  });
});
