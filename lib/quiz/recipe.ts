import { z } from "zod";

/** Names of the computed question generators (lib/quiz/generators). Values come from a seed. */
export const computedGeneratorNames = [
  "length-change",
  "length-direction",
  "inboard-after-handle-move",
  "inboard-clicks",
  "click-direction",
  "outboard",
  "lever-ratio",
  "overlap-sculling",
  "overlap-sweep",
  "span-gearing",
  "suggested-inboard-sweep",
  "limit-check",
  "cleaning-due",
] as const;

/** Names of the fixed (written) question banks (lib/quiz/banks). */
export const fixedBankNames = [
  "fact:measure-length",
  "fact:handle-mechanisms",
  "fact:stub-markings",
  "fact:inboard-definition",
  "fact:collar-seated",
  "fact:span-spread",
  "fact:why-length-first",
  "fact:ask-a-coach",
  "fact:slipped-collar",
  "fact:pre-launch-checks",
  "fact:brush-type",
  "fact:cleaning-frequency",
  "fact:sticky-when-wet",
  "fact:chemical-safety",
  "order:rig-change-steps",
  "order:cleaning-steps",
] as const;

export const generatorNames = [...computedGeneratorNames, ...fixedBankNames] as const;
export type GeneratorName = (typeof generatorNames)[number];

/** True when the generator computes its answer from seeded values rather than a written bank. */
export function isComputedGenerator(name: GeneratorName): boolean {
  return (computedGeneratorNames as readonly string[]).includes(name);
}

export const quizRecipeItemSchema = z.object({
  use: z.enum(generatorNames),
  count: z.number().int().min(1).max(5),
});

/** A module's quiz recipe: a pool of generator uses from which `draw` items are taken. */
export const quizRecipeSchema = z
  .object({
    draw: z.number().int().min(6).max(10),
    items: z.array(quizRecipeItemSchema).min(1),
  })
  .refine((recipe) => recipe.items.reduce((sum, item) => sum + item.count, 0) >= recipe.draw, {
    error: "the recipe's counts must add up to at least `draw`",
    path: ["items"],
  });

export type QuizRecipe = z.infer<typeof quizRecipeSchema>;
