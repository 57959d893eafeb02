import Papa from "papaparse";

export interface CsvColumn<Row> {
  header: string;
  value: (row: Row) => string | number | boolean | null | undefined;
}

/**
 * Rows to CSV text (RFC 4180 quoting by papaparse). Cells that begin with = + - @ (or tab / CR) are
 * prefixed with a quote mark so spreadsheet programs do not run them as formulae (OWASP "CSV Injection").
 */
export function toCsv<Row>(rows: readonly Row[], columns: readonly CsvColumn<Row>[]): string {
  return Papa.unparse(
    {
      fields: columns.map((column) => column.header),
      data: rows.map((row) => columns.map((column) => column.value(row) ?? "")),
    },
    { escapeFormulae: true, newline: "\r\n" },
  );
}

/** Headers for a CSV download with a safe file name. */
export function csvDownloadHeaders(fileName: string): Record<string, string> {
  const safe = fileName.replace(/[^A-Za-z0-9._-]/g, "-");
  return {
    "Content-Type": "text/csv; charset=utf-8",
    "Content-Disposition": `attachment; filename="${safe}"`,
    "X-Content-Type-Options": "nosniff",
    "Cache-Control": "no-store",
  };
}
