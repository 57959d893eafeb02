import { singleChoice } from "@/lib/quiz/choices";
import { formatCm, formatNumber } from "@/lib/quiz/format";
import { oarNoun, question, randomOarType, type QuestionGenerator } from "@/lib/quiz/generators/scenario";
import { chance, randomInt, randomStep } from "@/lib/quiz/random";
import type { Rng } from "@/lib/quiz/types";
import { checkLimits, defaultClubOarLimits } from "@/lib/rigging/limits";
import type { OarLimits } from "@/lib/rigging/limits";
import type { OarSettings } from "@/lib/rigging/types";

export const limitCheckLabels = {
  fine: "Set it up: both figures are inside the club's limits",
  askCoach: "Ask a coach before going afloat: a figure is outside the club's limits",
} as const;

/** Club limits near the defaults, shifted by up to 2 cm so the numbers cannot be learnt by heart. */
function randomClubLimits(rng: Rng, defaults: OarLimits): OarLimits {
  const lengthShiftCm = randomInt(rng, -2, 2);
  const inboardShiftCm = randomInt(rng, -1, 1);
  return {
    minLengthCm: defaults.minLengthCm + lengthShiftCm,
    maxLengthCm: defaults.maxLengthCm + lengthShiftCm,
    minInboardCm: defaults.minInboardCm + inboardShiftCm,
    maxInboardCm: defaults.maxInboardCm + inboardShiftCm,
  };
}

/** A value inside [min, max], or just outside it (0.5–3 cm) when `outside`. */
function valueNear(rng: Rng, min: number, max: number, outside: boolean): number {
  if (!outside) return randomStep(rng, min, max, 0.5);
  const byCm = randomStep(rng, 0.5, 3, 0.5);
  return chance(rng, 0.5) ? min - byCm : max + byCm;
}

/** Whether a rig card's setting is inside the club's limits or needs a coach. */
export const limitCheckQuestion: QuestionGenerator = (rng) => {
  const oarType = randomOarType(rng);
  const limits = randomClubLimits(rng, defaultClubOarLimits[oarType]);
  const outside = chance(rng, 0.5) ? null : chance(rng, 0.5) ? "length" : "inboard";
  const settings: OarSettings = {
    lengthCm: valueNear(rng, limits.minLengthCm, limits.maxLengthCm, outside === "length"),
    inboardCm: valueNear(rng, limits.minInboardCm, limits.maxInboardCm, outside === "inboard"),
  };
  const warnings = checkLimits(oarType, settings, limits);
  const correct = warnings.length === 0 ? limitCheckLabels.fine : limitCheckLabels.askCoach;
  const wrong = warnings.length === 0 ? limitCheckLabels.askCoach : limitCheckLabels.fine;
  const { choices, answer } = singleChoice(rng, correct, [wrong]);
  const noun = oarNoun(oarType);
  return question("limit-check", {
    kind: "single",
    prompt:
      `Your club allows ${noun}s from ${formatNumber(limits.minLengthCm)} to ${formatCm(limits.maxLengthCm)} long, ` +
      `with an inboard from ${formatNumber(limits.minInboardCm)} to ${formatCm(limits.maxInboardCm)}. ` +
      `The rig card in the boat says ${formatCm(settings.lengthCm)} long with an inboard of ${formatCm(settings.inboardCm)}. ` +
      `What do you do?`,
    choices,
    answer,
    explanation:
      warnings.length === 0
        ? `${formatCm(settings.lengthCm)} is within ${formatNumber(limits.minLengthCm)}–${formatCm(limits.maxLengthCm)} and ` +
          `${formatCm(settings.inboardCm)} is within ${formatNumber(limits.minInboardCm)}–${formatCm(limits.maxInboardCm)}, ` +
          `so you can set the oar up, then check everything again before going afloat.`
        : `${warnings.join(" ")} A figure outside the limits may be a mistake on the card or a special setting; only a coach can say which.`,
  });
};
