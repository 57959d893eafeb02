import { chance, randomInt, randomStep } from "@/lib/quiz/random";
import type { ComputedGeneratorName, Question, QuizSettings, Rng } from "@/lib/quiz/types";
import type { OarType } from "@/lib/rigging/types";

/** A computed question generator: seeded values in, an answerable question out. */
export type QuestionGenerator = (rng: Rng, settings: QuizSettings) => Question;

/**
 * Realistic ranges for generated values, cm, on a 0.5 cm grid. Sculls 284–292 and sweep oars 368–378
 * (lengths from memory: sculls 284–290, sweep 370–376); inboards from memory (sculls 86–89, sweep
 * 114–117); span 157–161 and spread 81–88 (row2k, "Rowing 101 – Basic Rigging").
 */
export const realisticCm = {
  sculling: { lengthCm: { min: 284, max: 292 }, inboardCm: { min: 86, max: 89 } },
  sweep: { lengthCm: { min: 368, max: 378 }, inboardCm: { min: 114, max: 117 } },
  spanCm: { min: 157, max: 161 },
  spreadCm: { min: 81, max: 88 },
} as const;

const gridCm = 0.5;

export function randomOarType(rng: Rng): OarType {
  return chance(rng, 0.5) ? "sculling" : "sweep";
}

export function randomLengthCm(rng: Rng, oarType: OarType): number {
  const { min, max } = realisticCm[oarType].lengthCm;
  return randomStep(rng, min, max, gridCm);
}

export function randomInboardCm(rng: Rng, oarType: OarType): number {
  const { min, max } = realisticCm[oarType].inboardCm;
  return randomStep(rng, min, max, gridCm);
}

export function randomSpanCm(rng: Rng): number {
  return randomStep(rng, realisticCm.spanCm.min, realisticCm.spanCm.max, gridCm);
}

export function randomSpreadCm(rng: Rng): number {
  return randomStep(rng, realisticCm.spreadCm.min, realisticCm.spreadCm.max, gridCm);
}

/** A non-zero change of `gridCm` steps, up to `maxCm` either way. */
export function randomNonZeroChangeCm(rng: Rng, maxCm: number): number {
  const steps = randomInt(rng, 1, Math.max(1, Math.floor(maxCm / gridCm)));
  return (chance(rng, 0.5) ? 1 : -1) * steps * gridCm;
}

/** A second length of the same oar type: the same one with probability `sameChance`, otherwise a different one. */
export function randomOtherLengthCm(rng: Rng, oarType: OarType, lengthCm: number, sameChance = 0): number {
  if (chance(rng, sameChance)) return lengthCm;
  for (;;) {
    const other = randomLengthCm(rng, oarType);
    if (other !== lengthCm) return other;
  }
}

/** "scull" or "sweep oar". */
export function oarNoun(oarType: OarType): string {
  return oarType === "sculling" ? "scull" : "sweep oar";
}

/** A partial question with a placeholder id; buildQuiz gives the real id. */
export function question(generator: ComputedGeneratorName, fields: Omit<Question, "id" | "generator">): Question {
  return { id: generator, generator, ...fields };
}
