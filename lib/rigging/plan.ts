import { defaultClickCm, inboardAfterLengthChangeCm, inboardClicks, lengthChange } from "@/lib/rigging/adjust";
import type { InboardClicks, LengthChange } from "@/lib/rigging/adjust";
import { assertInboardShorter } from "@/lib/rigging/assert";
import { defaultHalfSwivelCm, leverRatio, outboardCm, overlapCm, simpleOverlapCm, spanGearing } from "@/lib/rigging/geometry";
import { askCoachSuffix, checkLimits, checkOverlap, defaultClubOarLimits } from "@/lib/rigging/limits";
import type { OarLimits } from "@/lib/rigging/limits";
import { roundTo } from "@/lib/rigging/round";
import type { OarSettings, OarType } from "@/lib/rigging/types";

export interface RigPlanInput {
  oarType: OarType;
  measured: OarSettings;
  target: OarSettings;
  /** Collar travel a click; default 0.5 cm (common practice). */
  clickCm?: number;
  /** Sculling only: distance between the pin centres. */
  spanCm?: number;
  /** Sweep only: boat centre line to pin centre. */
  spreadCm?: number;
  /** Half swivel width for the protocol overlap; default 2 cm (FISA 2006 protocol). */
  halfSwivelCm?: number;
  /** Limits for this oar type; default the club defaults for the oar type. */
  limits?: OarLimits;
}

export interface RigPlan {
  /** Step 1: move the handle. */
  length: LengthChange;
  /** Step 2: move the collar, counted from the inboard after step 1. */
  inboard: InboardClicks & {
    /** The inboard after the handle move, where the collar step starts. */
    startCm: number;
  };
  /** Outboard of the target settings. */
  outboardCm: number;
  /** Lever ratio of the target settings, 3 decimals. */
  leverRatio: number;
  /** Span gearing of the target settings, 3 decimals; only with a span (sculling) or spread (sweep). */
  spanGearing?: number;
  /** Protocol overlap of the target settings, 0.1 cm; only with a span (sculling) or spread (sweep). */
  overlapCm?: number;
  /** Simple overlap (no swivel term) of the target settings, 0.1 cm; alongside overlapCm. */
  simpleOverlapCm?: number;
  warnings: string[];
}

/**
 * Plans a rig change: length first (moving the handle also moves the handle end, so it changes the
 * inboard), then collar clicks from the inboard after the handle move; figures describe the target.
 */
export function planRigChange(input: RigPlanInput): RigPlan {
  const { oarType, measured, target } = input;
  const clickCm = input.clickCm ?? defaultClickCm;
  const halfSwivelCm = input.halfSwivelCm ?? defaultHalfSwivelCm;
  const limits = input.limits ?? defaultClubOarLimits[oarType];
  assertInboardShorter(measured.lengthCm, measured.inboardCm);
  assertInboardShorter(target.lengthCm, target.inboardCm);

  const warnings: string[] = [];
  const length = lengthChange(measured.lengthCm, target.lengthCm);
  const startCm = inboardAfterLengthChangeCm(measured.inboardCm, length.changeCm);
  const inboard = { ...inboardClicks(startCm, target.inboardCm, clickCm), startCm };

  if (inboard.residualCm !== 0) {
    const side = inboard.residualCm > 0 ? "shorter" : "longer";
    warnings.push(
      `Whole clicks of ${roundTo(clickCm, 2)} cm leave the inboard ${Math.abs(inboard.residualCm)} cm ${side} than the target; ` +
        `check with your coach which click to use.`,
    );
  }
  warnings.push(...checkLimits(oarType, target, limits));

  const plan: RigPlan = {
    length,
    inboard,
    outboardCm: roundTo(outboardCm(target.lengthCm, target.inboardCm), 1),
    leverRatio: roundTo(leverRatio(target.lengthCm, target.inboardCm), 3),
    warnings,
  };

  const spanOrSpreadCm = oarType === "sculling" ? input.spanCm : input.spreadCm;
  if (oarType === "sweep" && input.spanCm !== undefined) {
    warnings.push("A span was given for a sweep oar; sweep boats are set by spread, so the span was ignored.");
  }
  if (oarType === "sculling" && input.spreadCm !== undefined) {
    warnings.push("A spread was given for a scull; sculling boats are set by span, so the spread was ignored.");
  }
  if (spanOrSpreadCm !== undefined) {
    plan.spanGearing = roundTo(spanGearing(oarType, target.lengthCm, target.inboardCm, spanOrSpreadCm), 3);
    plan.overlapCm = roundTo(overlapCm(oarType, target.inboardCm, spanOrSpreadCm, halfSwivelCm), 1);
    plan.simpleOverlapCm = roundTo(simpleOverlapCm(oarType, target.inboardCm, spanOrSpreadCm), 1);
    if (plan.overlapCm <= 0) {
      warnings.push(
        oarType === "sculling"
          ? `With this span the handles would not overlap at all: ${askCoachSuffix}.`
          : `With this spread the handle would not reach past the boat's centre line: ${askCoachSuffix}.`,
      );
    } else {
      const overlapWarning = checkOverlap(plan.overlapCm, limits);
      if (overlapWarning !== null) warnings.push(overlapWarning);
    }
  }
  return plan;
}
