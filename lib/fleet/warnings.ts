import { oarTypeOfClass, type BoatClass } from "@/lib/fleet/catalogue";
import { overlapCm } from "@/lib/rigging/geometry";
import { askCoachSuffix, checkLimits, type ClubOarLimits } from "@/lib/rigging/limits";
import { roundTo } from "@/lib/rigging/round";
import type { OarType } from "@/lib/rigging/types";

/**
 * Usual span 157–161 cm and spread 81–88 cm (row2k, "Rowing 101 – Basic Rigging"). Outside them a boat
 * can still be right, but the number deserves a second look.
 */
export const usualSpanCm = { min: 157, max: 161 } as const;
export const usualSpreadCm = { min: 81, max: 88 } as const;

export interface BoatWarningInput {
  boatClass: BoatClass;
  spanCm?: number | null;
  spreadCm?: number | null;
}

export interface LinkedOarSet {
  name: string;
  oarType: OarType;
  targetInboardCm: number;
}

function cm(value: number): string {
  return `${roundTo(value, 2)} cm`;
}

/**
 * Warnings that do not stop a boat being saved: a span or spread outside the usual range, and a linked
 * oar set whose target inboard would give no overlap (protocol convention) in this boat.
 */
export function boatWarnings(boat: BoatWarningInput, linkedSets: LinkedOarSet[] = [], halfSwivelCm = 2): string[] {
  const oarType = oarTypeOfClass(boat.boatClass);
  const widthCm = oarType === "sculling" ? boat.spanCm : boat.spreadCm;
  if (widthCm === undefined || widthCm === null || !Number.isFinite(widthCm) || widthCm <= 0) return [];
  const warnings: string[] = [];
  const usual = oarType === "sculling" ? usualSpanCm : usualSpreadCm;
  const word = oarType === "sculling" ? "span" : "spread";
  if (widthCm < usual.min || widthCm > usual.max) {
    warnings.push(
      `A ${word} of ${cm(widthCm)} is outside the usual ${usual.min}–${cm(usual.max)}: measure it again, and ${askCoachSuffix}.`,
    );
  }
  for (const set of linkedSets) {
    if (set.oarType !== oarType) continue;
    if (overlapCm(oarType, set.targetInboardCm, widthCm, halfSwivelCm) <= 0) {
      warnings.push(`With "${set.name}" at ${cm(set.targetInboardCm)} inboard this boat would have no overlap: ${askCoachSuffix}.`);
    }
  }
  return warnings;
}

export interface OarSetWarningInput {
  oarType: OarType;
  oarCount?: number;
  targetLengthCm: number;
  targetInboardCm: number;
}

/**
 * Warnings that do not stop an oar set being saved: target settings outside the club's limits
 * (checkLimits), and an odd number of sculls (sculls are used in pairs).
 */
export function oarSetWarnings(set: OarSetWarningInput, limits: ClubOarLimits): string[] {
  const warnings: string[] = [];
  if (Number.isFinite(set.targetLengthCm) && Number.isFinite(set.targetInboardCm) && set.targetLengthCm > 0 && set.targetInboardCm > 0) {
    warnings.push(...checkLimits(set.oarType, { lengthCm: set.targetLengthCm, inboardCm: set.targetInboardCm }, limits));
  }
  if (set.oarType === "sculling" && set.oarCount !== undefined && Number.isInteger(set.oarCount) && set.oarCount % 2 === 1) {
    warnings.push(`Sculls are used in pairs: a set of ${set.oarCount} leaves one scull without its partner.`);
  }
  return warnings;
}
