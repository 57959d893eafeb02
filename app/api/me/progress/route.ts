import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { courseProgressFor } from "@/lib/data/learning";
import { readQuery, route } from "@/lib/http/route";
import { noQuerySchema } from "@/lib/validations/paging";

export const dynamic = "force-dynamic";

/**
 * Each module's lesson state, best score, passed flag and attempt count for the signed-in athlete.
 * Takes no parameters (400 naming any), like the roster matrix.
 */
export const GET = route(async (request) => {
  const actor = await requireActor();
  readQuery(request, noQuerySchema);
  const course = await courseProgressFor(actor);
  return NextResponse.json({
    modules: course.map(({ meta, progress }) => ({
      slug: meta.slug,
      title: meta.title,
      order: meta.order,
      lessonRead: progress.lessonRead,
      stage: progress.stage,
      bestScore: progress.bestScore,
      passed: progress.passed,
      attempts: progress.attempts,
    })),
  });
});
