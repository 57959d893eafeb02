import { z } from "zod";

/** The longest module name a request may carry; the course's own are far shorter. */
export const maxModuleSlugLength = 60;

export const moduleSlugParamSchema = z.strictObject({
  slug: z
    .string()
    .max(maxModuleSlugLength)
    .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, { error: "not a module name" }),
});

export const attemptIdParamSchema = z.strictObject({
  id: z.uuid({ error: "not an attempt id" }),
});
