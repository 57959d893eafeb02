/** Pure helpers of the benchmark: medians, percentiles and the shape of a table row. */

/** The median of the values (the mean of the middle two for an even count); NaN for none. */
export function median(values: readonly number[]): number {
  if (values.length === 0) return Number.NaN;
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  if (sorted.length % 2 === 1) return sorted[middle]!;
  return (sorted[middle - 1]! + sorted[middle]!) / 2;
}

/** The p-th percentile (0–100) by the nearest-rank rule: the smallest value with p % of values at or below it. */
export function percentile(values: readonly number[], p: number): number {
  if (!(p >= 0 && p <= 100)) throw new RangeError(`percentile must be from 0 to 100, got ${p}`);
  if (values.length === 0) return Number.NaN;
  const sorted = [...values].sort((a, b) => a - b);
  const rank = Math.max(1, Math.ceil((p / 100) * sorted.length));
  return sorted[rank - 1]!;
}

export type Verdict = "pass" | "fail" | "report" | "n/a";

/** One line of the results table. `report` rows have no target; `n/a` rows could not be measured. */
export interface Row {
  figure: string;
  value: string;
  baseline: string;
  ratio: string;
  target: string;
  result: Verdict;
}

/** A row for a figure that could not be measured in this build, with the reason in the value column. */
export function notAvailable(figure: string, reason: string, target = "—"): Row {
  return { figure, value: `n/a (${reason})`, baseline: "—", ratio: "—", target, result: "n/a" };
}

/** A number with a fixed count of decimals, or "—" when it is not a finite number. */
export function fixed(value: number, decimals: number): string {
  return Number.isFinite(value) ? value.toFixed(decimals) : "—";
}

function cell(text: string): string {
  return text.replace(/\|/g, "\\|").replace(/\n/g, " ");
}

/** The rows as a GitHub-flavoured markdown table. */
export function markdownTable(rows: readonly Row[]): string {
  const header = ["figure", "value", "baseline", "ratio", "target", "result"];
  const lines = [`| ${header.join(" | ")} |`, `| ${header.map(() => "---").join(" | ")} |`];
  for (const row of rows) {
    lines.push(`| ${[row.figure, row.value, row.baseline, row.ratio, row.target, row.result].map(cell).join(" | ")} |`);
  }
  return lines.join("\n");
}

/** A difference with its sign: "+12.5", "−3.0" (a real minus sign), "—" when not finite. */
export function signed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return "—";
  const text = Math.abs(value).toFixed(decimals);
  return value < 0 && Number(text) !== 0 ? `−${text}` : `+${text}`;
}
