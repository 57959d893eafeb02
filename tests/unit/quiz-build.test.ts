import { describe, expect, it } from "vitest";

import { buildQuiz, toPublicQuestion } from "@/lib/quiz/build";
import { gradeAnswer } from "@/lib/quiz/grade";
import { computedGeneratorNames, isComputedGenerator } from "@/lib/quiz/recipe";
import type { QuizRecipe } from "@/lib/quiz/recipe";
import type { QuizSettings } from "@/lib/quiz/types";

const settings: QuizSettings = { clickCm: 0.5, halfSwivelCm: 2 };

const mixedRecipe: QuizRecipe = {
  draw: 8,
  items: [
    { use: "length-change", count: 2 },
    { use: "inboard-clicks", count: 2 },
    { use: "click-direction", count: 1 },
    { use: "inboard-after-handle-move", count: 1 },
    { use: "fact:why-length-first", count: 2 },
    { use: "fact:collar-seated", count: 1 },
    { use: "order:rig-change-steps", count: 1 },
  ],
};

const computedOnlyRecipe: QuizRecipe = {
  draw: 10,
  items: computedGeneratorNames.map((use) => ({ use, count: 1 })),
};

describe("buildQuiz", () => {
  it("draws `draw` questions with ids q1…qN", () => {
    const quiz = buildQuiz({ recipe: mixedRecipe, seed: "attempt-1", settings });
    expect(quiz).toHaveLength(8);
    expect(quiz.map((q) => q.id)).toEqual(["q1", "q2", "q3", "q4", "q5", "q6", "q7", "q8"]);
  });

  it("is deterministic for a seed", () => {
    const a = buildQuiz({ recipe: mixedRecipe, seed: "attempt-1", settings });
    const b = buildQuiz({ recipe: mixedRecipe, seed: "attempt-1", settings });
    expect(b).toEqual(a);
  });

  it("differs for different seeds", () => {
    const prompts = new Set(
      Array.from({ length: 20 }, (_, i) =>
        buildQuiz({ recipe: mixedRecipe, seed: `attempt-${i}`, settings })
          .map((q) => q.prompt)
          .join("\n"),
      ),
    );
    expect(prompts.size).toBe(20);
  });

  it("only uses what the recipe names, at most `count` times each", () => {
    for (let i = 0; i < 50; i += 1) {
      const quiz = buildQuiz({ recipe: mixedRecipe, seed: `use-${i}`, settings });
      for (const item of mixedRecipe.items) {
        expect(quiz.filter((q) => q.generator === item.use).length).toBeLessThanOrEqual(item.count);
      }
      for (const q of quiz) expect(mixedRecipe.items.map((item) => item.use)).toContain(q.generator);
    }
  });

  it("keeps at least the recipe's share of computed questions", () => {
    // 6 of the 10 recipe uses are computed, so at least 0.6 × 8 = 4.8, i.e. 5, of the 8 drawn.
    for (let i = 0; i < 100; i += 1) {
      const quiz = buildQuiz({ recipe: mixedRecipe, seed: `share-${i}`, settings });
      const computed = quiz.filter((q) => isComputedGenerator(q.generator)).length;
      expect(computed).toBeGreaterThanOrEqual(5);
      expect(computed / quiz.length).toBeGreaterThanOrEqual(0.5);
    }
  });

  it("builds a quiz entirely from computed generators when the recipe says so", () => {
    const quiz = buildQuiz({ recipe: computedOnlyRecipe, seed: "computed", settings });
    expect(quiz).toHaveLength(10);
    expect(quiz.every((q) => isComputedGenerator(q.generator))).toBe(true);
    expect(new Set(quiz.map((q) => q.generator)).size).toBe(10);
  });

  it("gives different variants when one bank is used twice", () => {
    for (let i = 0; i < 30; i += 1) {
      const quiz = buildQuiz({
        recipe: {
          draw: 6,
          items: [
            { use: "fact:why-length-first", count: 2 },
            { use: "outboard", count: 4 },
          ],
        },
        seed: `variants-${i}`,
        settings,
      });
      const bankPrompts = quiz.filter((q) => q.generator === "fact:why-length-first").map((q) => q.prompt);
      expect(bankPrompts).toHaveLength(2);
      expect(new Set(bankPrompts).size).toBe(2);
    }
  });

  it("avoids repeating a computed prompt within a quiz", () => {
    for (let i = 0; i < 30; i += 1) {
      const quiz = buildQuiz({
        recipe: {
          draw: 6,
          items: [
            { use: "suggested-inboard-sweep", count: 5 },
            { use: "outboard", count: 1 },
          ],
        },
        seed: `repeat-${i}`,
        settings,
      });
      expect(new Set(quiz.map((q) => q.prompt)).size).toBe(quiz.length);
    }
  });

  it("uses the club's settings", () => {
    const quiz = buildQuiz({
      recipe: {
        draw: 6,
        items: [
          { use: "inboard-clicks", count: 5 },
          { use: "overlap-sculling", count: 1 },
        ],
      },
      seed: "club",
      settings: { clickCm: 1, halfSwivelCm: 2.5 },
    });
    for (const q of quiz) {
      if (q.generator === "inboard-clicks") expect(q.prompt).toMatch(/Each click moves the collar 1 cm/);
      if (q.generator === "overlap-sculling") expect(q.prompt).toMatch(/half swivel width of 2.5 cm/);
    }
  });

  it("every built question grades its own answer right", () => {
    for (let i = 0; i < 20; i += 1) {
      for (const q of buildQuiz({ recipe: mixedRecipe, seed: `grade-${i}`, settings })) {
        expect(gradeAnswer(q, q.answer)).toBe(true);
      }
    }
  });

  it("refuses an invalid recipe or settings", () => {
    expect(() => buildQuiz({ recipe: { draw: 8, items: [{ use: "outboard", count: 2 }] }, seed: "x", settings })).toThrow(RangeError);
    expect(() => buildQuiz({ recipe: mixedRecipe, seed: "x", settings: { clickCm: 0, halfSwivelCm: 2 } })).toThrow(RangeError);
  });
});

describe("toPublicQuestion", () => {
  it("leaks no answer, explanation, tolerance or generator", () => {
    const quiz = buildQuiz({ recipe: mixedRecipe, seed: "public", settings });
    for (const q of quiz) {
      const json = JSON.stringify(toPublicQuestion(q));
      expect(json).not.toMatch(/"answer"|"explanation"|"tolerance"|"generator"/);
      expect(json).not.toContain(q.explanation);
    }
  });

  it("keeps what the browser needs", () => {
    const quiz = buildQuiz({ recipe: computedOnlyRecipe, seed: "public", settings });
    for (const q of quiz) {
      const shown = toPublicQuestion(q);
      expect(shown).toEqual({
        id: q.id,
        kind: q.kind,
        prompt: q.prompt,
        ...(q.unit === undefined ? {} : { unit: q.unit }),
        ...(q.choices === undefined ? {} : { choices: q.choices }),
      });
    }
  });
});
