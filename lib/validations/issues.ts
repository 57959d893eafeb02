import type { ZodError } from "zod";
import { ValidationError, type FieldErrors } from "@/lib/http/errors";

/** Groups zod issues by dotted field path ("measured.lengthCm"); issues on the whole object go under "_". */
export function fieldErrorsFrom(error: ZodError): FieldErrors {
  const fields = new FieldErrorList();
  for (const issue of error.issues) fields.add(issue.path.length > 0 ? issue.path.map(String).join(".") : "_", issue.message);
  return fields.toObject();
}

/**
 * Collects messages by field in a Map: a plain object would answer `fields["__proto__"]` with
 * Object.prototype, and a client chooses the keys (an unknown field or query parameter).
 */
class FieldErrorList {
  private readonly byField = new Map<string, string[]>();

  add(field: string, message: string): void {
    const messages = this.byField.get(field);
    if (messages) messages.push(message);
    else this.byField.set(field, [message]);
  }

  /** Own properties only, "__proto__" included (Object.fromEntries defines, never assigns). */
  toObject(): FieldErrors {
    return Object.fromEntries(this.byField);
  }
}

/**
 * Field errors for an HTTP answer, where every message must name its field: an unknown key is reported
 * under its own path ("request.limits"), and an issue with the input as a whole (not an object, say)
 * under `root` ("body" for a JSON body, "query" for a query string).
 */
export function requestFieldErrorsFrom(error: ZodError, root = "body"): FieldErrors {
  const fields = new FieldErrorList();
  for (const issue of error.issues) {
    if (issue.code === "unrecognized_keys") {
      const message = root === "query" ? "not a parameter of this address" : "not a field of this request";
      for (const key of issue.keys) fields.add([...issue.path.map(String), key].join("."), message);
      continue;
    }
    fields.add(issue.path.length > 0 ? issue.path.map(String).join(".") : root, issue.message);
  }
  return fields.toObject();
}

/** A ValidationError whose message names the first wrong field. */
export function validationErrorFrom(error: ZodError, root = "body"): ValidationError {
  const fields = requestFieldErrorsFrom(error, root);
  const [firstField, messages] = Object.entries(fields)[0] ?? [root, ["Invalid input."]];
  return new ValidationError(`${firstField}: ${messages[0] ?? "Invalid input."}`, fields);
}
