import { z } from "zod";

import { boatClasses, handleMechanisms, oarTypeOfClass } from "@/lib/fleet/catalogue";
import { oarTypes } from "@/lib/rigging/types";
import { oarLengthProblem, saneLengthCm } from "@/lib/validations/rig";
import { maxRecordId } from "@/lib/validations/ids";
import { multiLineTextMessage, multiLineTextPattern, oneLineTextMessage, oneLineTextPattern } from "@/lib/validations/text";

/**
 * Physical bounds, cm. Span and spread match rigPlanRequestSchema, so every boat saved here can be
 * planned for; outside them the number is a misread tape, not a boat.
 */
export const physicalSpanCm = { min: 140, max: 180 } as const;
export const physicalSpreadCm = { min: 70, max: 100 } as const;
/** Inboards outside these are a misread tape (the same bounds the lesson calculators use). */
export const physicalInboardCm = { min: 50, max: 150 } as const;

const nameField = z
  .string({ error: "Enter a name." })
  .trim()
  .min(1, { error: "Enter a name." })
  .max(80, { error: "Keep the name under 80 characters." })
  .regex(oneLineTextPattern, { error: oneLineTextMessage });

const notesField = z
  .string()
  .trim()
  .max(500, { error: "Keep the notes under 500 characters." })
  .regex(multiLineTextPattern, { error: multiLineTextMessage })
  .default("");

// zod 4 numbers refuse NaN (an empty number input) and Infinity with this message.
const cmNumber = (label: string) => z.number({ error: `Enter the ${label} as a number of centimetres.` });

/** A boat: name, class, span (sculling) or spread (sweep), notes. */
export const boatSchema = z
  .strictObject({
    name: nameField,
    boatClass: z.enum(boatClasses, { error: "Choose the boat's class." }),
    spanCm: cmNumber("span")
      .min(physicalSpanCm.min, { error: `A span is at least ${physicalSpanCm.min} cm: measure pin centre to pin centre.` })
      .max(physicalSpanCm.max, { error: `A span is at most ${physicalSpanCm.max} cm: measure pin centre to pin centre.` })
      .optional(),
    spreadCm: cmNumber("spread")
      .min(physicalSpreadCm.min, { error: `A spread is at least ${physicalSpreadCm.min} cm: measure from the centre line to the pin.` })
      .max(physicalSpreadCm.max, { error: `A spread is at most ${physicalSpreadCm.max} cm: measure from the centre line to the pin.` })
      .optional(),
    notes: notesField,
  })
  .superRefine((boat, ctx) => {
    if (oarTypeOfClass(boat.boatClass) === "sculling") {
      if (boat.spanCm === undefined) ctx.addIssue({ code: "custom", path: ["spanCm"], message: "Enter the span of this sculling boat." });
      if (boat.spreadCm !== undefined)
        ctx.addIssue({ code: "custom", path: ["spreadCm"], message: "A sculling boat is set by its span, not a spread." });
    } else {
      if (boat.spreadCm === undefined)
        ctx.addIssue({ code: "custom", path: ["spreadCm"], message: "Enter the spread of this sweep boat." });
      if (boat.spanCm !== undefined)
        ctx.addIssue({ code: "custom", path: ["spanCm"], message: "A sweep boat is set by its spread, not a span." });
    }
  });

export type BoatFormInput = z.input<typeof boatSchema>;
export type BoatInput = z.output<typeof boatSchema>;

/** An oar set: what it is, its target settings, its collar click and handle, and the boats it is used in. */
export const oarSetSchema = z
  .strictObject({
    name: nameField,
    oarType: z.enum(oarTypes, { error: "Choose sculls or sweep oars." }),
    oarCount: z
      .number({ error: "Enter how many oars are in the set." })
      .int({ error: "Enter a whole number of oars." })
      .min(1, { error: "A set has at least one oar." })
      .max(40, { error: "A set has at most 40 oars." }),
    targetLengthCm: cmNumber("target overall length").positive({ error: "The target overall length must be more than 0 cm." }),
    targetInboardCm: cmNumber("target inboard")
      .min(physicalInboardCm.min, { error: `An inboard is at least ${physicalInboardCm.min} cm: measure again.` })
      .max(physicalInboardCm.max, { error: `An inboard is at most ${physicalInboardCm.max} cm: measure again.` }),
    clickCm: z
      .number({ error: "Enter the collar's click size in centimetres." })
      .min(0.1, { error: "A click is at least 0.1 cm." })
      .max(2, { error: "A click is at most 2 cm." }),
    handleMechanism: z.enum(handleMechanisms, { error: "Choose how the handle moves." }),
    boatIds: z
      .array(z.number().int().positive(), { error: "Choose the boats from the list." })
      .max(60, { error: "Choose at most 60 boats." })
      .refine((ids) => new Set(ids).size === ids.length, { error: "Each boat can be chosen once." })
      .default([]),
    notes: notesField,
  })
  .superRefine((set, ctx) => {
    const sane = saneLengthCm[set.oarType];
    const lengthCm = set.targetLengthCm;
    const problem = oarLengthProblem(set.oarType, lengthCm);
    if (problem === "other-type") {
      ctx.addIssue({
        code: "custom",
        path: ["targetLengthCm"],
        message:
          set.oarType === "sculling"
            ? `${lengthCm} cm is a sweep oar's length, not a scull's: check the oar type and the tape.`
            : `${lengthCm} cm is a scull's length, not a sweep oar's: check the oar type and the tape.`,
      });
    } else if (problem === "out-of-range") {
      ctx.addIssue({
        code: "custom",
        path: ["targetLengthCm"],
        message: `${lengthCm} cm is outside ${sane.min}–${sane.max} cm: measure from the blade tip to the handle end.`,
      });
    }
    // The collar always sits well inside the handle half of the oar; half the length or more is a misread tape.
    if (set.targetInboardCm >= lengthCm / 2) {
      ctx.addIssue({
        code: "custom",
        path: ["targetInboardCm"],
        message: "The inboard must be less than half the overall length: measure from the handle end to the collar face.",
      });
    }
  });

export type OarSetFormInput = z.input<typeof oarSetSchema>;
export type OarSetInput = z.output<typeof oarSetSchema>;

/** Which record an archive or restore acts on. */
export const archiveSchema = z.strictObject({
  id: z.number().int().positive(),
  archived: z.boolean(),
});

/** A record id from a URL segment or a query string. */
export const recordIdSchema = z.coerce.number().int().positive().max(maxRecordId);
