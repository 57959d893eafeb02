import { cleaningDueQuestion } from "@/lib/quiz/generators/cleaning";
import { clickDirectionQuestion, inboardAfterHandleMoveQuestion, inboardClicksQuestion } from "@/lib/quiz/generators/inboard";
import { lengthChangeQuestion, lengthDirectionQuestion } from "@/lib/quiz/generators/length";
import { limitCheckQuestion } from "@/lib/quiz/generators/limits";
import { overlapScullingQuestion, overlapSweepQuestion, suggestedInboardSweepQuestion } from "@/lib/quiz/generators/overlap";
import { leverRatioQuestion, outboardQuestion, spanGearingQuestion } from "@/lib/quiz/generators/ratios";
import type { QuestionGenerator } from "@/lib/quiz/generators/scenario";
import type { ComputedGeneratorName } from "@/lib/quiz/types";

export type { QuestionGenerator } from "@/lib/quiz/generators/scenario";

/** Every computed generator by its recipe name; each answer comes from lib/rigging or lib/care. */
export const generators: Record<ComputedGeneratorName, QuestionGenerator> = {
  "length-change": lengthChangeQuestion,
  "length-direction": lengthDirectionQuestion,
  "inboard-after-handle-move": inboardAfterHandleMoveQuestion,
  "inboard-clicks": inboardClicksQuestion,
  "click-direction": clickDirectionQuestion,
  outboard: outboardQuestion,
  "lever-ratio": leverRatioQuestion,
  "overlap-sculling": overlapScullingQuestion,
  "overlap-sweep": overlapSweepQuestion,
  "span-gearing": spanGearingQuestion,
  "suggested-inboard-sweep": suggestedInboardSweepQuestion,
  "limit-check": limitCheckQuestion,
  "cleaning-due": cleaningDueQuestion,
};
