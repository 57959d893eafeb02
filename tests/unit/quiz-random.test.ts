import { describe, expect, it } from "vitest";

import { chance, createRng, pick, randomInt, randomStep, shuffle } from "@/lib/quiz/random";

describe("seeded randomness", () => {
  it("repeats for the same seed and differs for another", () => {
    const a = createRng("seed-a");
    const b = createRng("seed-a");
    const c = createRng("seed-c");
    const seqA = Array.from({ length: 5 }, () => a());
    expect(Array.from({ length: 5 }, () => b())).toEqual(seqA);
    expect(Array.from({ length: 5 }, () => c())).not.toEqual(seqA);
    for (const value of seqA) {
      expect(value).toBeGreaterThanOrEqual(0);
      expect(value).toBeLessThan(1);
    }
  });

  it("randomInt covers both ends and nothing else", () => {
    const rng = createRng("ints");
    const seen = new Set(Array.from({ length: 500 }, () => randomInt(rng, 1, 4)));
    expect([...seen].sort()).toEqual([1, 2, 3, 4]);
    expect(() => randomInt(rng, 3, 2)).toThrow(RangeError);
  });

  it("randomStep stays on the grid without float noise", () => {
    const rng = createRng("steps");
    const values = Array.from({ length: 500 }, () => randomStep(rng, 284, 292, 0.5));
    expect(new Set(values).size).toBe(17);
    for (const value of values) expect((value * 2) % 1).toBe(0);
    const tenths = Array.from({ length: 200 }, () => randomStep(rng, 0.1, 0.3, 0.1));
    expect([...new Set(tenths)].sort()).toEqual([0.1, 0.2, 0.3]);
  });

  it("shuffle returns a permutation and leaves the input alone", () => {
    const items = ["a", "b", "c", "d", "e"];
    const shuffled = shuffle(createRng("shuffle"), items);
    expect([...shuffled].sort()).toEqual(items);
    expect(items).toEqual(["a", "b", "c", "d", "e"]);
    const orders = new Set(Array.from({ length: 50 }, (_, i) => shuffle(createRng(`s${i}`), items).join("")));
    expect(orders.size).toBeGreaterThan(20);
  });

  it("pick and chance", () => {
    const rng = createRng("pick");
    expect(["x", "y"]).toContain(pick(rng, ["x", "y"]));
    expect(() => pick(rng, [])).toThrow(RangeError);
    expect(chance(rng, 0)).toBe(false);
    expect(chance(rng, 1)).toBe(true);
  });
});
