import { assertFiniteCm, assertPositiveCm } from "@/lib/rigging/assert";
import { roundCm, roundTo } from "@/lib/rigging/round";
import type { CollarDirection, LengthAction } from "@/lib/rigging/types";

/** Collar travel a click on common adjustable collars (common practice); clubs may differ. */
export const defaultClickCm = 0.5;

export interface LengthChange {
  /** Target − measured, to 0.1 cm: positive lengthens (handle out), negative shortens (handle in). */
  changeCm: number;
  action: LengthAction;
}

export interface InboardClicks {
  /** Target − current inboard, to 0.1 cm: positive means the inboard must grow. */
  changeCm: number;
  /** Whole clicks to move the collar, the nearest whole number (halves round up). */
  clicks: number;
  /** Collar direction: towards the blade lengthens the inboard, towards the handle shortens it. */
  direction: CollarDirection;
  /**
   * What whole clicks cannot reach: target − reached inboard, to 0.1 cm. Positive: the inboard ends
   * shorter than the target; negative: longer.
   */
  residualCm: number;
}

/** Length change = target − measured (0.1 cm); positive lengthens, negative shortens. */
export function lengthChange(measuredLengthCm: number, targetLengthCm: number): LengthChange {
  assertPositiveCm("measuredLengthCm", measuredLengthCm);
  assertPositiveCm("targetLengthCm", targetLengthCm);
  const changeCm = roundTo(targetLengthCm - measuredLengthCm, 1);
  const action: LengthAction = changeCm > 0 ? "lengthen" : changeCm < 0 ? "shorten" : "none";
  return { changeCm, action };
}

/**
 * Collar clicks from the current to the target inboard: the nearest whole number of clicks of `clickCm`;
 * the collar moves towards the blade to lengthen the inboard, towards the handle to shorten it; the
 * residual is the part of the change that whole clicks cannot reach.
 */
export function inboardClicks(currentInboardCm: number, targetInboardCm: number, clickCm: number = defaultClickCm): InboardClicks {
  assertPositiveCm("currentInboardCm", currentInboardCm);
  assertPositiveCm("targetInboardCm", targetInboardCm);
  assertPositiveCm("clickCm", clickCm);
  // Clicks come from the exact difference (noise stripped), so clicks finer than 1 mm still add up.
  const exactChangeCm = roundCm(targetInboardCm - currentInboardCm);
  const clicks = roundTo(Math.abs(exactChangeCm) / clickCm, 0);
  const direction: CollarDirection = clicks === 0 ? "none" : exactChangeCm > 0 ? "towards-blade" : "towards-handle";
  const reachedCm = Math.sign(exactChangeCm) * clicks * clickCm;
  return {
    changeCm: roundTo(exactChangeCm, 1),
    clicks,
    direction,
    residualCm: roundTo(exactChangeCm - reachedCm, 1),
  };
}

/**
 * Inboard after moving the handle by `lengthChangeCm`: the collar stays put on the shaft, so sliding the
 * handle out by d (lengthening) takes the handle end d further from the collar and the inboard grows by d.
 */
export function inboardAfterLengthChangeCm(measuredInboardCm: number, lengthChangeCm: number): number {
  assertPositiveCm("measuredInboardCm", measuredInboardCm);
  assertFiniteCm("lengthChangeCm", lengthChangeCm);
  const inboardCm = roundCm(measuredInboardCm + lengthChangeCm);
  if (inboardCm <= 0) {
    throw new RangeError(`a ${lengthChangeCm} cm handle move leaves no inboard (${inboardCm} cm)`);
  }
  return inboardCm;
}
