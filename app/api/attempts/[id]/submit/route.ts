import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { submitAttempt } from "@/lib/data/learning";
import { readJson, route } from "@/lib/http/route";
import { attemptIdParamSchema } from "@/lib/validations/learning";
import { quizSubmissionSchema } from "@/lib/validations/quiz";
import { validationErrorFrom } from "@/lib/validations/issues";

interface Context {
  params: Promise<{ id: string }>;
}

/** Grades a submission once: 200 with the result, 409 (with the stored result) for a repeat, 404 if not yours. */
export const POST = route<Context>(async (request, context) => {
  const actor = await requireActor();
  const params = attemptIdParamSchema.safeParse(await context.params);
  if (!params.success) throw validationErrorFrom(params.error);
  const { answers } = await readJson(request, quizSubmissionSchema);
  const result = await submitAttempt(actor, params.data.id, answers);
  return NextResponse.json(result);
});
