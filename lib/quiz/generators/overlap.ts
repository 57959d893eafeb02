import { formatCm, formatNumber } from "@/lib/quiz/format";
import { question, randomInboardCm, randomSpanCm, randomSpreadCm, type QuestionGenerator } from "@/lib/quiz/generators/scenario";
import { overlapCm, simpleOverlapCm, suggestedInboardCm, sweepInboardOverSpreadCm } from "@/lib/rigging/geometry";

/** Sculling overlap by the measurement protocol: 2 × (inboard + half swivel width) − span. */
export const overlapScullingQuestion: QuestionGenerator = (rng, settings) => {
  const inboardCm = randomInboardCm(rng, "sculling");
  const spanCm = randomSpanCm(rng);
  const halfSwivelCm = settings.halfSwivelCm;
  const answer = overlapCm("sculling", inboardCm, spanCm, halfSwivelCm);
  const simple = simpleOverlapCm("sculling", inboardCm, spanCm);
  return question("overlap-sculling", {
    kind: "numeric",
    prompt:
      `Your sculls have an inboard of ${formatCm(inboardCm)} and the boat's span is ${formatCm(spanCm)}. ` +
      `Your club uses the measurement protocol's overlap, 2 × (inboard + half swivel width) − span, ` +
      `with a half swivel width of ${formatCm(halfSwivelCm)}. What is the overlap?`,
    unit: "cm",
    answer,
    tolerance: 0.05,
    explanation:
      `Overlap = 2 × (${formatNumber(inboardCm)} + ${formatNumber(halfSwivelCm)}) − ${formatNumber(spanCm)} = ` +
      `${formatNumber(2 * (inboardCm + halfSwivelCm))} − ${formatNumber(spanCm)} = ${formatCm(answer)}. ` +
      `Without the swivel term (the simple overlap, 2 × inboard − span) it would be ${formatCm(simple)}, ` +
      `so always say which overlap a number means.`,
  });
};

/** Sweep overlap by the measurement protocol: inboard + half swivel width − spread. */
export const overlapSweepQuestion: QuestionGenerator = (rng, settings) => {
  const inboardCm = randomInboardCm(rng, "sweep");
  const spreadCm = randomSpreadCm(rng);
  const halfSwivelCm = settings.halfSwivelCm;
  const answer = overlapCm("sweep", inboardCm, spreadCm, halfSwivelCm);
  const simple = simpleOverlapCm("sweep", inboardCm, spreadCm);
  return question("overlap-sweep", {
    kind: "numeric",
    prompt:
      `Your sweep oar has an inboard of ${formatCm(inboardCm)} and the boat's spread is ${formatCm(spreadCm)}. ` +
      `Your club uses the measurement protocol's overlap, inboard + half swivel width − spread, ` +
      `with a half swivel width of ${formatCm(halfSwivelCm)}. What is the overlap?`,
    unit: "cm",
    answer,
    tolerance: 0.05,
    explanation:
      `Overlap = ${formatNumber(inboardCm)} + ${formatNumber(halfSwivelCm)} − ${formatNumber(spreadCm)} = ${formatCm(answer)}. ` +
      `Without the swivel term (the simple overlap, inboard − spread) it would be ${formatCm(simple)}.`,
  });
};

/** Sweep inboard by the rule of thumb spread + 30 cm (common practice). */
export const suggestedInboardSweepQuestion: QuestionGenerator = (rng) => {
  const spreadCm = randomSpreadCm(rng);
  const answer = suggestedInboardCm("sweep", spreadCm);
  return question("suggested-inboard-sweep", {
    kind: "numeric",
    prompt:
      `A common rule of thumb sets a sweep oar's inboard at the spread plus ${formatCm(sweepInboardOverSpreadCm)}. ` +
      `Your boat's spread is ${formatCm(spreadCm)}. What inboard does the rule suggest?`,
    unit: "cm",
    answer,
    tolerance: 0.05,
    explanation:
      `Inboard ≈ spread + ${formatNumber(sweepInboardOverSpreadCm)} = ${formatNumber(spreadCm)} + ` +
      `${formatNumber(sweepInboardOverSpreadCm)} = ${formatCm(answer)}. It is only a starting point: your coach sets the real figure.`,
  });
};
