import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { startOrResumeAttempt } from "@/lib/data/learning";
import { lookUpBy } from "@/lib/http/look-up";
import { readParams, route } from "@/lib/http/route";
import { moduleSlugParamSchema } from "@/lib/validations/learning";

interface Context {
  params: Promise<{ slug: string }>;
}

/**
 * Starts or resumes the athlete's attempt at a module's quiz: 201 either way (the body says `resumed`);
 * the questions carry no answers. 400 for a malformed slug, 404 for an unknown module; the body is not read.
 */
export const POST = route<Context>(async (_request, context) => {
  const actor = await requireActor();
  const { slug } = await readParams(context.params, moduleSlugParamSchema);
  const opening = await lookUpBy("slug", "module", () => startOrResumeAttempt(actor, slug));
  return NextResponse.json(opening, { status: 201 });
});
