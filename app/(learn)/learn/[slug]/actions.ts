"use server";

import { redirect } from "next/navigation";
import { requireActor } from "@/lib/auth/session";
import { markLessonRead } from "@/lib/data/learning";
import { moduleSlugParamSchema } from "@/lib/validations/learning";

/** The "I've read it" button: records the read and goes on to the quiz (works without JavaScript). */
export async function finishLessonAction(formData: FormData): Promise<void> {
  const actor = await requireActor();
  const parsed = moduleSlugParamSchema.safeParse({ slug: formData.get("slug") });
  if (!parsed.success) redirect("/learn");
  await markLessonRead(actor, parsed.data.slug);
  redirect(`/learn/${parsed.data.slug}/quiz`);
}
