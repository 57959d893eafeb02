import path from "node:path";
import sqlite3 from "sqlite3";
import { expect, type APIRequestContext, type APIResponse } from "@playwright/test";

/** One malformed JSON request: a body (object → JSON; string → sent raw) and an optional content type. */
export interface BadInput {
  label: string;
  body: unknown;
  contentType?: string;
}

export const huge = "x".repeat(70_000);

/** Malformed bodies every JSON endpoint must refuse with a 4xx JSON message (never 5xx, never a stack). */
export function commonBadInputs(validBody: Record<string, unknown>, numericKeys: string[] = []): BadInput[] {
  const keys = Object.keys(validBody);
  const inputs: BadInput[] = [
    { label: "not JSON", body: "{not json", contentType: "application/json" },
    { label: "truncated JSON", body: JSON.stringify(validBody).slice(0, -3), contentType: "application/json" },
    { label: "empty body", body: "", contentType: "application/json" },
    { label: "JSON null", body: "null", contentType: "application/json" },
    { label: "JSON array", body: "[]", contentType: "application/json" },
    { label: "JSON string", body: '"hello"', contentType: "application/json" },
    { label: "JSON number", body: "42", contentType: "application/json" },
    { label: "form encoded", body: "a=1&b=2", contentType: "application/x-www-form-urlencoded" },
    { label: "plain text", body: JSON.stringify(validBody), contentType: "text/plain" },
    { label: "no content type", body: JSON.stringify(validBody), contentType: "" },
    { label: "empty object", body: {} },
    { label: "extra field", body: { ...validBody, sneaky: true } },
    { label: "prototype pollution", body: JSON.parse(`{"__proto__": {"admin": true}, ${JSON.stringify(validBody).slice(1)}`) as unknown },
    { label: "huge body", body: { ...validBody, padding: huge } },
  ];
  for (const key of keys) {
    const rest = { ...validBody };
    delete rest[key];
    inputs.push({ label: `missing ${key}`, body: rest });
    inputs.push({ label: `${key} null`, body: { ...validBody, [key]: null } });
    inputs.push({ label: `${key} wrong type (array)`, body: { ...validBody, [key]: [1, 2] } });
    inputs.push({ label: `${key} wrong type (boolean)`, body: { ...validBody, [key]: true } });
    inputs.push({ label: `${key} huge string`, body: { ...validBody, [key]: huge.slice(0, 5000) } });
  }
  for (const key of numericKeys) {
    inputs.push({ label: `${key} "NaN"`, body: { ...validBody, [key]: "NaN" } });
    inputs.push({ label: `${key} "Infinity"`, body: { ...validBody, [key]: "Infinity" } });
    inputs.push({ label: `${key} negative`, body: { ...validBody, [key]: -1 } });
    inputs.push({ label: `${key} huge number`, body: { ...validBody, [key]: 1e308 } });
  }
  return inputs;
}

let callNumber = 0;

/**
 * A different documentation address per call, so the public planner's per-address throttle never
 * answers these (and later specs from 127.0.0.1 keep their budget).
 */
export function nextClientAddress(): string {
  callNumber += 1;
  return `198.18.${Math.floor(callNumber / 250)}.${callNumber % 250}`;
}

interface RefusalBody {
  message?: string;
  fields?: Record<string, string[]>;
}

/** What is wrong with one answer to a malformed request, or nothing: 4xx, JSON, a message, no stack trace. */
function refusalProblems(label: string, status: number, text: string): { problems: string[]; body: RefusalBody | null } {
  let body: RefusalBody;
  try {
    body = JSON.parse(text) as RefusalBody;
  } catch {
    return { problems: [`${label}: not JSON (${status}) ${text.slice(0, 80)}`], body: null };
  }
  const problems: string[] = [];
  if (status < 400 || status >= 500) problems.push(`${label}: status ${status}`);
  if (!body.message) problems.push(`${label}: no message`);
  if (/\bat .+\.(js|ts):\d+/.test(text)) problems.push(`${label}: stack trace in body`);
  return { problems, body };
}

/**
 * The field a refusal of one commonBadInputs input must name: the key the input breaks ("missing
 * email", "email null"), the Content-Type header for a body that is not sent as JSON, the unknown key
 * for an extra field, and "body" for a body that is not one JSON object. `emptyObject` is what an
 * empty object is refused for: the schema's first required field.
 */
function fieldOfCommon(validBody: Record<string, unknown>, label: string, emptyObject: string): string {
  const key = Object.keys(validBody).find((name) => label.startsWith(`missing ${name}`) || label.startsWith(`${name} `));
  if (key) return key;
  if (label === "plain text" || label === "no content type" || label === "form encoded") return "content-type";
  if (label === "extra field") return "sneaky";
  if (label === "prototype pollution") return "__proto__";
  if (label === "empty object") return emptyObject;
  return "body";
}

