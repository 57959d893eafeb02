import { roundTo } from "@/lib/rigging/round";

/** A number as people write it: up to `maxDecimals` places, no trailing zeros, a real minus sign. */
export function formatNumber(value: number, maxDecimals = 2): string {
  const text = String(roundTo(value, maxDecimals));
  return text.startsWith("-") ? `−${text.slice(1)}` : text;
}

/** A number with exactly `decimals` places, e.g. "2.370", for worked ratios. */
export function formatFixed(value: number, decimals: number): string {
  // toFixed only pads here: the value is already rounded half away from zero.
  const text = roundTo(value, decimals).toFixed(decimals);
  return text.startsWith("-") ? `−${text.slice(1)}` : text;
}

/** A signed change, e.g. "+1.5" or "−0.5" ("0" for none). */
export function formatSigned(value: number, maxDecimals = 2): string {
  const rounded = roundTo(value, maxDecimals);
  return rounded > 0 ? `+${formatNumber(rounded, maxDecimals)}` : formatNumber(rounded, maxDecimals);
}

/** Centimetres, e.g. "88.5 cm". */
export function formatCm(valueCm: number): string {
  return `${formatNumber(valueCm)} cm`;
}

/** A count of clicks, e.g. "1 click", "4 clicks". */
export function formatClicks(clicks: number): string {
  return clicks === 1 ? "1 click" : `${formatNumber(clicks, 0)} clicks`;
}

/** A number with its unit, singular for exactly one click. */
export function formatWithUnit(value: number, unit: string | undefined): string {
  if (unit === "clicks") return formatClicks(value);
  return unit === undefined ? formatNumber(value, 3) : `${formatNumber(value, 3)} ${unit}`;
}
