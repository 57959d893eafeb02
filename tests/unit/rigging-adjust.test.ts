import { describe, expect, it } from "vitest";

import { defaultClickCm, inboardAfterLengthChangeCm, inboardClicks, lengthChange } from "@/lib/rigging/adjust";

describe("lengthChange", () => {
  it("lengthens when the target is longer", () => {
    expect(lengthChange(287.5, 288.5)).toEqual({ changeCm: 1, action: "lengthen" });
  });

  it("shortens when the target is shorter, with a negative change", () => {
    expect(lengthChange(289, 288)).toEqual({ changeCm: -1, action: "shorten" });
  });

  it("does nothing when they match, and never reports -0", () => {
    const result = lengthChange(288, 288);
    expect(result.action).toBe("none");
    expect(Object.is(result.changeCm, 0)).toBe(true);
  });

  it("rounds to 0.1 cm without float noise", () => {
    expect(lengthChange(287.3, 288.1).changeCm).toBe(0.8);
    expect(lengthChange(288.1, 287.3).changeCm).toBe(-0.8);
    expect(lengthChange(288, 288.04)).toEqual({ changeCm: 0, action: "none" });
  });

  it("refuses non-positive lengths", () => {
    expect(() => lengthChange(0, 288)).toThrow(RangeError);
  });
});

describe("inboardClicks", () => {
  it("uses 0.5 cm a click by default (common practice, no source)", () => {
    expect(defaultClickCm).toBe(0.5);
  });

  it("87 → 89 cm is 4 clicks towards the blade (more inboard)", () => {
    expect(inboardClicks(87, 89)).toEqual({
      changeCm: 2,
      clicks: 4,
      direction: "towards-blade",
      residualCm: 0,
    });
  });

  it("89 → 88 cm is 2 clicks towards the handle (less inboard)", () => {
    expect(inboardClicks(89, 88)).toEqual({
      changeCm: -1,
      clicks: 2,
      direction: "towards-handle",
      residualCm: 0,
    });
  });

  it("no change is no clicks and no direction", () => {
    const result = inboardClicks(88, 88);
    expect(result).toEqual({ changeCm: 0, clicks: 0, direction: "none", residualCm: 0 });
    expect(Object.is(result.residualCm, 0)).toBe(true);
  });

  it("takes the nearest whole click and reports the signed residual", () => {
    // +1.3 cm: 2.6 clicks → 3 clicks (1.5 cm); the inboard ends 0.2 cm longer than the target.
    expect(inboardClicks(87, 88.3)).toEqual({
      changeCm: 1.3,
      clicks: 3,
      direction: "towards-blade",
      residualCm: -0.2,
    });
    // +1.2 cm: 2.4 clicks → 2 clicks (1 cm); the inboard ends 0.2 cm shorter than the target.
    expect(inboardClicks(87, 88.2)).toEqual({
      changeCm: 1.2,
      clicks: 2,
      direction: "towards-blade",
      residualCm: 0.2,
    });
    // −0.7 cm: 1.4 clicks → 1 click towards the handle; the inboard ends 0.2 cm longer than the target.
    expect(inboardClicks(88, 87.3)).toEqual({
      changeCm: -0.7,
      clicks: 1,
      direction: "towards-handle",
      residualCm: -0.2,
    });
  });

  it("a change smaller than half a click leaves the collar and reports the whole change as residual", () => {
    expect(inboardClicks(88, 88.2)).toEqual({ changeCm: 0.2, clicks: 0, direction: "none", residualCm: 0.2 });
  });

  it("a 0.3 cm residual with 1 cm clicks", () => {
    expect(inboardClicks(86, 87.3, 1)).toEqual({
      changeCm: 1.3,
      clicks: 1,
      direction: "towards-blade",
      residualCm: 0.3,
    });
  });

  it("rounds an exact half click up (away from zero)", () => {
    expect(inboardClicks(88, 88.1, 0.2).clicks).toBe(1);
    expect(inboardClicks(88.1, 88, 0.2)).toMatchObject({
      clicks: 1,
      direction: "towards-handle",
      residualCm: 0.1,
    });
  });

  it("counts clicks finer than a millimetre from the exact change", () => {
    expect(inboardClicks(87, 87.75, 0.25)).toMatchObject({ clicks: 3, residualCm: 0 });
    expect(inboardClicks(87, 87.9, 0.3)).toMatchObject({ clicks: 3, residualCm: 0 });
  });

  it("refuses a zero click", () => {
    expect(() => inboardClicks(87, 88, 0)).toThrow(RangeError);
  });
});

describe("inboardAfterLengthChangeCm", () => {
  it("lengthening by 1 cm (handle out) grows the inboard by 1 cm", () => {
    expect(inboardAfterLengthChangeCm(88, 1)).toBe(89);
  });

  it("shortening by 1.5 cm (handle in) shrinks the inboard by 1.5 cm", () => {
    expect(inboardAfterLengthChangeCm(88, -1.5)).toBe(86.5);
  });

  it("no move, no change; no float noise", () => {
    expect(inboardAfterLengthChangeCm(88, 0)).toBe(88);
    expect(inboardAfterLengthChangeCm(88.1, 0.2)).toBe(88.3);
  });

  it("refuses a move that would leave no inboard", () => {
    expect(() => inboardAfterLengthChangeCm(10, -10)).toThrow(RangeError);
  });
});
