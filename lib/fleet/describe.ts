import { handleMechanismLabels, oarTypeOfClass, type BoatClass, type HandleMechanism } from "@/lib/fleet/catalogue";
import { leverRatio, outboardCm, overlapCm, simpleOverlapCm, spanGearing } from "@/lib/rigging/geometry";
import { checkLimits, type ClubOarLimits } from "@/lib/rigging/limits";
import { roundTo } from "@/lib/rigging/round";
import type { OarType } from "@/lib/rigging/types";

export interface DescribedBoat {
  boatClass: BoatClass;
  spanCm: number | null;
  spreadCm: number | null;
}

export interface DescribedOarSet {
  name: string;
  oarType: OarType;
  oarCount: number;
  targetLengthCm: number;
  targetInboardCm: number;
  clickCm: number;
  handleMechanism: HandleMechanism;
}

function cm(value: number): string {
  return `${roundTo(value, 2)} cm`;
}

/** The boat's span or spread in words, with what it measures. */
export function describeRigWidth(boat: DescribedBoat): string {
  if (oarTypeOfClass(boat.boatClass) === "sculling") {
    return boat.spanCm === null
      ? "Span: not recorded. Ask your coach."
      : `Span: ${cm(boat.spanCm)}, the distance between the centres of the two pins.`;
  }
  return boat.spreadCm === null
    ? "Spread: not recorded. Ask your coach."
    : `Spread: ${cm(boat.spreadCm)}, from the boat's centre line to the centre of the pin.`;
}

export interface OarSetInBoat {
  /** Plain sentences, in reading order. */
  lines: string[];
  /** Target settings outside the club's limits. */
  warnings: string[];
}

/**
 * An oar set's settings for one boat in plain words: how many oars, the target length and inboard, the
 * outboard and ratios, and the overlap by the measurement-protocol convention (named, with the half
 * swivel width used) next to the simple overlap.
 */
export function describeOarSetInBoat(boat: DescribedBoat, set: DescribedOarSet, halfSwivelCm: number, limits: ClubOarLimits): OarSetInBoat {
  const noun = set.oarType === "sculling" ? (set.oarCount === 1 ? "scull" : "sculls") : set.oarCount === 1 ? "sweep oar" : "sweep oars";
  const lines = [
    `${set.oarCount} ${noun}. Set each to an overall length of ${cm(set.targetLengthCm)} and an inboard of ${cm(set.targetInboardCm)}.`,
    `Outboard ${cm(outboardCm(set.targetLengthCm, set.targetInboardCm))}; lever ratio (outboard ÷ inboard) ${leverRatio(set.targetLengthCm, set.targetInboardCm).toFixed(3)}.`,
    `Collar clicks of ${cm(set.clickCm)}. Handle: ${handleMechanismLabels[set.handleMechanism].toLowerCase()}.`,
  ];
  const widthCm = set.oarType === "sculling" ? boat.spanCm : boat.spreadCm;
  if (widthCm !== null && set.oarType === oarTypeOfClass(boat.boatClass)) {
    const overlap = roundTo(overlapCm(set.oarType, set.targetInboardCm, widthCm, halfSwivelCm), 1);
    const simple = roundTo(simpleOverlapCm(set.oarType, set.targetInboardCm, widthCm), 1);
    const gearing = spanGearing(set.oarType, set.targetLengthCm, set.targetInboardCm, widthCm).toFixed(3);
    lines.push(
      set.oarType === "sculling"
        ? `Overlap ${cm(overlap)} by the measurement-protocol convention, 2 × (inboard + half swivel width) − span, with your club's half swivel width of ${cm(halfSwivelCm)}; ${cm(simple)} without the swivel term (2 × inboard − span). Span gearing ${gearing}.`
        : `The handle reaches ${cm(overlap)} past the centre line by the measurement-protocol convention, inboard + half swivel width − spread, with your club's half swivel width of ${cm(halfSwivelCm)}; ${cm(simple)} without the swivel term (inboard − spread). Span gearing ${gearing}.`,
    );
  }
  return {
    lines,
    warnings: checkLimits(set.oarType, { lengthCm: set.targetLengthCm, inboardCm: set.targetInboardCm }, limits),
  };
}
