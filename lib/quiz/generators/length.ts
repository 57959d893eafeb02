import { singleChoice } from "@/lib/quiz/choices";
import { formatCm, formatNumber, formatSigned } from "@/lib/quiz/format";
import {
  oarNoun,
  question,
  randomLengthCm,
  randomOarType,
  randomOtherLengthCm,
  type QuestionGenerator,
} from "@/lib/quiz/generators/scenario";
import { lengthChange } from "@/lib/rigging/adjust";
import type { LengthAction } from "@/lib/rigging/types";

export const lengthActionLabels: Record<LengthAction, string> = {
  lengthen: "Lengthen the oar: slide the handle out",
  shorten: "Shorten the oar: slide the handle in",
  none: "Leave the length as it is",
};

function changeSentence(changeCm: number): string {
  if (changeCm > 0) return `Positive means lengthen: slide the handle out ${formatCm(changeCm)}.`;
  if (changeCm < 0) return `Negative means shorten: slide the handle in ${formatCm(Math.abs(changeCm))}.`;
  return "Zero means the length is already right: leave the handle alone.";
}

/** How far the handle must move: |target − measured|. */
export const lengthChangeQuestion: QuestionGenerator = (rng) => {
  const oarType = randomOarType(rng);
  const measuredCm = randomLengthCm(rng, oarType);
  const targetCm = randomOtherLengthCm(rng, oarType, measuredCm);
  const change = lengthChange(measuredCm, targetCm);
  return question("length-change", {
    kind: "numeric",
    prompt:
      `Your ${oarNoun(oarType)} measures ${formatCm(measuredCm)} from the blade tip to the end of the handle, ` +
      `and the rig card for the boat asks for ${formatCm(targetCm)}. ` +
      `How many centimetres must you slide the handle to get there?`,
    unit: "cm",
    answer: Math.abs(change.changeCm),
    tolerance: 0.05,
    explanation:
      `Change = target − measured = ${formatNumber(targetCm)} − ${formatNumber(measuredCm)} = ` +
      `${formatSigned(change.changeCm)} cm. ${changeSentence(change.changeCm)} ` +
      `The handle moves ${formatCm(Math.abs(change.changeCm))}.`,
  });
};

/** Whether to lengthen, shorten or leave the length, from the sign of target − measured. */
export const lengthDirectionQuestion: QuestionGenerator = (rng) => {
  const oarType = randomOarType(rng);
  const measuredCm = randomLengthCm(rng, oarType);
  const targetCm = randomOtherLengthCm(rng, oarType, measuredCm, 1 / 6);
  const change = lengthChange(measuredCm, targetCm);
  const { choices, answer } = singleChoice(
    rng,
    lengthActionLabels[change.action],
    (Object.keys(lengthActionLabels) as LengthAction[])
      .filter((action) => action !== change.action)
      .map((action) => lengthActionLabels[action]),
  );
  return question("length-direction", {
    kind: "single",
    prompt:
      `Your ${oarNoun(oarType)} measures ${formatCm(measuredCm)} overall and the boat needs ${formatCm(targetCm)}. ` +
      `What do you do at the handle?`,
    choices,
    answer,
    explanation:
      `Change = target − measured = ${formatNumber(targetCm)} − ${formatNumber(measuredCm)} = ` +
      `${formatSigned(change.changeCm)} cm. ${changeSentence(change.changeCm)}`,
  });
};
