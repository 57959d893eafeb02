import { z } from "zod";
import { quizRecipeSchema } from "@/lib/quiz/recipe";

const KEBAB_CASE = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

/** A kebab-case identifier: lower-case letters and digits joined by single hyphens. */
export const kebabCaseSchema = z.string().regex(KEBAB_CASE, { error: "must be kebab-case (lower-case letters, digits, single hyphens)" });

/** One thing a coach watches the athlete do at the practical sign-off. */
export const checklistItemSchema = z.strictObject({
  id: kebabCaseSchema,
  label: z.string().trim().min(1, { error: "must not be empty" }),
});

/** The frontmatter of a lesson in content/modules/<slug>.mdx. Unknown keys are rejected so typos fail. */
export const moduleFrontmatterSchema = z.strictObject({
  slug: kebabCaseSchema,
  title: z.string().trim().min(1, { error: "must not be empty" }),
  order: z.number().int().min(1),
  summary: z.string().trim().min(1, { error: "must not be empty" }),
  /** Estimated reading time in whole minutes. */
  minutes: z.number().int().min(1).max(60),
  prerequisites: z.array(kebabCaseSchema).default([]),
  /** Overrides the course-wide quiz pass mark for this module (a fraction, 0.5 to 1). */
  passMark: z.number().min(0.5).max(1).optional(),
  quiz: quizRecipeSchema,
  checklist: z
    .array(checklistItemSchema)
    .min(3, { error: "needs at least 3 items" })
    .max(6, { error: "allows at most 6 items" })
    .refine((items) => new Set(items.map((item) => item.id)).size === items.length, {
      error: "item ids must be unique",
    }),
  /**
   * The caution on the module's practical page: "rigging" (a loose collar or screw on the water) or
   * "cleaning" (the cleaning chemicals: gloves, eye protection, never mixing products).
   */
  practicalCaution: z.enum(["rigging", "cleaning"]).default("rigging"),
  /** Whether a new club counts this module towards "may rig unsupervised" (admins change it per club). */
  requiredForClearance: z.boolean().default(true),
});

/** Frontmatter as written in the file (defaults not yet applied). */
export type ModuleFrontmatterInput = z.input<typeof moduleFrontmatterSchema>;
/** Frontmatter after validation, defaults applied. */
export type ModuleFrontmatter = z.output<typeof moduleFrontmatterSchema>;
/** What the app knows about a module without its lesson body. */
export type ModuleMeta = ModuleFrontmatter;
export type ChecklistItem = z.output<typeof checklistItemSchema>;

/** Turns zod issues into one line per field, e.g. `quiz.items.0.use: Invalid option: …`. */
export function describeIssues(error: z.ZodError): string {
  return error.issues
    .map((issue) => {
      const field = issue.path.length > 0 ? issue.path.map(String).join(".") : "(frontmatter)";
      return `${field}: ${issue.message}`;
    })
    .join("; ");
}
