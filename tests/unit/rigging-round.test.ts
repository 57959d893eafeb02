import { describe, expect, it } from "vitest";

import { roundCm, roundTo } from "@/lib/rigging/round";

describe("roundTo", () => {
  it("strips float noise", () => {
    expect(0.1 + 0.2).not.toBe(0.3);
    expect(roundTo(0.1 + 0.2, 1)).toBe(0.3);
    expect(roundTo(1.005, 2)).toBe(1.01);
    expect(roundTo(287.3 - 88.1, 2)).toBe(199.2);
  });

  it("rounds halves away from zero on both sides", () => {
    expect(roundTo(0.25, 1)).toBe(0.3);
    expect(roundTo(-0.25, 1)).toBe(-0.3);
    expect(roundTo(2.5, 0)).toBe(3);
    expect(roundTo(-2.5, 0)).toBe(-3);
  });

  it("never returns -0", () => {
    expect(Object.is(roundTo(-0.04, 1), 0)).toBe(true);
    expect(Object.is(roundTo(-0, 2), 0)).toBe(true);
  });

  it("keeps three decimals for ratios", () => {
    expect(roundTo(200 / 79.5, 3)).toBe(2.516);
    expect(roundTo(200 / 88, 3)).toBe(2.273);
  });

  it("returns non-finite values unchanged and refuses bad decimals", () => {
    expect(Number.isNaN(roundTo(Number.NaN, 1))).toBe(true);
    expect(roundTo(Number.POSITIVE_INFINITY, 1)).toBe(Number.POSITIVE_INFINITY);
    expect(() => roundTo(1, -1)).toThrow(RangeError);
    expect(() => roundTo(1, 1.5)).toThrow(RangeError);
  });

  it("roundCm keeps a tenth of a millimetre", () => {
    expect(roundCm(88.123)).toBe(88.12);
  });
});
