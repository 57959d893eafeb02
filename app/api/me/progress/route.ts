import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { courseProgressFor } from "@/lib/data/learning";
import { route } from "@/lib/http/route";

export const dynamic = "force-dynamic";

/** Each module's lesson state, best score, passed flag and attempt count for the signed-in athlete. */
export const GET = route(async () => {
  const actor = await requireActor();
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
