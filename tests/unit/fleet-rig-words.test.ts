import { describe, expect, it } from "vitest";

import { goingAfloatCautions, planSteps, planSummary, type PlanContext } from "@/components/rig/plan-steps";
import { describeOarSetInBoat, describeRigWidth } from "@/lib/fleet/describe";
import { computeRigPlan, toRigPlanResponse } from "@/lib/fleet/plan-response";
import { boatWarnings, oarSetWarnings } from "@/lib/fleet/warnings";
import { defaultClubOarLimits } from "@/lib/rigging/limits";
import { planRigChange } from "@/lib/rigging/plan";
import { rigPlanRouteSchema } from "@/lib/validations/rig-plans";

const limits = defaultClubOarLimits;

describe("boatWarnings (usual span 157–161 and spread 81–88: row2k, 'Rowing 101 – Basic Rigging')", () => {
  it("is quiet inside the usual range and warns outside it", () => {
    expect(boatWarnings({ boatClass: "2x", spanCm: 159 })).toEqual([]);
    expect(boatWarnings({ boatClass: "2x", spanCm: 161 })).toEqual([]);
    expect(boatWarnings({ boatClass: "2x", spanCm: 162 })).toEqual([
      expect.stringContaining("span of 162 cm is outside the usual 157–161 cm"),
    ]);
    expect(boatWarnings({ boatClass: "8+", spreadCm: 80 })).toEqual([
      expect.stringContaining("spread of 80 cm is outside the usual 81–88 cm"),
    ]);
    expect(boatWarnings({ boatClass: "8+", spreadCm: Number.NaN })).toEqual([]);
  });

  it("warns when a linked set would give no overlap (FISA 2006 protocol overlap)", () => {
    // Sweep: 60 + 2 − 84 < 0.
    expect(boatWarnings({ boatClass: "2-", spreadCm: 84 }, [{ name: "Short", oarType: "sweep", targetInboardCm: 60 }])).toEqual([
      expect.stringContaining('"Short"'),
    ]);
    expect(boatWarnings({ boatClass: "2-", spreadCm: 84 }, [{ name: "Eight sweeps", oarType: "sweep", targetInboardCm: 116 }])).toEqual([]);
  });
});

describe("oarSetWarnings (default club limits: common practice, no source)", () => {
  it("warns outside the club's limits, not at their ends", () => {
    expect(oarSetWarnings({ oarType: "sculling", targetLengthCm: 292, targetInboardCm: 85 }, limits)).toEqual([]);
    expect(oarSetWarnings({ oarType: "sculling", targetLengthCm: 293, targetInboardCm: 88 }, limits)).toEqual([
      "The overall length of 293 cm is above your club's range for sculls (280–292 cm): ask your coach before going afloat.",
    ]);
    expect(oarSetWarnings({ oarType: "sweep", targetLengthCm: 374, targetInboardCm: 111 }, limits)).toEqual([
      expect.stringContaining("inboard of 111 cm is below your club's range for sweep oars"),
    ]);
  });

  it("warns about an odd number of sculls only", () => {
    expect(oarSetWarnings({ oarType: "sculling", oarCount: 3, targetLengthCm: 288, targetInboardCm: 88 }, limits)).toEqual([
      expect.stringContaining("Sculls are used in pairs"),
    ]);
    expect(oarSetWarnings({ oarType: "sweep", oarCount: 3, targetLengthCm: 374, targetInboardCm: 116 }, limits)).toEqual([]);
  });
});

describe("the plan route's answer", () => {
  it("keeps exactly the documented fields", () => {
    const plan = planRigChange({
      oarType: "sculling",
      measured: { lengthCm: 287, inboardCm: 87 },
      target: { lengthCm: 288, inboardCm: 89 },
    });
    expect(Object.keys(toRigPlanResponse(plan)).sort()).toEqual(["inboard", "length", "leverRatio", "outboardCm", "warnings"]);
    expect(Object.keys(toRigPlanResponse(plan).inboard).sort()).toEqual(["changeCm", "clicks", "direction", "residualCm"]);
  });

  it("uses the club's limits for the oar type", () => {
    const request = rigPlanRouteSchema.parse({
      oarType: "sculling",
      measured: { lengthCm: 290, inboardCm: 88 },
      target: { lengthCm: 293, inboardCm: 88 },
    });
    expect(computeRigPlan(request, limits).warnings).toHaveLength(1);
    const wide = { ...limits, sculling: { ...limits.sculling, maxLengthCm: 295 } };
    expect(computeRigPlan(request, wide).warnings).toEqual([]);
  });
});

const scullContext: PlanContext = {
  oarType: "sculling",
  measured: { lengthCm: 287, inboardCm: 87 },
  target: { lengthCm: 288, inboardCm: 89 },
  clickCm: 0.5,
  handleMechanism: "clamped-slide",
  spanCm: 159,
  halfSwivelCm: 2,
};

