import seedrandom from "seedrandom";

import { roundTo } from "@/lib/rigging/round";
import type { Rng } from "@/lib/quiz/types";

/** A repeatable random source: the same seed always gives the same sequence. */
export function createRng(seed: string): Rng {
  const prng = seedrandom(seed);
  return () => prng();
}

/** A whole number from min to max, both included. */
export function randomInt(rng: Rng, min: number, max: number): number {
  if (!Number.isInteger(min) || !Number.isInteger(max) || max < min) {
    throw new RangeError(`randomInt needs whole numbers min ≤ max, got ${min} and ${max}`);
  }
  return min + Math.floor(rng() * (max - min + 1));
}

/** A value from min to max (both included) on a grid of `step`, e.g. 284, 284.5, … 292. */
export function randomStep(rng: Rng, min: number, max: number, step: number): number {
  if (!(step > 0) || max < min) throw new RangeError(`randomStep needs step > 0 and min ≤ max`);
  const steps = Math.floor(roundTo((max - min) / step, 6));
  return roundTo(min + randomInt(rng, 0, steps) * step, 4);
}

/** True with probability p. */
export function chance(rng: Rng, p: number): boolean {
  return rng() < p;
}

/** One item of a non-empty list. */
export function pick<T>(rng: Rng, items: readonly T[]): T {
  const item = items[randomInt(rng, 0, items.length - 1)];
  if (item === undefined) throw new RangeError("pick needs a non-empty list");
  return item;
}

/** A shuffled copy (Fisher–Yates); the input is left alone. */
export function shuffle<T>(rng: Rng, items: readonly T[]): T[] {
  const copy = [...items];
  for (let i = copy.length - 1; i > 0; i -= 1) {
    const j = randomInt(rng, 0, i);
    const a = copy[i] as T;
    copy[i] = copy[j] as T;
    copy[j] = a;
  }
  return copy;
}
