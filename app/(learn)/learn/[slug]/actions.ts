"use server";

import { redirect } from "next/navigation";
import { currentActor } from "@/lib/auth/session";
import { markLessonRead } from "@/lib/data/learning";
import { moduleSlugParamSchema } from "@/lib/validations/learning";

/**
 * The "I've read it" button: records the read and goes on to the quiz. A plain form action, so it works
 * without JavaScript; a visitor whose session ended is sent to sign in and brought back to the lesson.
 */
export async function finishLessonAction(formData: FormData): Promise<void> {
  const parsed = moduleSlugParamSchema.safeParse({ slug: formData.get("slug") });
  if (!parsed.success) redirect("/learn");
  const actor = await currentActor();
  if (!actor) redirect(`/sign-in?callbackUrl=${encodeURIComponent(`/learn/${parsed.data.slug}`)}`);
  await markLessonRead(actor, parsed.data.slug);
  redirect(`/learn/${parsed.data.slug}/quiz`);
}
