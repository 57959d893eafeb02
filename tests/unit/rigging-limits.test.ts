import { describe, expect, it } from "vitest";

import { checkLimits, checkOverlap, defaultClubOarLimits, limitsFor } from "@/lib/rigging/limits";
import type { OarLimits } from "@/lib/rigging/limits";

describe("defaultClubOarLimits (common practice, no source)", () => {
  it("sculls 280–292 cm with inboard 85–91 cm; sweep 366–380 cm with inboard 112–120 cm", () => {
    expect(defaultClubOarLimits.sculling).toEqual({
      minLengthCm: 280,
      maxLengthCm: 292,
      minInboardCm: 85,
      maxInboardCm: 91,
    });
    expect(defaultClubOarLimits.sweep).toEqual({
      minLengthCm: 366,
      maxLengthCm: 380,
      minInboardCm: 112,
      maxInboardCm: 120,
    });
  });

  it("hold the worked check settings (FISA 2006 protocol: L 288 / I 88 and L 374 / I 116)", () => {
    expect(checkLimits("sculling", { lengthCm: 288, inboardCm: 88 }, defaultClubOarLimits)).toEqual([]);
    expect(checkLimits("sweep", { lengthCm: 374, inboardCm: 116 }, defaultClubOarLimits)).toEqual([]);
  });

  it("hold the typical ranges (from memory: sculls 284–290 / 86–89, sweep 370–376 / 114–117)", () => {
    for (const [lengthCm, inboardCm] of [
      [284, 86],
      [290, 89],
    ] as const) {
      expect(checkLimits("sculling", { lengthCm, inboardCm })).toEqual([]);
    }
    for (const [lengthCm, inboardCm] of [
      [370, 114],
      [376, 117],
    ] as const) {
      expect(checkLimits("sweep", { lengthCm, inboardCm })).toEqual([]);
    }
  });
});

describe("checkLimits", () => {
  it("allows both ends of each range", () => {
    expect(checkLimits("sculling", { lengthCm: 280, inboardCm: 91 })).toEqual([]);
    expect(checkLimits("sculling", { lengthCm: 292, inboardCm: 85 })).toEqual([]);
  });

  it("warns about a length above the range in plain words ending with the coach advice", () => {
    const warnings = checkLimits("sculling", { lengthCm: 293, inboardCm: 88 });
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toMatch(/overall length of 293 cm is above/);
    expect(warnings[0]).toMatch(/ask your coach before going afloat\.$/);
  });

  it("warns about each setting outside the range", () => {
    const warnings = checkLimits("sweep", { lengthCm: 365.5, inboardCm: 121 });
    expect(warnings).toHaveLength(2);
    expect(warnings[0]).toMatch(/overall length of 365.5 cm is below your club's range for sweep oars \(366–380 cm\)/);
    expect(warnings[1]).toMatch(/inboard of 121 cm is above/);
    for (const warning of warnings) expect(warning.endsWith("ask your coach before going afloat.")).toBe(true);
  });

  it("accepts one type's limits as well as a club's", () => {
    const own: OarLimits = { minLengthCm: 286, maxLengthCm: 290, minInboardCm: 87, maxInboardCm: 89 };
    expect(checkLimits("sculling", { lengthCm: 291, inboardCm: 88 }, own)).toHaveLength(1);
    expect(limitsFor("sweep", defaultClubOarLimits)).toBe(defaultClubOarLimits.sweep);
    expect(limitsFor("sweep", own)).toBe(own);
  });
});

describe("checkOverlap", () => {
  const woodgate: OarLimits = {
    ...defaultClubOarLimits.sculling,
    // "at least four inches" = 10.16 cm (W. B. Woodgate, Boating, Badminton Library, 1888, p. 136)
    minOverlapCm: 10.16,
  };

  it("warns below Woodgate's minimum overlap of 10.16 cm (W. B. Woodgate, Boating, Badminton Library, 1888, p. 136)", () => {
    expect(checkOverlap(8, woodgate)).toMatch(/less than your club's minimum of 10.16 cm: ask your coach before going afloat\.$/);
    expect(checkOverlap(10.16, woodgate)).toBeNull();
    expect(checkOverlap(21, woodgate)).toBeNull();
  });

  it("says nothing when the club sets no minimum", () => {
    expect(checkOverlap(-5, defaultClubOarLimits.sculling)).toBeNull();
  });
});
