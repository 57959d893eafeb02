import { z } from "zod";
import { isTimeZone, machineTimeZone } from "@/lib/care/calendar";

const limitsSchema = z.strictObject({
  minLengthCm: z.number().finite().min(200).max(420),
  maxLengthCm: z.number().finite().min(200).max(420),
  minInboardCm: z.number().finite().min(60).max(140),
  maxInboardCm: z.number().finite().min(60).max(140),
});

/** Club settings with the defaults a new club starts with. */
export const clubSettingsSchema = z.object({
  passMark: z.number().min(0.5).max(1).default(0.8),
  clickCm: z.number().min(0.1).max(2).default(0.5),
  halfSwivelCm: z.number().min(0).max(5).default(2),
  // The modules whose frontmatter says `requiredForClearance: true`, in course order (this file is also
  // bundled for the settings form, so it cannot read content/; tests/unit/content-modules.test.ts checks).
  clearanceModules: z
    .array(z.string().max(60))
    .default(["overall-length", "setting-inboard", "changing-boats", "secure-and-check", "grip-cleaning"]),
  clearanceMonths: z.number().int().min(1).max(60).default(12),
  limits: z.strictObject({ sculling: limitsSchema, sweep: limitsSchema }).default({
    // Common practice, no source: a little either side of the usual settings in TRADE-FACTS.md.
    sculling: { minLengthCm: 280, maxLengthCm: 292, minInboardCm: 85, maxInboardCm: 91 },
    sweep: { minLengthCm: 366, maxLengthCm: 380, minInboardCm: 112, maxInboardCm: 120 },
  }),
  raceDays: z.array(z.iso.date()).default([]),
  humidSpell: z.boolean().default(false),
  /**
   * The club's IANA time zone: what "today" is for cleanings, race days and the weekly digest, and the
   * calendar of every certification date (isoDateOf in lib/clearance/dates.ts). A club that has not
   * chosen one, or whose stored name this machine does not know, keeps the server's zone (only this
   * field falls back).
   */
  timeZone: z
    .string()
    .refine(isTimeZone)
    .catch(() => machineTimeZone()),
});

export type ClubSettings = z.infer<typeof clubSettingsSchema>;

/** Stored settings read leniently: anything missing or unreadable falls back to the default. */
export function readClubSettings(stored: unknown): ClubSettings {
  const parsed = clubSettingsSchema.safeParse(stored ?? {});
  return parsed.success ? parsed.data : clubSettingsSchema.parse({});
}