/** The plan request a context stands for (the handle mechanism only changes the words). */
function requestOf(context: PlanContext) {
  const { oarType, measured, target, clickCm, spanCm, spreadCm, halfSwivelCm } = context;
  return rigPlanRouteSchema.parse({ oarType, measured, target, clickCm, spanCm, spreadCm, halfSwivelCm });
}

describe("planSteps", () => {
  it("puts the handle first, then the clicks from the new inboard, the result and the overlap", () => {
    const plan = computeRigPlan(requestOf(scullContext), limits);
    const steps = planSteps(plan, scullContext);
    expect(steps.map((step) => step.key)).toEqual(["handle", "collar", "result", "check"]);
    expect(steps[0]!.lines).toEqual([
      "Lengthen the oar by 1 cm: move the handle 1 cm out of the shaft.",
      "Loosen the handle's clamp screws, slide the handle 1 cm out, and tighten the screws again.",
      "Measure from the blade tip to the end of the handle: it should read 288 cm.",
      "The collar has not moved, so the inboard now reads 88 cm (it was 87 cm).",
    ]);
    expect(steps[1]!.lines[0]).toBe("Move the collar 2 clicks towards the blade.");
    expect(steps[2]!.lines[1]).toContain("Inboard 89 cm");
    // L 288, I 89, span 159: overlap 2 × (89 + 2) − 159 = 23, simple 19 (FISA 2006 protocol).
    expect(steps[3]!.lines[0]).toBe("Overlap of the handles: 23 cm with this boat's span of 159 cm.");
    expect(steps[3]!.lines[1]).toContain("measurement-protocol convention");
    expect(steps[3]!.lines[1]).toContain("it is 19 cm");
    expect(planSummary(plan)).toBe("Handle out 1 cm, then collar 2 clicks towards the blade.");
  });

  it("words a sweep change with an end screw and the spread check (L 374, I 116, spread 85: FISA 2006 protocol)", () => {
    const context: PlanContext = {
      oarType: "sweep",
      measured: { lengthCm: 376, inboardCm: 118 },
      target: { lengthCm: 374, inboardCm: 116 },
      clickCm: 0.5,
      handleMechanism: "end-screw",
      spreadCm: 85,
      halfSwivelCm: 2,
    };
    const plan = computeRigPlan(requestOf(context), limits);
    const [handle, collar, result, check] = planSteps(plan, context);
    expect(handle!.lines[0]).toBe("Shorten the oar by 2 cm: move the handle 2 cm into the shaft.");
    expect(handle!.lines[1]).toContain("Turn the screw in the end of the handle");
    expect(collar!.lines[0]).toBe("No clicks: the inboard is already on the target.");
    expect(result!.lines[2]).toBe("Outboard 258 cm (overall length − inboard); lever ratio 2.224.");
    expect(check!.lines[0]).toContain("33 cm past the boat's centre line");
    expect(check!.lines[1]).toContain("it is 31 cm");
    expect(check!.lines[2]).toBe("Span gearing 3.035 (outboard ÷ spread).");
    expect(goingAfloatCautions.join(" ")).toContain("before going afloat");
  });

  it("says how far whole clicks fall short", () => {
    const context: PlanContext = { ...scullContext, target: { lengthCm: 288, inboardCm: 88.8 } };
    const plan = computeRigPlan(requestOf(context), limits);
    const result = planSteps(plan, context)[2]!;
    expect(result.lines[1]).toContain("Inboard 89 cm");
    expect(result.lines[3]).toBe("The target inboard is 88.8 cm; whole clicks get as close as they can.");
  });
});

describe("describeOarSetInBoat", () => {
  it("gives the settings in plain words with the protocol overlap named (L 288, I 88, span 159: FISA 2006 protocol; Kleshnev 2006)", () => {
    const described = describeOarSetInBoat(
      { boatClass: "2x", spanCm: 159, spreadCm: null },
      {
        name: "Green-band sculls",
        oarType: "sculling",
        oarCount: 8,
        targetLengthCm: 288,
        targetInboardCm: 88,
        clickCm: 0.5,
        handleMechanism: "clamped-slide",
      },
      2,
      limits,
    );
    expect(described.lines[0]).toBe("8 sculls. Set each to an overall length of 288 cm and an inboard of 88 cm.");
    expect(described.lines[1]).toBe("Outboard 200 cm; lever ratio (outboard ÷ inboard) 2.273.");
    expect(described.lines[3]).toMatch(
      /^Overlap 21 cm by the measurement-protocol convention.*half swivel width of 2 cm; 17 cm without the swivel term.*Span gearing 2\.516\.$/,
    );
    expect(described.warnings).toEqual([]);
    expect(describeRigWidth({ boatClass: "2x", spanCm: 159, spreadCm: null })).toBe(
      "Span: 159 cm, the distance between the centres of the two pins.",
    );
    expect(describeRigWidth({ boatClass: "8+", spanCm: null, spreadCm: 84 })).toBe(
      "Spread: 84 cm, from the boat's centre line to the centre of the pin.",
    );
  });
});
