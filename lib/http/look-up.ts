import { NotFoundError } from "@/lib/http/errors";

/**
 * Runs a look-up addressed by a field the caller sent (a route's path parameter, an action's id
 * argument or input field); its NotFoundError (missing, or not yours) becomes one that names that field:
 * "id: no such certificate". A NotFoundError that already names its own field (a module slug inside a
 * member's request, say) is passed on as it is, so it is not blamed on `field`.
 */
export async function lookUpBy<T>(field: string, what: string, work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (error instanceof NotFoundError && !error.fieldErrors) {
      throw new NotFoundError(`${field}: no such ${what}.`, { [field]: [`no such ${what}`] });
    }
    throw error;
  }
}
