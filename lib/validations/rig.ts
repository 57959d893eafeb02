import { z } from "zod";

import { oarTypes, type OarType } from "@/lib/rigging/types";

/**
 * Sane overall lengths by oar type, cm (common practice, no source: wide bounds around the usual scull and
 * sweep lengths, to catch typos); an oar of 300 cm or more cannot be a scull, one of 300 cm or less cannot
 * be a sweep oar.
 */
export const saneLengthCm = {
  sculling: { min: 250, max: 300 },
  sweep: { min: 330, max: 400 },
} as const;

/** The type boundary, cm: sculls are shorter, sweep oars longer. */
export const scullSweepBoundaryCm = 300;

/**
 * What is wrong with an overall length for an oar type: "other-type" when it lies past the type boundary
 * but within the other type's sane range (a scull of 300–400 cm, a sweep oar of 250–300 cm), so the oar
 * type or the tape is wrong; "out-of-range" for any other length outside the type's sane range (a typo
 * such as 28.7 or 2870 is no oar at all); null when the length is sane.
 */
export function oarLengthProblem(oarType: OarType, lengthCm: number): "other-type" | "out-of-range" | null {
  const otherType =
    oarType === "sculling"
      ? lengthCm >= scullSweepBoundaryCm && lengthCm <= saneLengthCm.sweep.max
      : lengthCm <= scullSweepBoundaryCm && lengthCm >= saneLengthCm.sculling.min;
  if (otherType) return "other-type";
  const sane = saneLengthCm[oarType];
  return lengthCm < sane.min || lengthCm > sane.max ? "out-of-range" : null;
}

const cmField = (label: string) =>
  z.number({ error: `${label} must be a number in centimetres` }).positive({ error: `${label} must be more than 0 cm` });

const oarSettingsSchema = z.strictObject({
  lengthCm: cmField("Overall length"),
  inboardCm: cmField("Inboard"),
});

/** A request to plan a rig change (lib/rigging/plan.ts), as sent by the rig calculator. */
export const rigPlanRequestSchema = z
  .strictObject({
    oarType: z.enum(oarTypes, { error: 'Oar type must be "sculling" or "sweep"' }),
    measured: oarSettingsSchema,
    target: oarSettingsSchema,
    clickCm: z
      .number({ error: "Click size must be a number in centimetres" })
      .min(0.1, { error: "Click size must be at least 0.1 cm" })
      .max(2, { error: "Click size must be at most 2 cm" })
      .default(0.5),
    spanCm: z
      .number({ error: "Span must be a number in centimetres" })
      .min(140, { error: "Span must be at least 140 cm" })
      .max(180, { error: "Span must be at most 180 cm" })
      .optional(),
    spreadCm: z
      .number({ error: "Spread must be a number in centimetres" })
      .min(70, { error: "Spread must be at least 70 cm" })
      .max(100, { error: "Spread must be at most 100 cm" })
      .optional(),
    halfSwivelCm: z
      .number({ error: "Half swivel width must be a number in centimetres" })
      .min(0, { error: "Half swivel width cannot be negative" })
      .max(5, { error: "Half swivel width must be at most 5 cm" })
      .optional(),
  })
  .superRefine((request, ctx) => {
    for (const which of ["measured", "target"] as const) {
      const { lengthCm, inboardCm } = request[which];
      const label = which === "measured" ? "measured" : "target";
      if (inboardCm >= lengthCm) {
        ctx.addIssue({
          code: "custom",
          path: [which, "inboardCm"],
          message: `The ${label} inboard must be shorter than the ${label} overall length`,
        });
      }
      const sane = saneLengthCm[request.oarType];
      const problem = oarLengthProblem(request.oarType, lengthCm);
      if (problem === "other-type") {
        ctx.addIssue({
          code: "custom",
          path: [which, "lengthCm"],
          message:
            request.oarType === "sculling"
              ? `A ${label} length of ${lengthCm} cm is a sweep oar's length, not a scull's: check the oar type and the tape`
              : `A ${label} length of ${lengthCm} cm is a scull's length, not a sweep oar's: check the oar type and the tape`,
        });
      } else if (problem === "out-of-range") {
        ctx.addIssue({
          code: "custom",
          path: [which, "lengthCm"],
          message: `A ${label} length of ${lengthCm} cm is outside ${sane.min}–${sane.max} cm: re-measure from the blade tip to the handle end`,
        });
      }
    }
  });

/** The parsed request: clickCm always present. */
export type RigPlanRequest = z.output<typeof rigPlanRequestSchema>;
/** What a client may send: clickCm optional. */
export type RigPlanRequestInput = z.input<typeof rigPlanRequestSchema>;