/** commonBadInputs as RefusalCases (for expectAllRefusedNaming), each naming the field of fieldOfCommon. */
export function commonRefusalCases(
  validBody: Record<string, unknown>,
  options: { emptyObject: string; numericKeys?: string[] },
): RefusalCase[] {
  return commonBadInputs(validBody, options.numericKeys).map((input) =>
    jsonCase(input, fieldOfCommon(validBody, input.label, options.emptyObject)),
  );
}

/** A multipart part as Playwright sends it. */
export type MultipartValue = string | { name: string; mimeType: string; buffer: Buffer };

/**
 * One malformed request of any shape, and the field its refusal must name: a key of the answer's
 * `fields` (or a dotted path under it), or a whole word of its message.
 */
export interface RefusalCase {
  label: string;
  field: string;
  /** The exact status, where it matters (404 for an unknown id, 413, 415). */
  status?: number;
  /** Defaults to the table's url. */
  url?: string;
  method?: string;
  headers?: Record<string, string>;
  body?: string | Buffer;
  multipart?: Record<string, MultipartValue>;
}

/** A JSON-table input as a RefusalCase (POST unless the table says otherwise), with the field it must name. */
export function jsonCase(input: BadInput, field: string): RefusalCase {
  const raw = typeof input.body === "string";
  return {
    label: input.label,
    field,
    headers: { "Content-Type": input.contentType ?? "application/json" },
    body: Buffer.from(raw ? (input.body as string) : JSON.stringify(input.body)),
  };
}

function namesField(body: RefusalBody, field: string): boolean {
  const wanted = field.toLowerCase();
  const keys = Object.keys(body.fields ?? {}).map((key) => key.toLowerCase());
  if (keys.some((key) => key === wanted || key.startsWith(`${wanted}.`))) return true;
  const escaped = wanted.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
  return new RegExp(`(^|[^a-z0-9-])${escaped}([^a-z0-9-]|$)`).test((body.message ?? "").toLowerCase());
}

/**
 * Sends every case and expects each to be refused: 4xx (the given status where one is set), a JSON
 * body with a message that names the field, no stack trace. Collects every failure before asserting.
 */
export async function expectAllRefusedNaming(
  session: APIRequestContext,
  table: { url: string; method?: string },
  cases: RefusalCase[],
): Promise<void> {
  expect(cases.length).toBeGreaterThanOrEqual(30);
  const failures: string[] = [];
  for (const refusal of cases) {
    let response: APIResponse;
    try {
      response = await session.fetch(refusal.url ?? table.url, {
        method: refusal.method ?? table.method ?? "GET",
        headers: { "x-forwarded-for": nextClientAddress(), ...refusal.headers },
        maxRedirects: 0,
        ...(refusal.body !== undefined ? { data: Buffer.from(refusal.body) } : {}),
        ...(refusal.multipart ? { multipart: refusal.multipart } : {}),
      });
    } catch (error) {
      failures.push(`${refusal.label}: the request could not be sent (${(error as Error).message.split("\n")[0]})`);
      continue;
    }
    const status = response.status();
    const { problems, body } = refusalProblems(refusal.label, status, await response.text());
    failures.push(...problems);
    if (refusal.status !== undefined && status !== refusal.status)
      failures.push(`${refusal.label}: status ${status}, expected ${refusal.status}`);
    if (body && !namesField(body, refusal.field)) {
      failures.push(`${refusal.label}: does not name "${refusal.field}": ${body.message} ${JSON.stringify(body.fields ?? {})}`);
    }
  }
  expect(failures, failures.join("\n")).toEqual([]);
}

/**
 * The id of a demo-club record, read straight from the e2e server's SQLite file (like storedQuestions):
 * the bad-input tables need real ids to make every case wrong in exactly one way.
 */
export function demoClubRecordId(table: "boats" | "oar_sets", name: string): Promise<number> {
  const file = path.join(process.cwd(), ".e2e-data", "slipway.sqlite");
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(file, sqlite3.OPEN_READONLY, (openError) => {
      if (openError) return reject(openError);
      db.get<{ id: number }>(
        `SELECT t.id FROM ${table} t JOIN clubs c ON c.id = t.club_id WHERE c.slug = 'lantern-reach' AND t.name = ?`,
        [name],
        (error, row) => {
          db.close();
          if (error) return reject(error);
          if (!row) return reject(new Error(`${table} "${name}" not found`));
          resolve(row.id);
        },
      );
    });
  });
}
