import type { computedGeneratorNames, fixedBankNames, GeneratorName } from "@/lib/quiz/recipe";

/** numeric: a number; single: one choice; multiple: every correct choice; order: all choices in order. */
export type QuestionKind = "numeric" | "single" | "multiple" | "order";

export interface Choice {
  id: string;
  label: string;
}

/** What the browser sees: never the answer or the explanation. */
export interface PublicQuestion {
  id: string;
  kind: QuestionKind;
  prompt: string;
  /** Unit of a numeric answer, e.g. "cm" or "clicks". */
  unit?: string;
  choices?: Choice[];
}

/**
 * A question with its answer. numeric: a number, right within `tolerance`; single: one choice id;
 * multiple: the set of correct ids; order: every choice id in the correct order.
 */
export interface Question extends PublicQuestion {
  answer: number | string | string[];
  tolerance?: number;
  /** The worked solution or the reason, shown after grading. */
  explanation: string;
  generator: GeneratorName;
}

/** Club settings that change the numbers in computed questions. */
export interface QuizSettings {
  /** Collar travel a click, cm. */
  clickCm: number;
  /** Half swivel width for the protocol overlap, cm. */
  halfSwivelCm: number;
}

/** A source of uniform numbers in [0, 1), e.g. a seeded generator from lib/quiz/random.ts. */
export type Rng = () => number;

/** Names of generators that compute their answers (see recipe.ts). */
export type ComputedGeneratorName = (typeof computedGeneratorNames)[number];
/** Names of the written question banks (see recipe.ts). */
export type FixedBankName = (typeof fixedBankNames)[number];
