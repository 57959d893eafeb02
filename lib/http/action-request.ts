import { ValidationError } from "@/lib/http/errors";
import { readBodyBytes } from "@/lib/http/route";

/**
 * The edge check of server-action requests (run by proxy.ts before Next decodes them). Next answers a
 * malformed action request with a 500: a body that is not JSON, an argument list that is not a list, a
 * reference React's decoder cannot resolve ("$Q1", "$n12x"), a broken multipart form, an oversized
 * body. Our own client never sends those; whoever does gets a 4xx naming what was wrong, and nothing
 * reaches the action.
 */

/** Next's own limit for a server action's body (its `serverActions.bodySizeLimit` default, 1 MB). */
export const maxActionBodyBytes = 1024 * 1024;

const actionIdPattern = /^[0-9a-f]{42}$/;

/**
 * The tagged strings React's client encodes our actions' arguments with: "$$…" is a literal string that
 * began with "$"; the rest stand for undefined, the non-finite numbers, -0 and a Date. In a multipart body
 * "$K<n>" is a FormData argument, whose entries travel as "<n>_name". Every other tag (maps, sets,
 * promises, streams, server references…) is something no Slipway action takes.
 */
const plainTags = new Set(["$undefined", "$NaN", "$Infinity", "$-Infinity", "$-0"]);

function tagProblem(value: string, multipart: boolean): string | null {
  if (!value.startsWith("$") || value.startsWith("$$") || plainTags.has(value)) return null;
  if (value.startsWith("$D") && !Number.isNaN(Date.parse(value.slice(2)))) return null;
  if (multipart && /^\$K[0-9a-f]{1,8}$/.test(value)) return null;
  return `"${value.length > 20 ? `${value.slice(0, 20)}…` : value}" is not a value this action takes`;
}

/**
 * Checks an action's encoded argument list: a JSON array whose strings carry only the tags above.
 * Walks without recursion, so a deeply nested body cannot exhaust the stack. `field` names the list.
 */
export function argumentListProblem(text: string, options: { multipart: boolean; field: string }): ValidationError | null {
  const { field } = options;
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch {
    return new ValidationError(`${field}: not valid JSON`, { [field]: ["not valid JSON"] });
  }
  if (!Array.isArray(parsed)) {
    return new ValidationError(`${field}: the action's arguments must be a list`, { [field]: ["must be a list of arguments"] });
  }
  const pending: [value: unknown, path: string][] = [[parsed, field]];
  while (pending.length > 0) {
    const [value, path] = pending.pop()!;
    if (typeof value === "string") {
      const problem = tagProblem(value, options.multipart);
      if (problem) return new ValidationError(`${path}: ${problem}`, { [path]: [problem] });
    } else if (Array.isArray(value)) {
      value.forEach((item, index) => pending.push([item, `${path}.${index}`]));
    } else if (value !== null && typeof value === "object") {
      for (const [key, item] of Object.entries(value)) pending.push([item, `${path}.${key}`]);
    }
  }
  return null;
}

function contentTypeOf(request: Request): string {
  return (request.headers.get("content-type") ?? "").split(";")[0]!.trim().toLowerCase();
}

/**
 * Whether Next would treat this POST to a page as a server action: a Next-Action header (the client's
 * fetch), or a multipart form (a form posted without JavaScript).
 */
export function isActionRequest(request: Request): boolean {
  return request.method === "POST" && (request.headers.has("next-action") || contentTypeOf(request) === "multipart/form-data");
}

/**
 * The first problem of a server-action request, or null when Next may decode it. Reads the body (the
 * proxy's own copy), at most maxActionBodyBytes of it.
 */
export async function actionRequestProblem(request: Request): Promise<Error | null> {
  const actionId = request.headers.get("next-action");
  if (actionId !== null && !actionIdPattern.test(actionId)) {
    return new ValidationError("next-action: not an action of this site", { "next-action": ["not an action of this site"] });
  }
  const types = actionId !== null ? ["text/plain", "multipart/form-data"] : ["multipart/form-data"];
  let bytes: Uint8Array;
  try {
    bytes = await readBodyBytes(request, { maxBytes: maxActionBodyBytes, types });
  } catch (error) {
    return error as Error;
  }
  const multipart = contentTypeOf(request) === "multipart/form-data";
  if (!multipart) return argumentListProblem(new TextDecoder().decode(bytes), { multipart: false, field: "body" });
  let form: FormData;
  try {
    form = await new Response(bytes as BlobPart, { headers: { "content-type": request.headers.get("content-type")! } }).formData();
  } catch {
    return new ValidationError("body: not a well-formed multipart form", { body: ["not a well-formed multipart form"] });
  }
  // A form posted without JavaScript carries its own fields, which the action validates itself.
  if (actionId === null) return null;
  const root = form.get("0");
  if (root === null) return new ValidationError("0: the action's arguments are missing", { "0": ["missing"] });
  if (typeof root !== "string")
    return new ValidationError("0: the action's arguments must be a text field, not a file", { "0": ["must be a text field"] });
  return argumentListProblem(root, { multipart: true, field: "0" });
}
