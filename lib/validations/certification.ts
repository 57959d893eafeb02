import { z } from "zod";
import { kebabCaseSchema, type ChecklistItem } from "@/lib/content/module-schema";
import { checklistVerdicts } from "@/lib/clearance/checklist";
import { maxModuleSlugLength } from "@/lib/validations/learning";
import { memberNameField } from "@/lib/validations/members";
import { multiLineTextMessage, multiLineTextPattern, oneLineTextPattern } from "@/lib/validations/text";

/** An athlete asks for a practical sign-off; coachId null means "any coach of the club". */
export const signOffRequestSchema = z.strictObject({
  moduleSlug: kebabCaseSchema.max(maxModuleSlugLength, { error: `at most ${maxModuleSlugLength} characters` }),
  coachId: z.number().int().positive().nullable().default(null),
});
export type SignOffRequestInput = z.input<typeof signOffRequestSchema>;

export const maxEvidencePhotos = 3;
export const maxNoteLength = 2000;

const verdictSchema = z.enum(checklistVerdicts, { error: "Choose met or not yet" });

/**
 * The coach's observed assessment for one module's checklist: a verdict for every item (and no others),
 * a note, and the ids of photos already uploaded. The same schema runs in the form and on the server.
 * A "not yet" needs a note: the athlete must learn what to practise.
 */
export function assessmentSchemaFor(checklist: readonly ChecklistItem[]) {
  const items = z.strictObject(Object.fromEntries(checklist.map((item) => [item.id, verdictSchema])));
  return z
    .strictObject({
      items,
      note: z
        .string()
        .trim()
        .max(maxNoteLength, { error: `At most ${maxNoteLength} characters` })
        .regex(multiLineTextPattern, { error: multiLineTextMessage }),
      evidenceIds: z
        .array(z.uuid())
        .max(maxEvidencePhotos, { error: `At most ${maxEvidencePhotos} photos` })
        .default([]),
    })
    .superRefine((value, context) => {
      const verdicts = Object.values(value.items as Record<string, string>);
      if (verdicts.includes("not-yet") && value.note.length < 3) {
        context.addIssue({
          code: "custom",
          path: ["note"],
          message: "Say what to practise before the next try",
        });
      }
    });
}
export type AssessmentInput = z.output<ReturnType<typeof assessmentSchemaFor>>;

const reasonSchema = z
  .string()
  .trim()
  .min(3, { error: "Give a reason of at least 3 characters" })
  .max(500, { error: "At most 500 characters" })
  .regex(multiLineTextPattern, { error: multiLineTextMessage });

export const suspendClearanceSchema = z.strictObject({ reason: reasonSchema });
export const liftSuspensionSchema = z.strictObject({
  note: z
    .string()
    .trim()
    .max(500, { error: "At most 500 characters" })
    .regex(multiLineTextPattern, { error: multiLineTextMessage })
    .default(""),
});
export const revokeCertificateSchema = z.strictObject({ reason: reasonSchema });

export const rosterFilters = ["all", "cleared", "waiting-for-me", "expiring-soon", "not-cleared"] as const;
export type RosterFilter = (typeof rosterFilters)[number];

/** The roster view's query: one filter and a name search (lenient: bad values fall back). */
export const rosterQuerySchema = z.object({
  filter: z.enum(rosterFilters).catch("all"),
  q: z.string().trim().max(100).catch(""),
});

export const registerStatuses = ["all", "valid", "expired", "revoked", "suspended"] as const;
export const certificateKindFilters = ["all", "module", "clearance"] as const;
const optionalDate = z.union([z.iso.date(), z.literal("")]).catch("");

/** The induction register's filters from the query string (lenient: bad values fall back to "all"). */
export const registerFilterSchema = z.object({
  module: z.union([kebabCaseSchema, z.literal("")]).catch(""),
  kind: z.enum(certificateKindFilters).catch("all"),
  status: z.enum(registerStatuses).catch("all"),
  from: optionalDate,
  to: optionalDate,
});
export type RegisterFilter = z.output<typeof registerFilterSchema>;

/**
 * The roster CSV export's query (?filter=&q=), strict: the page only links to good values, so a bad one
 * is a client's mistake and is refused naming the parameter. An empty `q` is no search.
 */
export const rosterExportQuerySchema = z.strictObject({
  filter: z.enum(rosterFilters, { error: `must be one of ${rosterFilters.join(", ")}` }).default("all"),
  q: z
    .string()
    .max(100, { error: "at most 100 characters" })
    .regex(oneLineTextPattern, { error: "must not contain control characters" })
    .transform((text) => text.trim())
    .default(""),
});

const isoDay = z.iso.date({ error: "must be a date written YYYY-MM-DD" });

/**
 * The register downloads' query, strict (the page links only to good values): a module the course
 * has (`moduleSlugs`), a kind, a status, and from/to days with from on or before to.
 */
export function registerQuerySchemaFor(moduleSlugs: readonly string[]) {
  return z
    .strictObject({
      module: kebabCaseSchema.refine((slug) => moduleSlugs.includes(slug), { error: "no such module" }).default(""),
      kind: z.enum(certificateKindFilters, { error: `must be one of ${certificateKindFilters.join(", ")}` }).default("all"),
      status: z.enum(registerStatuses, { error: `must be one of ${registerStatuses.join(", ")}` }).default("all"),
      from: isoDay.default(""),
      to: isoDay.default(""),
    })
    .superRefine((query, context) => {
      if (query.from && query.to && query.from > query.to) {
        context.addIssue({ code: "custom", path: ["to"], message: "must not be before from" });
      }
    });
}

/** The register filters that differ from the defaults: what the page puts in its download links. */
export function registerFilterQuery(filter: RegisterFilter): Record<string, string> {
  return Object.fromEntries(Object.entries(filter).filter(([, value]) => value !== "" && value !== "all"));
}

/**
 * Why the register page's filters would be refused by its downloads (`registerQuerySchemaFor`), in
 * the page's own words; empty when the CSV and PDF links will answer. The page itself is lenient.
 */
export function registerDownloadProblems(filter: RegisterFilter, moduleSlugs: readonly string[]): string[] {
  const parsed = registerQuerySchemaFor(moduleSlugs).safeParse(registerFilterQuery(filter));
  if (parsed.success) return [];
  return parsed.error.issues.map((issue) =>
    issue.path[0] === "to"
      ? "“Issued to” is before “Issued from”: swap the two dates."
      : issue.path[0] === "module"
        ? "The course has no such module: choose one from the list."
        : `The filter “${String(issue.path[0])}” is not one the register knows.`,
  );
}

export const certificateIdParamSchema = z.strictObject({ id: z.uuid({ error: "not a certificate id" }) });
export const signOffIdParamSchema = z.strictObject({ id: z.uuid({ error: "not a sign-off id" }) });
export const evidenceIdParamSchema = z.strictObject({ id: z.uuid({ error: "not a photo id" }) });

/** Plain-object query parameters for the lenient schemas above. */
export function queryObject(params: URLSearchParams | Record<string, string | string[] | undefined>): Record<string, string> {
  const entries = params instanceof URLSearchParams ? [...params.entries()] : Object.entries(params);
  const result: Record<string, string> = {};
  for (const [key, value] of entries) {
    const first = Array.isArray(value) ? value[0] : value;
    if (typeof first === "string" && !(key in result)) result[key] = first;
  }
  return result;
}

/**
 * An admin reissues an athlete's certificates under their corrected name. `name` is the name the admin
 * confirmed on the page; the server refuses if the member's name has changed since.
 */
export const reissueCertificatesSchema = z.strictObject({ name: memberNameField });
