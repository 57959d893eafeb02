"use server";

import { redirect } from "next/navigation";
import { currentActor } from "@/lib/auth/session";
import { markLessonRead } from "@/lib/data/learning";
import { NotFoundError } from "@/lib/http/errors";
import { moduleSlugParamSchema } from "@/lib/validations/learning";

/**
 * The form's one value of `name`, or null when the argument is not FormData or the field is missing,
 * repeated or a file. Other fields are ignored: once scripts run, React's own hidden `$ACTION_ID_…`
 * input is part of the form's FormData.
 */
function soleFormValue(formData: unknown, name: string): string | null {
  if (!(formData instanceof FormData)) return null;
  const values = formData.getAll(name);
  return values.length === 1 && typeof values[0] === "string" ? values[0] : null;
}

/**
 * The "I've read it" button: records the read and goes on to the quiz. A plain form action, so it works
 * without JavaScript; a visitor whose session ended is sent to sign in and brought back to the lesson.
 * A malformed form, or a module the course does not have, goes back to the course page.
 */
export async function finishLessonAction(formData: FormData): Promise<void> {
  const parsed = moduleSlugParamSchema.safeParse({ slug: soleFormValue(formData, "slug") });
  if (!parsed.success) redirect("/learn");
  const { slug } = parsed.data;
  const actor = await currentActor();
  if (!actor) redirect(`/sign-in?callbackUrl=${encodeURIComponent(`/learn/${slug}`)}`);
  const recorded = await markLessonRead(actor, slug).then(
    () => true,
    (error: unknown) => {
      if (error instanceof NotFoundError) return false;
      throw error;
    },
  );
  redirect(recorded ? `/learn/${slug}/quiz` : "/learn");
}
