import { z } from "zod";
import { canonicalTimeZone, isTimeZone } from "@/lib/care/calendar";
import { kebabCaseSchema } from "@/lib/content/module-schema";
import { maxModuleSlugLength } from "@/lib/validations/learning";
import type { ClubSettings } from "@/lib/validations/club-settings";

function numberIn(min: number, max: number, unit: string) {
  return z
    .number({ error: "Enter a number" })
    .min(min, { error: `At least ${min} ${unit}` })
    .max(max, { error: `At most ${max} ${unit}` });
}

const oarLimitsSchema = z
  .strictObject({
    minLengthCm: numberIn(200, 420, "cm"),
    maxLengthCm: numberIn(200, 420, "cm"),
    minInboardCm: numberIn(60, 140, "cm"),
    maxInboardCm: numberIn(60, 140, "cm"),
  })
  .superRefine((limits, context) => {
    if (limits.minLengthCm > limits.maxLengthCm) {
      context.addIssue({
        code: "custom",
        path: ["maxLengthCm"],
        message: "Must not be below the minimum length",
      });
    }
    if (limits.minInboardCm > limits.maxInboardCm) {
      context.addIssue({
        code: "custom",
        path: ["maxInboardCm"],
        message: "Must not be below the minimum inboard",
      });
    }
  });

/**
 * What an administrator edits on the club settings page. The pass mark is a whole percentage here and
 * a fraction in storage. Changing these never rewrites past results: attempts keep their own pass mark
 * and certificates their own dates.
 */
export const clubSettingsFormSchema = z.strictObject({
  passMarkPercent: z
    .number({ error: "Enter a number" })
    .int({ error: "A whole percentage" })
    .min(50, { error: "At least 50 %" })
    .max(100, { error: "At most 100 %" }),
  clickCm: numberIn(0.1, 2, "cm"),
  halfSwivelCm: numberIn(0, 5, "cm"),
  clearanceModules: z
    .array(kebabCaseSchema.max(maxModuleSlugLength, { error: `At most ${maxModuleSlugLength} characters` }))
    .min(1, { error: "Choose at least one module" })
    .max(30),
  clearanceMonths: z
    .number({ error: "Enter a number" })
    .int({ error: "Whole months" })
    .min(1, { error: "At least 1 month" })
    .max(60, { error: "At most 60 months" }),
  limits: z.strictObject({ sculling: oarLimitsSchema, sweep: oarLimitsSchema }),
  timeZone: z
    .string({ error: "Choose a time zone" })
    .refine(isTimeZone, { error: "Choose a time zone from the list" })
    .transform(canonicalTimeZone),
});
export type ClubSettingsForm = z.output<typeof clubSettingsFormSchema>;

/** The form's starting values from stored settings. */
export function settingsToForm(settings: ClubSettings): ClubSettingsForm {
  return {
    passMarkPercent: Math.round(settings.passMark * 100),
    clickCm: settings.clickCm,
    halfSwivelCm: settings.halfSwivelCm,
    clearanceModules: [...settings.clearanceModules],
    clearanceMonths: settings.clearanceMonths,
    limits: { sculling: { ...settings.limits.sculling }, sweep: { ...settings.limits.sweep } },
    timeZone: settings.timeZone,
  };
}

/** Stored settings with the form's values; settings the form does not show (race days…) are kept. */
export function formToSettings(form: ClubSettingsForm, stored: ClubSettings): ClubSettings {
  return {
    ...stored,
    passMark: form.passMarkPercent / 100,
    clickCm: form.clickCm,
    halfSwivelCm: form.halfSwivelCm,
    clearanceModules: [...new Set(form.clearanceModules)],
    clearanceMonths: form.clearanceMonths,
    limits: form.limits,
    timeZone: form.timeZone,
  };
}
