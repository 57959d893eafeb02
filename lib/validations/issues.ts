import type { ZodError } from "zod";
import { ValidationError, type FieldErrors } from "@/lib/http/errors";

/** Groups zod issues by dotted field path ("measured.lengthCm"); issues on the whole object go under "_". */
export function fieldErrorsFrom(error: ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.map(String).join(".") : "_";
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

/** A ValidationError whose message names the first wrong field. */
export function validationErrorFrom(error: ZodError): ValidationError {
  const fields = fieldErrorsFrom(error);
  const [firstField, messages] = Object.entries(fields)[0] ?? ["_", ["Invalid input."]];
  const where = firstField === "_" ? "" : `${firstField}: `;
  return new ValidationError(`${where}${messages[0] ?? "Invalid input."}`, fields);
}
