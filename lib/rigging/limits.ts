import { roundTo } from "@/lib/rigging/round";
import type { OarSettings, OarType } from "@/lib/rigging/types";

/** A club's allowed range for one type of oar, in centimetres, ends included. */
export interface OarLimits {
  minLengthCm: number;
  maxLengthCm: number;
  minInboardCm: number;
  maxInboardCm: number;
  /** Optional least overlap the club accepts, compared with the protocol overlap when a plan knows the span or spread. */
  minOverlapCm?: number;
}

export interface ClubOarLimits {
  sculling: OarLimits;
  sweep: OarLimits;
}

/**
 * Default club limits (common practice, no source): sculls 280–292 cm long with inboard 85–91 cm;
 * sweep oars 366–380 cm with inboard 112–120 cm. Wide enough for the usual settings, narrow enough
 * to catch a misread tape. Each club should set its own.
 */
export const defaultClubOarLimits: ClubOarLimits = {
  sculling: { minLengthCm: 280, maxLengthCm: 292, minInboardCm: 85, maxInboardCm: 91 },
  sweep: { minLengthCm: 366, maxLengthCm: 380, minInboardCm: 112, maxInboardCm: 120 },
};

export const askCoachSuffix = "ask your coach before going afloat";

const oarNoun: Record<OarType, string> = { sculling: "sculls", sweep: "sweep oars" };

function isClubLimits(limits: OarLimits | ClubOarLimits): limits is ClubOarLimits {
  return "sculling" in limits && "sweep" in limits;
}

/** The limits for one oar type, from either one type's limits or a whole club's. */
export function limitsFor(oarType: OarType, limits: OarLimits | ClubOarLimits): OarLimits {
  return isClubLimits(limits) ? limits[oarType] : limits;
}

function cm(value: number): string {
  return `${roundTo(value, 2)} cm`;
}

function rangeWarning(what: string, valueCm: number, minCm: number, maxCm: number, oarType: OarType): string | null {
  const range = `${roundTo(minCm, 2)}–${cm(maxCm)}`;
  if (valueCm < minCm) {
    return `The ${what} of ${cm(valueCm)} is below your club's range for ${oarNoun[oarType]} (${range}): ${askCoachSuffix}.`;
  }
  if (valueCm > maxCm) {
    return `The ${what} of ${cm(valueCm)} is above your club's range for ${oarNoun[oarType]} (${range}): ${askCoachSuffix}.`;
  }
  return null;
}

/** Plain-language warnings for each setting outside the club's limits (ends allowed); empty when all is within. */
export function checkLimits(oarType: OarType, settings: OarSettings, limits: OarLimits | ClubOarLimits = defaultClubOarLimits): string[] {
  const own = limitsFor(oarType, limits);
  return [
    rangeWarning("overall length", settings.lengthCm, own.minLengthCm, own.maxLengthCm, oarType),
    rangeWarning("inboard", settings.inboardCm, own.minInboardCm, own.maxInboardCm, oarType),
  ].filter((warning): warning is string => warning !== null);
}

/** A warning when the overlap is below the club's minimum overlap, if the club sets one; otherwise null. */
export function checkOverlap(overlapCm: number, limits: OarLimits): string | null {
  if (limits.minOverlapCm === undefined || overlapCm >= limits.minOverlapCm) return null;
  return `The overlap of ${cm(overlapCm)} is less than your club's minimum of ${cm(limits.minOverlapCm)}: ${askCoachSuffix}.`;
}
