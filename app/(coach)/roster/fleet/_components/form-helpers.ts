import { parseCmInput } from "@/components/lessons/lesson-format";

/** A typed centimetre value (decimal comma accepted); NaN when it is not a number, so zod names the field. */
export function cmValue(value: unknown): number {
  return parseCmInput(String(value ?? "")) ?? Number.NaN;
}

/** An optional centimetre value: empty is "not given". */
export function optionalCmValue(value: unknown): number | undefined {
  const text = String(value ?? "").trim();
  return text === "" ? undefined : cmValue(text);
}

/** A typed whole number; NaN when it is not one. */
export function wholeValue(value: unknown): number {
  const text = String(value ?? "").trim();
  return /^\d+$/.test(text) ? Number(text) : Number.NaN;
}
