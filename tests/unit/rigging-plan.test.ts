import { describe, expect, it } from "vitest";

import { planRigChange } from "@/lib/rigging/plan";

describe("planRigChange", () => {
  it("sets the length first, then counts clicks from the inboard after the handle move", () => {
    // Handle out 1 cm: inboard 87 → 88. Target inboard 89: +1 cm from 88, so 2 clicks, not 4.
    const plan = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 287, inboardCm: 87 },
      target: { lengthCm: 288, inboardCm: 89 },
    });
    expect(plan.length).toEqual({ changeCm: 1, action: "lengthen" });
    expect(plan.inboard).toEqual({
      startCm: 88,
      changeCm: 1,
      clicks: 2,
      direction: "towards-blade",
      residualCm: 0,
    });
    expect(plan.warnings).toEqual([]);
  });

  it("a handle move alone can reach the target inboard: no clicks", () => {
    const plan = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 289, inboardCm: 89 },
      target: { lengthCm: 288, inboardCm: 88 },
    });
    expect(plan.length).toEqual({ changeCm: -1, action: "shorten" });
    expect(plan.inboard).toMatchObject({ startCm: 88, clicks: 0, direction: "none", residualCm: 0 });
  });

  it("shortening can turn a longer inboard target into clicks towards the blade", () => {
    // Handle in 2 cm: inboard 88 → 86; target 87.5 needs +1.5 cm: 3 clicks towards the blade.
    const plan = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 290, inboardCm: 88 },
      target: { lengthCm: 288, inboardCm: 87.5 },
    });
    expect(plan.inboard).toMatchObject({ startCm: 86, changeCm: 1.5, clicks: 3, direction: "towards-blade" });
  });

  it("moves the collar towards the handle when the inboard must shrink", () => {
    const plan = planRigChange({
      oarType: "sweep",
      measured: { lengthCm: 374, inboardCm: 117 },
      target: { lengthCm: 374, inboardCm: 116 },
    });
    expect(plan.length.action).toBe("none");
    expect(plan.inboard).toMatchObject({ changeCm: -1, clicks: 2, direction: "towards-handle" });
  });

  it("does nothing when measured equals target", () => {
    const plan = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 288, inboardCm: 88 },
      target: { lengthCm: 288, inboardCm: 88 },
    });
    expect(plan.length).toEqual({ changeCm: 0, action: "none" });
    expect(plan.inboard).toMatchObject({ clicks: 0, direction: "none", residualCm: 0 });
    expect(plan.warnings).toEqual([]);
  });

  it("warns when whole clicks leave a residual", () => {
    const plan = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 288, inboardCm: 87 },
      target: { lengthCm: 288, inboardCm: 88.2 },
    });
    expect(plan.inboard).toMatchObject({ clicks: 2, residualCm: 0.2 });
    expect(plan.warnings).toHaveLength(1);
    expect(plan.warnings[0]).toMatch(/0.2 cm shorter than the target/);
  });

  it("uses the club's click size", () => {
    const plan = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 288, inboardCm: 87 },
      target: { lengthCm: 288, inboardCm: 89 },
      clickCm: 1,
    });
    expect(plan.inboard.clicks).toBe(2);
  });

  it('describes the sculling target: L 288, I 88, span 159 (FISA 2006 protocol; Wikipedia "Boat rigging (sport rowing)"; Kleshnev 2006)', () => {
    const plan = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 287, inboardCm: 88 },
      target: { lengthCm: 288, inboardCm: 88 },
      spanCm: 159,
    });
    expect(plan.outboardCm).toBe(200); // FISA 2006 protocol
    expect(plan.leverRatio).toBe(2.273); // V. Kleshnev, Rowing Biomechanics Newsletter, 2006
    expect(plan.spanGearing).toBe(2.516); // Wikipedia "Boat rigging (sport rowing)", Gearing section
    expect(plan.overlapCm).toBe(21); // FISA 2006 World Championships Rigging Survey, measurement protocol
    expect(plan.simpleOverlapCm).toBe(17); // simple overlap: common practice, no source
  });

  it("describes the sweep target: L 374, I 116, spread 85 (FISA 2006 protocol; Wikipedia as above; Kleshnev 2006)", () => {
    const plan = planRigChange({
      oarType: "sweep",
      measured: { lengthCm: 374, inboardCm: 116 },
      target: { lengthCm: 374, inboardCm: 116 },
      spreadCm: 85,
    });
    expect(plan.outboardCm).toBe(258); // FISA 2006 protocol
    expect(plan.spanGearing).toBe(3.035); // FISA 2006 protocol; Wikipedia "Boat rigging (sport rowing)"
    expect(plan.leverRatio).toBe(2.224); // V. Kleshnev, Rowing Biomechanics Newsletter, 2006
    expect(plan.overlapCm).toBe(33); // FISA 2006 World Championships Rigging Survey, measurement protocol
    expect(plan.simpleOverlapCm).toBe(31); // common practice, no source
  });

  it("uses the club's half swivel width for the overlap", () => {
    const plan = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 288, inboardCm: 88 },
      target: { lengthCm: 288, inboardCm: 88 },
      spanCm: 159,
      halfSwivelCm: 2.5,
    });
    expect(plan.overlapCm).toBe(22);
  });

  it("leaves out gearing and overlap without a span or spread", () => {
    const plan = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 288, inboardCm: 88 },
      target: { lengthCm: 288, inboardCm: 88 },
    });
    expect(plan).not.toHaveProperty("spanGearing");
    expect(plan).not.toHaveProperty("overlapCm");
  });

  it("warns about a span given for a sweep oar and ignores it", () => {
    const plan = planRigChange({
      oarType: "sweep",
      measured: { lengthCm: 374, inboardCm: 116 },
      target: { lengthCm: 374, inboardCm: 116 },
      spanCm: 159,
    });
    expect(plan.spanGearing).toBeUndefined();
    expect(plan.warnings).toEqual([expect.stringMatching(/span was given for a sweep oar/)]);
  });

  it("warns about a spread given for a scull and ignores it", () => {
    const plan = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 288, inboardCm: 88 },
      target: { lengthCm: 288, inboardCm: 88 },
      spreadCm: 85,
    });
    expect(plan.overlapCm).toBeUndefined();
    expect(plan.warnings).toEqual([expect.stringMatching(/spread was given for a scull/)]);
  });

  it("warns when the target is outside the limits (default club limits: common practice, no source)", () => {
    const plan = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 288, inboardCm: 88 },
      target: { lengthCm: 294, inboardCm: 88 },
    });
    expect(plan.warnings.some((w) => /above your club's range/.test(w) && w.endsWith("ask your coach before going afloat."))).toBe(true);
  });

  it("checks the target against the limits it is given, including a minimum overlap (Woodgate 1888, p. 136: 10.16 cm)", () => {
    const plan = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 288, inboardCm: 84 },
      target: { lengthCm: 288, inboardCm: 84 },
      spanCm: 161,
      limits: { minLengthCm: 280, maxLengthCm: 292, minInboardCm: 80, maxInboardCm: 91, minOverlapCm: 10.16 },
    });
    expect(plan.overlapCm).toBe(11);
    expect(plan.warnings).toEqual([]);
    const tight = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 288, inboardCm: 82.5 },
      target: { lengthCm: 288, inboardCm: 82.5 },
      spanCm: 161,
      limits: { minLengthCm: 280, maxLengthCm: 292, minInboardCm: 80, maxInboardCm: 91, minOverlapCm: 10.16 },
    });
    expect(tight.overlapCm).toBe(8);
    expect(tight.warnings).toEqual([expect.stringMatching(/minimum of 10.16 cm/)]);
  });

  it("refuses an inboard longer than the oar", () => {
    expect(() =>
      planRigChange({
        oarType: "sculling",
        measured: { lengthCm: 88, inboardCm: 89 },
        target: { lengthCm: 288, inboardCm: 88 },
      }),
    ).toThrow(RangeError);
  });
});
