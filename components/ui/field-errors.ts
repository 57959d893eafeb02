import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import type { FieldErrors } from "@/lib/http/errors";

/**
 * Puts a server action's field errors beside the form's own fields (the first message of each). Errors
 * about fields the form does not have are left to the form's status line, which shows the action's message.
 */
export function showFieldErrors<T extends FieldValues>(
  setError: UseFormSetError<T>,
  fieldErrors: FieldErrors,
  fields: readonly Path<T>[],
): void {
  for (const [field, messages] of Object.entries(fieldErrors)) {
    const known = fields.find((name) => name === field);
    if (known && messages[0]) setError(known, { message: messages[0] });
  }
}
