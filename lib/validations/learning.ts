import { z } from "zod";

export const moduleSlugParamSchema = z.strictObject({
  slug: z.string().max(60).regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, { error: "not a module name" }),
});

export const attemptIdParamSchema = z.strictObject({
  id: z.uuid({ error: "not an attempt id" }),
});
