import { formatCm, formatFixed, formatNumber } from "@/lib/quiz/format";
import {
  oarNoun,
  question,
  randomInboardCm,
  randomLengthCm,
  randomOarType,
  randomSpanCm,
  randomSpreadCm,
  type QuestionGenerator,
} from "@/lib/quiz/generators/scenario";
import { leverRatio, outboardCm, spanGearing } from "@/lib/rigging/geometry";
import { roundTo } from "@/lib/rigging/round";

/** Ratios are asked to two decimals; answers within 0.01 count, so 2.273 and 2.27 both pass. */
const ratioTolerance = 0.01;

/** Outboard = overall length − inboard. */
export const outboardQuestion: QuestionGenerator = (rng) => {
  const oarType = randomOarType(rng);
  const lengthCm = randomLengthCm(rng, oarType);
  const inboardCm = randomInboardCm(rng, oarType);
  const answer = outboardCm(lengthCm, inboardCm);
  return question("outboard", {
    kind: "numeric",
    prompt:
      `Your ${oarNoun(oarType)} is ${formatCm(lengthCm)} long overall with an inboard of ${formatCm(inboardCm)}. ` +
      `What is its outboard, the part from the collar to the blade tip?`,
    unit: "cm",
    answer,
    tolerance: 0.05,
    explanation: `Outboard = overall length − inboard = ${formatNumber(lengthCm)} − ${formatNumber(inboardCm)} = ${formatCm(answer)}.`,
  });
};

/** Lever ratio = outboard ÷ inboard, to two decimals. */
export const leverRatioQuestion: QuestionGenerator = (rng) => {
  const oarType = randomOarType(rng);
  const lengthCm = randomLengthCm(rng, oarType);
  const inboardCm = randomInboardCm(rng, oarType);
  const outCm = outboardCm(lengthCm, inboardCm);
  const ratio = leverRatio(lengthCm, inboardCm);
  return question("lever-ratio", {
    kind: "numeric",
    prompt:
      `Your ${oarNoun(oarType)} is ${formatCm(lengthCm)} long overall with an inboard of ${formatCm(inboardCm)}. ` +
      `What is its lever ratio (outboard ÷ inboard), to two decimal places?`,
    answer: roundTo(ratio, 2),
    tolerance: ratioTolerance,
    explanation:
      `Outboard = ${formatNumber(lengthCm)} − ${formatNumber(inboardCm)} = ${formatCm(outCm)}. ` +
      `Lever ratio = ${formatNumber(outCm)} ÷ ${formatNumber(inboardCm)} = ${formatFixed(ratio, 3)}, ` +
      `or ${formatFixed(ratio, 2)} to two decimal places.`,
  });
};

/** Span gearing: sculling outboard ÷ (span ÷ 2), sweep outboard ÷ spread, to two decimals. */
export const spanGearingQuestion: QuestionGenerator = (rng) => {
  const oarType = randomOarType(rng);
  const lengthCm = randomLengthCm(rng, oarType);
  const inboardCm = randomInboardCm(rng, oarType);
  const spanOrSpreadCm = oarType === "sculling" ? randomSpanCm(rng) : randomSpreadCm(rng);
  const outCm = outboardCm(lengthCm, inboardCm);
  const gearing = spanGearing(oarType, lengthCm, inboardCm, spanOrSpreadCm);
  const boat =
    oarType === "sculling"
      ? `in a boat with a span of ${formatCm(spanOrSpreadCm)}. For sculls, span gearing = outboard ÷ (span ÷ 2).`
      : `in a boat with a spread of ${formatCm(spanOrSpreadCm)}. For sweep oars, span gearing = outboard ÷ spread.`;
  const working =
    oarType === "sculling"
      ? `Span ÷ 2 = ${formatNumber(spanOrSpreadCm)} ÷ 2 = ${formatCm(spanOrSpreadCm / 2)}. ` +
        `Span gearing = ${formatNumber(outCm)} ÷ ${formatNumber(spanOrSpreadCm / 2)}`
      : `Span gearing = ${formatNumber(outCm)} ÷ ${formatNumber(spanOrSpreadCm)}`;
  return question("span-gearing", {
    kind: "numeric",
    prompt:
      `A ${oarNoun(oarType)} is ${formatCm(lengthCm)} long with an inboard of ${formatCm(inboardCm)}, ${boat} ` +
      `What is the span gearing, to two decimal places?`,
    answer: roundTo(gearing, 2),
    tolerance: ratioTolerance,
    explanation:
      `Outboard = ${formatNumber(lengthCm)} − ${formatNumber(inboardCm)} = ${formatCm(outCm)}. ` +
      `${working} = ${formatFixed(gearing, 3)}, or ${formatFixed(gearing, 2)} to two decimal places.`,
  });
};
