import type { OarType } from "@/lib/rigging/types";

/** Boat classes by the rowing trade's shorthand: x sculling, − without and + with a coxswain. */
export const scullingBoatClasses = ["1x", "2x", "4x", "8x"] as const;
export const sweepBoatClasses = ["2-", "2+", "4-", "4+", "8+"] as const;
export const boatClasses = [...scullingBoatClasses, ...sweepBoatClasses] as const;
export type BoatClass = (typeof boatClasses)[number];

const classNames: Record<BoatClass, string> = {
  "1x": "single scull",
  "2x": "double scull",
  "4x": "quad scull",
  "8x": "octuple scull",
  "2-": "pair without coxswain",
  "2+": "pair with coxswain",
  "4-": "four without coxswain",
  "4+": "four with coxswain",
  "8+": "eight with coxswain",
};

/** Sculling classes (x) carry two sculls a seat; the others one sweep oar a seat. */
export function oarTypeOfClass(boatClass: BoatClass): OarType {
  return (scullingBoatClasses as readonly string[]).includes(boatClass) ? "sculling" : "sweep";
}

/** The class in words with its shorthand, e.g. "double scull (2x)". */
export function boatClassLabel(boatClass: BoatClass): string {
  return `${classNames[boatClass]} (${boatClass})`;
}

/** Seats in a boat of the class (rowers, not the coxswain): the number in the shorthand. */
export function rowersInClass(boatClass: BoatClass): number {
  return Number(boatClass[0]);
}

/** How the handle end moves to change the overall length. */
export const handleMechanisms = ["clamped-slide", "end-screw"] as const;
export type HandleMechanism = (typeof handleMechanisms)[number];

export const handleMechanismLabels: Record<HandleMechanism, string> = {
  "clamped-slide": "Sliding handle, held by clamp screws",
  "end-screw": "Handle wound in or out by a screw in its end",
};

export const oarTypeLabels: Record<OarType, string> = { sculling: "Sculls", sweep: "Sweep oars" };

/** "span" for sculling boats (pin to pin), "spread" for sweep boats (centre line to pin). */
export function rigWidthWord(oarType: OarType): "span" | "spread" {
  return oarType === "sculling" ? "span" : "spread";
}
