import { z } from "zod";

import { localIsoDate } from "@/lib/care/calendar";
import { addDaysIso } from "@/lib/care/dates";
import { cleaningMethods } from "@/lib/care/methods";
import { multiLineTextMessage, multiLineTextPattern } from "@/lib/validations/text";

/** How far back a cleaning may be recorded: older ones no longer change whether a set is due. */
export const cleaningRecordMaxAgeDays = 366;

const isoDay = (what: string) => z.iso.date({ error: `Enter the ${what} as a date.` });

/**
 * A cleaning of one oar set's handles. The date may not be in the future (checked against today where the
 * schema runs: the browser, then the server); "someone else" needs the member's id; "other" needs a note.
 */
export const cleaningRecordSchema = z
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
    const today = localIsoDate();
    if (record.cleanedOn > today) {
      ctx.addIssue({ code: "custom", path: ["cleanedOn"], message: "The cleaning cannot be in the future." });
    } else if (record.cleanedOn < addDaysIso(today, -cleaningRecordMaxAgeDays)) {
      ctx.addIssue({ code: "custom", path: ["cleanedOn"], message: "Record cleanings from the last year only." });
    }
    if (record.method === "other" && record.note.length === 0) {
      ctx.addIssue({ code: "custom", path: ["note"], message: "Say how the handles were cleaned." });
    }
  });

export type CleaningRecordFormInput = z.input<typeof cleaningRecordSchema>;
export type CleaningRecordInput = z.output<typeof cleaningRecordSchema>;

/** A race day for the club calendar: today or later, at most two years ahead. */
export const raceDaySchema = z
  .strictObject({ raceDay: isoDay("race day") })
  .superRefine(({ raceDay }, ctx) => {
    const today = localIsoDate();
    if (raceDay < today) {
      ctx.addIssue({ code: "custom", path: ["raceDay"], message: "Enter a race day from today on." });
    } else if (raceDay > addDaysIso(today, 731)) {
      ctx.addIssue({ code: "custom", path: ["raceDay"], message: "Enter a race day within the next two years." });
    }
  });

export type RaceDayInput = z.output<typeof raceDaySchema>;

/** Removing a race day: any day on the calendar, past ones included. */
export const removeRaceDaySchema = z.strictObject({ raceDay: isoDay("race day") });

/** Switching the humid spell (daily cleaning) on or off. */
export const humidSpellSchema = z.strictObject({ humidSpell: z.boolean({ error: "Choose on or off." }) });
