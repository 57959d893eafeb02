import "server-only";
import { QueryTypes, type Transaction } from "sequelize";
import { getSequelize, readStatement, type SqlValue } from "@/lib/db";

/**
 * Plain SQL for the few hottest statements (the session check on every request, the quiz submission):
 * a Sequelize model query costs about 1 ms more than the same statement through `sequelize.query`, and
 * that about 0.3 ms more than sqlite3 itself, so outside a transaction the statement goes straight to
 * the read connection (`readStatement`). Everything else uses the models. Values are always bound (`?`
 * placeholders), never spliced into the SQL.
 */
export async function selectRows<Row extends object>(
  sql: string,
  replacements: readonly SqlValue[],
  transaction?: Transaction,
): Promise<Row[]> {
  if (!transaction) return readStatement<Row>(sql, replacements);
  return getSequelize().query<Row>(sql, { replacements: [...replacements], type: QueryTypes.SELECT, transaction });
}

/** A DATE column of a raw row: SQLite text such as "2026-09-12 06:53:47.297 +00:00" (or a Date, or null). */
export function rawDate(value: unknown): Date | null {
  if (value === null || value === undefined) return null;
  return value instanceof Date ? value : new Date(String(value));
}

/** A BOOLEAN column of a raw row: SQLite's 0/1 (or a boolean, or null). */
export function rawBoolean(value: unknown): boolean | null {
  if (value === null || value === undefined) return null;
  return value === true || value === 1 || value === "1";
}

/** A JSON column of a raw row (stored as text), or null. */
export function rawJson<T>(value: unknown): T | null {
  if (value === null || value === undefined) return null;
  return (typeof value === "string" ? JSON.parse(value) : value) as T;
}

/** A Date as Sequelize's SQLite dialect stores DATE columns ("2026-12-02 06:00:00.000 +00:00"), so models read it back alike. */
export function sqliteDateTime(date: Date): string {
  return `${date.toISOString().slice(0, 23).replace("T", " ")} +00:00`;
}
