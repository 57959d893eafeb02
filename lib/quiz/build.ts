import { bankQuestion, bankVariantCount } from "@/lib/quiz/banks";
import { generators } from "@/lib/quiz/generators";
import { createRng, shuffle } from "@/lib/quiz/random";
import { isComputedGenerator, quizRecipeSchema } from "@/lib/quiz/recipe";
import type { GeneratorName, QuizRecipe } from "@/lib/quiz/recipe";
import type { ComputedGeneratorName, FixedBankName, PublicQuestion, Question, QuizSettings } from "@/lib/quiz/types";

export interface BuildQuizInput {
  recipe: QuizRecipe;
  /** Any string; the same seed always builds the same quiz (e.g. the attempt's id). */
  seed: string;
  settings: QuizSettings;
}

function isComputedName(name: GeneratorName): name is ComputedGeneratorName {
  return isComputedGenerator(name);
}

/** Tries before accepting a computed question whose prompt repeats an earlier one. */
const maxRepeatTries = 8;

function assertSettings(settings: QuizSettings): void {
  if (!(Number.isFinite(settings.clickCm) && settings.clickCm > 0)) {
    throw new RangeError(`settings.clickCm must be above 0, got ${settings.clickCm}`);
  }
  if (!(Number.isFinite(settings.halfSwivelCm) && settings.halfSwivelCm >= 0)) {
    throw new RangeError(`settings.halfSwivelCm must be 0 or more, got ${settings.halfSwivelCm}`);
  }
}

/**
 * Builds a quiz: expands the recipe (each item `count` times), draws `draw` uses keeping at least the
 * recipe's share of computed ones (rounded up), shuffles them by the seed and numbers them q1, q2, ….
 * Each question has its own sub-seed, and a bank used twice gives two different variants.
 */
export function buildQuiz({ recipe, seed, settings }: BuildQuizInput): Question[] {
  const checked = quizRecipeSchema.safeParse(recipe);
  if (!checked.success) throw new RangeError(`invalid quiz recipe: ${checked.error.issues[0]?.message ?? "unknown"}`);
  assertSettings(settings);

  const uses: GeneratorName[] = recipe.items.flatMap((item) => Array.from({ length: item.count }, () => item.use));
  const computedUses = uses.filter((name) => isComputedName(name));
  const fixedUses = uses.filter((name) => !isComputedName(name));
  const computedDraw = Math.min(computedUses.length, Math.ceil((recipe.draw * computedUses.length) / uses.length));
  const fixedDraw = recipe.draw - computedDraw;

  const drawRng = createRng(`${seed}|draw`);
  const drawn = shuffle(drawRng, [
    ...shuffle(drawRng, computedUses).slice(0, computedDraw),
    ...shuffle(drawRng, fixedUses).slice(0, fixedDraw),
  ]);

  const variantOrders = new Map<FixedBankName, number[]>();
  const bankUses = new Map<FixedBankName, number>();
  const prompts = new Set<string>();

  return drawn.map((name, index) => {
    const id = `q${index + 1}`;
    let built: Question;
    if (isComputedName(name)) {
      const generate = generators[name];
      built = generate(createRng(`${seed}|${id}|${name}`), settings);
      for (let attempt = 1; attempt < maxRepeatTries && prompts.has(built.prompt); attempt += 1) {
        built = generate(createRng(`${seed}|${id}|${name}|${attempt}`), settings);
      }
    } else {
      const bank: FixedBankName = name;
      let order = variantOrders.get(bank);
      if (order === undefined) {
        order = shuffle(
          createRng(`${seed}|bank|${bank}`),
          Array.from({ length: bankVariantCount(bank) }, (_, i) => i),
        );
        variantOrders.set(bank, order);
      }
      const useIndex = bankUses.get(bank) ?? 0;
      bankUses.set(bank, useIndex + 1);
      built = bankQuestion(bank, createRng(`${seed}|${id}|${bank}`), order[useIndex % order.length]);
    }
    prompts.add(built.prompt);
    return { ...built, id };
  });
}

/** What the browser may see: the question without answer, tolerance, explanation or generator. */
export function toPublicQuestion(question: Question): PublicQuestion {
  const publicQuestion: PublicQuestion = { id: question.id, kind: question.kind, prompt: question.prompt };
  if (question.unit !== undefined) publicQuestion.unit = question.unit;
  if (question.choices !== undefined) {
    publicQuestion.choices = question.choices.map((choice) => ({ id: choice.id, label: choice.label }));
  }
  return publicQuestion;
}
