import { AppError, type FieldErrors } from "@/lib/http/errors";

/**
 * What every server action returns: never a thrown error, never a 500. A refusal may carry `data` the
 * form shows beside it (the roster import's report when no row could be invited).
 */
export type ActionResult<T = undefined> =
  { ok: true; message?: string; data?: T } | { ok: false; message: string; fieldErrors: FieldErrors; data?: T };

/** Maps a typed error to an action's failure result; unexpected errors are logged and stay vague. */
export function actionFailure(error: unknown): { ok: false; message: string; fieldErrors: FieldErrors } {
  if (error instanceof AppError) return { ok: false, message: error.message, fieldErrors: error.fieldErrors ?? {} };
  console.error("Unexpected error in server action", error);
  return { ok: false, message: "Something went wrong on our side. Try again.", fieldErrors: {} };
}
