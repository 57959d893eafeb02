import type { z, ZodError, ZodType } from "zod";
import { ValidationError, type FieldErrors } from "@/lib/http/errors";

/**
 * Groups zod issues by dotted field path ("measured.lengthCm") for a form; an unknown key is reported
 * under its own path ("limits.coastal"), other issues with the input as a whole under "_".
 */
export function fieldErrorsFrom(error: ZodError): FieldErrors {
  const fields = new FieldErrorList();
  for (const issue of error.issues) {
    if (issue.code === "unrecognized_keys") {
      for (const key of issue.keys) fields.add([...issue.path.map(String), key].join("."), "Not a field of this form.");
      continue;
    }
    fields.add(issue.path.length > 0 ? issue.path.map(String).join(".") : "_", issue.message);
  }
  return fields.toObject();
}

/** A server action's checked input: the parsed value, or the field errors to answer with. */
export type ActionInputCheck<T> = { success: true; data: T } | { success: false; fieldErrors: FieldErrors };

/** An object made by JSON or an object literal (React's action protocol makes its objects so). */
function isPlainObject(value: unknown): value is Record<string, unknown> {
  if (typeof value !== "object" || value === null) return false;
  const prototype: unknown = Object.getPrototypeOf(value);
  return prototype === Object.prototype || prototype === null;
}

/**
 * safeParse of a server action's object input, with fieldErrorsFrom's names. React's action protocol
 * also delivers Maps, Sets, Dates, FormData and files, and zod's object schemas read some of them as
 * objects without fields (a schema whose fields are all optional would take a Map as `{}`): anything
 * but a plain object is refused as a whole, under "_".
 */
export function parseActionInput<S extends ZodType>(schema: S, input: unknown): ActionInputCheck<z.output<S>> {
  if (!isPlainObject(input)) return { success: false, fieldErrors: { _: ["Send the form's fields as one object."] } };
  const parsed = schema.safeParse(input);
  return parsed.success ? { success: true, data: parsed.data } : { success: false, fieldErrors: fieldErrorsFrom(parsed.error) };
}

/** safeParse of one positional argument of a server action (the id a page bound to its form); errors go under `name`. */
export function parseActionArgument<S extends ZodType>(name: string, schema: S, value: unknown): ActionInputCheck<z.output<S>> {
  const parsed = schema.safeParse(value);
  if (parsed.success) return { success: true, data: parsed.data };
  return { success: false, fieldErrors: { [name]: parsed.error.issues.map((issue) => issue.message) } };
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
