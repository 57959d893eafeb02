/** Sculls are used in pairs, one in each hand; a sweep oar is held with both hands. */
export type OarType = "sculling" | "sweep";

/** The two settings an athlete adjusts on an oar, both in centimetres. */
export interface OarSettings {
  /** Overall length: along the shaft from the blade tip to the end of the handle. */
  lengthCm: number;
  /** Inboard: from the end of the handle to the face of the collar that rests against the swivel. */
  inboardCm: number;
}

/** Which way to slide the collar along the shaft. */
export type CollarDirection = "towards-handle" | "towards-blade" | "none";

/** What the handle move does to the overall length. */
export type LengthAction = "lengthen" | "shorten" | "none";

export const oarTypes = ["sculling", "sweep"] as const satisfies readonly OarType[];
