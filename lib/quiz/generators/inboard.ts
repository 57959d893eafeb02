import { singleChoice } from "@/lib/quiz/choices";
import { formatClicks, formatCm, formatNumber, formatSigned } from "@/lib/quiz/format";
import {
  oarNoun,
  question,
  randomInboardCm,
  randomNonZeroChangeCm,
  randomOarType,
  type QuestionGenerator,
} from "@/lib/quiz/generators/scenario";
import { chance, randomInt } from "@/lib/quiz/random";
import type { Rng } from "@/lib/quiz/types";
import { inboardAfterLengthChangeCm, inboardClicks } from "@/lib/rigging/adjust";
import { roundCm } from "@/lib/rigging/round";
import type { CollarDirection } from "@/lib/rigging/types";

export const collarDirectionLabels: Record<CollarDirection, string> = {
  "towards-blade": "Move the collar towards the blade",
  "towards-handle": "Move the collar towards the handle",
  none: "No change: leave the collar where it is",
};

/** Largest inboard change asked about, cm. */
const maxInboardChangeCm = 3;

/** A target inboard a whole number of clicks (1–6, within 3 cm) from `currentCm`. */
function targetWholeClicksAway(rng: Rng, currentCm: number, clickCm: number): number {
  const maxClicks = Math.max(1, Math.min(6, Math.floor(maxInboardChangeCm / clickCm)));
  const clicks = randomInt(rng, 1, maxClicks);
  return roundCm(currentCm + (chance(rng, 0.5) ? 1 : -1) * clicks * clickCm);
}

function directionReason(direction: CollarDirection, currentCm: number, targetCm: number): string {
  const from = `${formatNumber(currentCm)} → ${formatCm(targetCm)}`;
  if (direction === "towards-blade") {
    return `The inboard runs from the handle end to the collar. To make it longer (${from}), the collar moves away from the handle, towards the blade.`;
  }
  if (direction === "towards-handle") {
    return `The inboard runs from the handle end to the collar. To make it shorter (${from}), the collar moves towards the handle.`;
  }
  return `The inboard is already ${formatCm(currentCm)}, so the collar stays where it is.`;
}

/** The inboard after a handle move: the collar stays put, so the inboard changes by the handle move. */
export const inboardAfterHandleMoveQuestion: QuestionGenerator = (rng) => {
  const oarType = randomOarType(rng);
  const inboardCm = randomInboardCm(rng, oarType);
  const handleMoveCm = randomNonZeroChangeCm(rng, 2);
  const afterCm = inboardAfterLengthChangeCm(inboardCm, handleMoveCm);
  const move =
    handleMoveCm > 0
      ? `You lengthen the oar by ${formatCm(handleMoveCm)} by sliding the handle out`
      : `You shorten the oar by ${formatCm(-handleMoveCm)} by sliding the handle in`;
  return question("inboard-after-handle-move", {
    kind: "numeric",
    prompt:
      `Your ${oarNoun(oarType)}'s inboard measures ${formatCm(inboardCm)}. ${move}, and the collar stays where it is. ` +
      `What does the inboard measure now?`,
    unit: "cm",
    answer: afterCm,
    tolerance: 0.05,
    explanation:
      `The collar has not moved, but the handle end has moved ${handleMoveCm > 0 ? "away from" : "towards"} it by ` +
      `${formatCm(Math.abs(handleMoveCm))}, so the inboard changes by ${formatSigned(handleMoveCm)} cm: ` +
      `${formatNumber(inboardCm)} ${handleMoveCm > 0 ? "+" : "−"} ${formatNumber(Math.abs(handleMoveCm))} = ${formatCm(afterCm)}. ` +
      `That is why you set the length first and the inboard second.`,
  });
};

/** Clicks from the current to the target inboard, a whole number of clicks apart. */
export const inboardClicksQuestion: QuestionGenerator = (rng, settings) => {
  const oarType = randomOarType(rng);
  const currentCm = randomInboardCm(rng, oarType);
  const targetCm = targetWholeClicksAway(rng, currentCm, settings.clickCm);
  const result = inboardClicks(currentCm, targetCm, settings.clickCm);
  return question("inboard-clicks", {
    kind: "numeric",
    prompt:
      `Your ${oarNoun(oarType)}'s inboard measures ${formatCm(currentCm)} and your coach wants ${formatCm(targetCm)}. ` +
      `Each click moves the collar ${formatCm(settings.clickCm)}. How many clicks must you move the collar?`,
    unit: "clicks",
    answer: result.clicks,
    tolerance: 0,
    explanation:
      `Change = ${formatNumber(targetCm)} − ${formatNumber(currentCm)} = ${formatSigned(result.changeCm)} cm. ` +
      `${formatNumber(Math.abs(result.changeCm))} ÷ ${formatNumber(settings.clickCm)} = ${formatClicks(result.clicks)}, ` +
      `${result.direction === "towards-blade" ? "towards the blade (the inboard gets longer)" : "towards the handle (the inboard gets shorter)"}.`,
  });
};

/** Which way the collar moves: towards the blade for more inboard, towards the handle for less. */
export const clickDirectionQuestion: QuestionGenerator = (rng, settings) => {
  const oarType = randomOarType(rng);
  const currentCm = randomInboardCm(rng, oarType);
  const targetCm = chance(rng, 1 / 6) ? currentCm : targetWholeClicksAway(rng, currentCm, settings.clickCm);
  const result = inboardClicks(currentCm, targetCm, settings.clickCm);
  const { choices, answer } = singleChoice(
    rng,
    collarDirectionLabels[result.direction],
    (Object.keys(collarDirectionLabels) as CollarDirection[])
      .filter((direction) => direction !== result.direction)
      .map((direction) => collarDirectionLabels[direction]),
  );
  const clicksNote = result.clicks === 0 ? "" : ` That is ${formatClicks(result.clicks)} of ${formatCm(settings.clickCm)}.`;
  return question("click-direction", {
    kind: "single",
    prompt:
      `Your ${oarNoun(oarType)}'s inboard measures ${formatCm(currentCm)} and the boat needs ${formatCm(targetCm)}. ` +
      `Which way do you move the collar?`,
    choices,
    answer,
    explanation: `${directionReason(result.direction, currentCm, targetCm)}${clicksNote}`,
  });
};
