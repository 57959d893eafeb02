import { z } from "zod";

import { addDaysIso } from "@/lib/care/dates";
import { cleaningMethods } from "@/lib/care/methods";
import { multiLineTextMessage, multiLineTextPattern } from "@/lib/validations/text";

/** How far back a cleaning may be recorded: older ones no longer change whether a set is due. */
export const cleaningRecordMaxAgeDays = 366;

const isoDay = (what: string) => z.iso.date({ error: `Enter the ${what} as a date.` });

/**
 * A cleaning of one oar set's handles. The date may not be in the future: `today` is the club's day
 * (clubToday on the server, which also hands it to the form), not the browser's or the server's own.
 * "Someone else" needs the member's id; "other" needs a note.
 */
export const cleaningRecordSchemaFor = (today: string) =>
  z
    .strictObject({
      oarSetId: z.number({ error: "Choose the oar set." }).int({ error: "Choose the oar set." }).positive({ error: "Choose the oar set." }),
      cleanedOn: isoDay("day of the cleaning"),
      cleanedById: z.number().int().positive().optional(),
      method: z.enum(cleaningMethods, { error: "Choose how the handles were cleaned." }),
      note: z
        .string()
        .trim()
        .max(300, { error: "Keep the note under 300 characters." })
        .regex(multiLineTextPattern, { error: multiLineTextMessage })
        .default(""),
    })
    .superRefine((record, ctx) => {
      if (record.cleanedOn > today) {
        ctx.addIssue({
          code: "custom",
          path: ["cleanedOn"],
          message: "The cleaning cannot be in the future.",
        });
      } else if (record.cleanedOn < addDaysIso(today, -cleaningRecordMaxAgeDays)) {
        ctx.addIssue({
          code: "custom",
          path: ["cleanedOn"],
          message: "Record cleanings from the last year only.",
        });
      }
      if (record.method === "other" && record.note.length === 0) {
        ctx.addIssue({ code: "custom", path: ["note"], message: "Say how the handles were cleaned." });
      }
    });

export type CleaningRecordFormInput = z.input<ReturnType<typeof cleaningRecordSchemaFor>>;
export type CleaningRecordInput = z.output<ReturnType<typeof cleaningRecordSchemaFor>>;

/** A race day for the club calendar: the club's today or later, at most two years ahead. */
export const raceDaySchemaFor = (today: string) =>
  z.strictObject({ raceDay: isoDay("race day") }).superRefine(({ raceDay }, ctx) => {
    if (raceDay < today) {
      ctx.addIssue({ code: "custom", path: ["raceDay"], message: "Enter a race day from today on." });
    } else if (raceDay > addDaysIso(today, 731)) {
      ctx.addIssue({
        code: "custom",
        path: ["raceDay"],
        message: "Enter a race day within the next two years.",
      });
    }
  });

export type RaceDayInput = z.output<ReturnType<typeof raceDaySchemaFor>>;

/** Removing a race day: any day on the calendar, past ones included. */
export const removeRaceDaySchema = z.strictObject({ raceDay: isoDay("race day") });

/** Switching the humid spell (daily cleaning) on or off. */
export const humidSpellSchema = z.strictObject({ humidSpell: z.boolean({ error: "Choose on or off." }) });
