import Papa from "papaparse";
import { z } from "zod";
import { roleLabels, roles, type Role } from "@/lib/auth/roles";
import { oneLineTextPattern } from "@/lib/validations/text";
import type { FieldErrors } from "@/lib/http/errors";

/** One upload: at most 200 KB and 500 member rows, so a single request stays small and quick. */
export const rosterLimits = { maxBytes: 200 * 1024, maxRows: 500 } as const;

/** Content types a browser or client may give a CSV file; Windows often labels .csv as a spreadsheet type. */
const acceptedFileTypes = new Set(["", "text/csv", "text/plain", "application/csv", "application/vnd.ms-excel"]);

export type RosterField = "name" | "email" | "role" | "row";

/** What is wrong with one row. Row numbers count the header as row 1, as a spreadsheet shows them. */
export interface RosterProblem {
  row: number;
  field: RosterField;
  message: string;
}

/** A row that can become an invitation. */
export interface RosterEntry {
  row: number;
  name: string;
  email: string;
  role: Role;
}

export interface RosterCheck {
  /** A problem with the file as a whole (no rows are imported when set). */
  fileProblem: string | null;
  /** Member rows read, good or bad (the header not counted). */
  rowCount: number;
  entries: RosterEntry[];
  problems: RosterProblem[];
}

/** What the database already knows, so that the check can refuse existing members and open invitations. */
export interface RosterContext {
  existingEmails?: ReadonlySet<string>;
  pendingEmails?: ReadonlySet<string>;
}

const emailSchema = z.email().max(254);
const maxNameLength = 120;

const headerAliases: Record<string, "name" | "email" | "role"> = {
  name: "name",
  "full name": "name",
  email: "email",
  "e-mail": "email",
  "email address": "email",
  "e-mail address": "email",
  role: "role",
};

const roleByWord = new Map<string, Role>([
  ...roles.map((role) => [role, role] as const),
  ...roles.map((role) => [roleLabels[role].toLowerCase(), role] as const),
  ["administrator", "admin"],
]);

function normaliseHeader(header: string): string {
  const key = header
    .replace(/^\uFEFF/, "")
    .trim()
    .toLowerCase();
  return headerAliases[key] ?? key;
}

/** The problems as field errors, one key a row and column ("rows.3.email"; "rows.3" for the whole row). */
export function rosterProblemFields(problems: readonly RosterProblem[]): FieldErrors {
  const fields = new Map<string, string[]>();
  for (const problem of problems) {
    const key = problem.field === "row" ? `rows.${problem.row}` : `rows.${problem.row}.${problem.field}`;
    fields.set(key, [...(fields.get(key) ?? []), problem.message]);
  }
  return Object.fromEntries(fields);
}

/** The file's size and declared type, checked before its text is read. */
export function rosterFileProblem(file: { size: number; type: string }): string | null {
  if (file.size === 0) return "The file is empty.";
  if (file.size > rosterLimits.maxBytes) return `The file is larger than ${rosterLimits.maxBytes / 1024} KB. Split it into smaller files.`;
  const type = file.type.split(";")[0]!.trim().toLowerCase();
  if (!acceptedFileTypes.has(type)) return "Choose a CSV or plain-text file.";
  return null;
}

/** UTF-8 text from the uploaded bytes, or null when they are not text (invalid UTF-8 or NUL bytes). */
export function decodeRosterText(bytes: Uint8Array): string | null {
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    return null;
  }
  return text.includes("\u0000") ? null : text;
}

function sizeInBytes(text: string): number {
  return new TextEncoder().encode(text).length;
}

/**
 * Reads a roster CSV (columns name, email, optional role; any delimiter papaparse detects) and sorts its
 * rows into entries to invite and problems: missing name, bad e-mail, unknown role, duplicate within the
 * file (the first occurrence is kept), already a member, invitation still open. Pure: the caller passes
 * what the database knows.
 */
export function checkRoster(text: string, context: RosterContext = {}): RosterCheck {
  const empty = (fileProblem: string, rowCount = 0): RosterCheck => ({ fileProblem, rowCount, entries: [], problems: [] });
  if (sizeInBytes(text) > rosterLimits.maxBytes) return empty(`The file is larger than ${rosterLimits.maxBytes / 1024} KB.`);

  const parsed = Papa.parse<Record<string, string | undefined>>(text.replace(/^\uFEFF/, ""), {
    header: true,
    skipEmptyLines: "greedy",
    transformHeader: normaliseHeader,
  });
  const columns = parsed.meta.fields ?? [];
  const missing = (["name", "email"] as const).filter((column) => !columns.includes(column));
  if (missing.length > 0) {
    return empty(`The first row must name the columns: name, email and (optionally) role. Missing: ${missing.join(", ")}.`);
  }
  const rowCount = parsed.data.length;
  if (rowCount === 0) return empty("The file has no member rows under its header.");
  if (rowCount > rosterLimits.maxRows) {
    return empty(`The file has ${rowCount} member rows; import at most ${rosterLimits.maxRows} at a time.`, rowCount);
  }

  const problems: RosterProblem[] = [];
  const entries: RosterEntry[] = [];
  const firstRowByEmail = new Map<string, number>();
  // papaparse counts the header in a quote error's row (but not in a field-count error's): row 1 is data index 0.
  const quoteErrors = new Set(
    parsed.errors
      .filter((error) => error.code === "MissingQuotes" || error.code === "InvalidQuotes")
      .map((error) => Math.min(Math.max((error.row ?? rowCount) - 1, 0), rowCount - 1)),
  );

  parsed.data.forEach((record, index) => {
    const row = index + 2;
    const rowProblems: RosterProblem[] = [];
    if (quoteErrors.has(index)) {
      rowProblems.push({ row, field: "row", message: "A quotation mark is not closed; check this row and the ones after it." });
    }

    const name = (record.name ?? "").trim();
    if (!name) rowProblems.push({ row, field: "name", message: "Missing name." });
    else if (name.length > maxNameLength)
      rowProblems.push({ row, field: "name", message: `Name longer than ${maxNameLength} characters.` });
    else if (!oneLineTextPattern.test(name))
      rowProblems.push({ row, field: "name", message: "Name with control characters (invisible characters): retype it." });

    const rawEmail = (record.email ?? "").trim();
    const email = rawEmail.toLowerCase();
    if (!rawEmail) rowProblems.push({ row, field: "email", message: "Missing e-mail address." });
    else if (!emailSchema.safeParse(email).success)
      rowProblems.push({ row, field: "email", message: `"${rawEmail}" is not an e-mail address.` });
    else if (firstRowByEmail.has(email)) {
      rowProblems.push({
        row,
        field: "email",
        message: `Same e-mail address as row ${firstRowByEmail.get(email)}; an address is invited once, from its first row.`,
      });
    } else if (context.existingEmails?.has(email)) {
      rowProblems.push({ row, field: "email", message: "Already a member: this address has an account." });
    } else if (context.pendingEmails?.has(email)) {
      rowProblems.push({ row, field: "email", message: "Already invited: an invitation to this address is still open." });
    }
    if (email && !firstRowByEmail.has(email)) firstRowByEmail.set(email, row);

    const roleWord = (record.role ?? "").trim().toLowerCase();
    const role = roleWord ? roleByWord.get(roleWord) : "athlete";
    if (!role)
      rowProblems.push({ row, field: "role", message: `Unknown role "${(record.role ?? "").trim()}": use athlete, coach or admin.` });

    if (rowProblems.length > 0 || !role) problems.push(...rowProblems);
    else entries.push({ row, name, email, role });
  });

  return { fileProblem: null, rowCount, entries, problems };
}
