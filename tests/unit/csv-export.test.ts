import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { csvDownloadHeaders, toCsv } from "@/lib/csv/export";

interface Row {
  name: string;
  score: number;
}

const columns = [
  { header: "Name", value: (row: Row) => row.name },
  { header: "Score", value: (row: Row) => row.score },
];

describe("CSV export", () => {
  it("quotes commas and quotes so the file parses back to the same values", () => {
    const csv = toCsv([{ name: 'Ada "the stroke", Whitcombe', score: 0.9 }], columns);
    const parsed = Papa.parse<string[]>(csv.trim());
    expect(parsed.data).toEqual([
      ["Name", "Score"],
      ['Ada "the stroke", Whitcombe', "0.9"],
    ]);
  });

  it.each(['=HYPERLINK("x")', "+1+1", "-2+3", "@SUM(A1)"])(
    "neutralises a cell beginning like a formula: %s (OWASP CSV Injection)",
    (name) => {
      const csv = toCsv([{ name, score: 1 }], columns);
      const cell = Papa.parse<string[]>(csv.trim()).data[1]?.[0];
      expect(cell).toBe(`'${name}`);
    },
  );

  it("names the download safely", () => {
    expect(csvDownloadHeaders('reg"ister/../x.csv')["Content-Disposition"]).toBe('attachment; filename="reg-ister-..-x.csv"');
  });
});
