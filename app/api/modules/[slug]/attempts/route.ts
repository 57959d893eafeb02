import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { startOrResumeAttempt } from "@/lib/data/learning";
import { route } from "@/lib/http/route";
import { moduleSlugParamSchema } from "@/lib/validations/learning";
import { validationErrorFrom } from "@/lib/validations/issues";

interface Context {
  params: Promise<{ slug: string }>;
}

/**
 * Starts or resumes the athlete's attempt at a module's quiz: 201 either way (the body says `resumed`);
 * the questions carry no answers.
 */
export const POST = route<Context>(async (_request, context) => {
  const actor = await requireActor();
  const parsed = moduleSlugParamSchema.safeParse(await context.params);
  if (!parsed.success) throw validationErrorFrom(parsed.error);
  const opening = await startOrResumeAttempt(actor, parsed.data.slug);
  return NextResponse.json(opening, { status: 201 });
});
