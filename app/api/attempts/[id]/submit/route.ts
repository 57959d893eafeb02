import { requireActor } from "@/lib/auth/session";
import { submitAttempt } from "@/lib/data/learning";
import { lookUpBy } from "@/lib/http/look-up";
import { jsonResponse, readJson, readParams, route } from "@/lib/http/route";
import { attemptIdParamSchema } from "@/lib/validations/learning";
import { quizSubmissionSchema } from "@/lib/validations/quiz";

interface Context {
  params: Promise<{ id: string }>;
}

/**
 * Grades a submission once: 200 with the result, 409 (with the stored result) for a repeat; 400 for an
 * id that is not a UUID, 404 naming the id when the attempt is unknown or not yours.
 */
export const POST = route<Context>(async (request, context) => {
  const actor = await requireActor();
  const { id } = await readParams(context.params, attemptIdParamSchema);
  const { answers } = await readJson(request, quizSubmissionSchema);
  const result = await lookUpBy("id", "attempt", () => submitAttempt(actor, id, answers));
  return jsonResponse(result);
});
