import { assertFiniteCm, assertInboardShorter, assertNonNegativeCm, assertPositiveCm } from "@/lib/rigging/assert";
import { roundCm } from "@/lib/rigging/round";
import type { OarType } from "@/lib/rigging/types";

/**
 * Half the width of the swivel, added to the inboard by the FISA 2006 World Championships Rigging
 * Survey measurement protocol ("normally 2 cm"). Clubs can change it in their settings.
 */
export const defaultHalfSwivelCm = 2;

/**
 * Default sculling overlap (protocol convention) used when suggesting an inboard: 21 cm is the protocol
 * overlap of span 159 cm with inboard 88 cm and half swivel 2 cm, a mid-range setting (span 157–161 cm
 * per row2k "Rowing 101 – Basic Rigging"; inboard 86–89 cm from memory). It is a starting point for
 * discussion with a coach, not a published recommendation.
 */
export const defaultScullingOverlapCm = 21;

/**
 * Sweep rule of thumb: inboard ≈ spread + 30 cm (common practice, no source; widely quoted and also
 * criticised).
 */
export const sweepInboardOverSpreadCm = 30;

/** Outboard = overall length − inboard (FISA 2006 protocol). */
export function outboardCm(lengthCm: number, inboardCm: number): number {
  assertInboardShorter(lengthCm, inboardCm);
  return roundCm(lengthCm - inboardCm);
}

/** Lever ratio = outboard / inboard (Kleshnev, Rowing Biomechanics Newsletter, 2006); unrounded. */
export function leverRatio(lengthCm: number, inboardCm: number): number {
  return outboardCm(lengthCm, inboardCm) / inboardCm;
}

/**
 * Span gearing: sculling outboard / (span / 2), sweep outboard / spread (FISA 2006 protocol); unrounded.
 * `spanOrSpreadCm` is the span for sculling and the spread for sweep.
 */
export function spanGearing(oarType: OarType, lengthCm: number, inboardCm: number, spanOrSpreadCm: number): number {
  assertPositiveCm(oarType === "sculling" ? "spanCm" : "spreadCm", spanOrSpreadCm);
  const leverArmCm = oarType === "sculling" ? spanOrSpreadCm / 2 : spanOrSpreadCm;
  return outboardCm(lengthCm, inboardCm) / leverArmCm;
}

/**
 * Overlap by the FISA 2006 protocol: sculling 2 × (inboard + half swivel) − span;
 * sweep inboard + half swivel − spread.
 */
export function overlapCm(oarType: OarType, inboardCm: number, spanOrSpreadCm: number, halfSwivelCm: number = defaultHalfSwivelCm): number {
  assertPositiveCm("inboardCm", inboardCm);
  assertPositiveCm(oarType === "sculling" ? "spanCm" : "spreadCm", spanOrSpreadCm);
  assertNonNegativeCm("halfSwivelCm", halfSwivelCm);
  return oarType === "sculling"
    ? roundCm(2 * (inboardCm + halfSwivelCm) - spanOrSpreadCm)
    : roundCm(inboardCm + halfSwivelCm - spanOrSpreadCm);
}

/** Simple overlap, the coaches' shorthand without the swivel (common practice): sculling 2 × inboard − span; sweep inboard − spread. */
export function simpleOverlapCm(oarType: OarType, inboardCm: number, spanOrSpreadCm: number): number {
  return overlapCm(oarType, inboardCm, spanOrSpreadCm, 0);
}

export interface SuggestedInboardOptions {
  /** Wanted overlap in the protocol convention; sculling default 21 cm, sweep default from the spread + 30 rule. */
  overlapCm?: number;
  /** Half swivel width; default 2 cm (FISA 2006 protocol). */
  halfSwivelCm?: number;
}

/**
 * Suggested inboard. Sculling: (span + overlap) / 2 − half swivel (the FISA 2006 protocol rearranged),
 * overlap default 21 cm. Sweep: spread + 30 cm (common practice), or spread + overlap − half swivel when
 * an overlap is given.
 */
export function suggestedInboardCm(oarType: OarType, spanOrSpreadCm: number, options: SuggestedInboardOptions = {}): number {
  const halfSwivelCm = options.halfSwivelCm ?? defaultHalfSwivelCm;
  assertPositiveCm(oarType === "sculling" ? "spanCm" : "spreadCm", spanOrSpreadCm);
  assertNonNegativeCm("halfSwivelCm", halfSwivelCm);
  if (options.overlapCm !== undefined) assertFiniteCm("overlapCm", options.overlapCm);

  if (oarType === "sculling") {
    const wantedOverlapCm = options.overlapCm ?? defaultScullingOverlapCm;
    return roundCm((spanOrSpreadCm + wantedOverlapCm) / 2 - halfSwivelCm);
  }
  if (options.overlapCm === undefined) return roundCm(spanOrSpreadCm + sweepInboardOverSpreadCm);
  return roundCm(spanOrSpreadCm + options.overlapCm - halfSwivelCm);
}
