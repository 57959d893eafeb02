import { unstable_isUnrecognizedActionError, unstable_rethrow } from "next/navigation";
import type { FieldErrors } from "@/lib/http/errors";

/** What a form shows when its server action got no answer at all. */
export interface UnreachedAction {
  ok: false;
  message: string;
  fieldErrors: FieldErrors;
  data?: undefined;
}

/**
 * The message for an action that got no answer. Offline, the request never left the device; otherwise it
 * may have been carried out with only the answer lost, so the message does not claim nothing was saved.
 */
export function unreachedMessage(online: boolean): string {
  return online
    ? "Slipway did not answer, so this may not have been saved. Your entries are still here: try again, and reload the page if it keeps happening."
    : "You are offline, so nothing was saved. Your entries are still here: try again once you have a connection.";
}

/**
 * The message for an action the server no longer has: the page was opened before Slipway was updated.
 * The server refused it before running anything, so nothing was saved, but only a reload fixes it.
 */
export const outdatedPageMessage =
  "Slipway was updated after this page was opened, so nothing was saved. Reload the page and enter it again (reloading clears this form).";

/**
 * Calls a server action from a form. A server action that cannot be reached (the phone lost its signal at
 * the boathouse, the server restarted, the tab is older than the last deployment) rejects instead of
 * returning its result: the form would then say nothing, keep a button busy, or (inside a transition)
 * give way to the error page. Here that becomes an ordinary failure the form shows beside its entries,
 * worded for each case: offline, no answer, or an action the updated server no longer has.
 */
export async function reachAction<T>(call: () => Promise<T>): Promise<T | UnreachedAction> {
  try {
    return await call();
  } catch (error) {
    // Next's own signals (an action's redirect or notFound) are not failures: they go on to its router.
    unstable_rethrow(error);
    if (unstable_isUnrecognizedActionError(error)) return { ok: false, message: outdatedPageMessage, fieldErrors: {} };
    const online = typeof navigator === "undefined" || navigator.onLine !== false;
    console.warn("A server action got no answer", error);
    return { ok: false, message: unreachedMessage(online), fieldErrors: {} };
  }
}
