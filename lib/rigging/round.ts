/** Significant digits kept before rounding, enough for any oar measurement and short of float noise. */
const SIGNIFICANT_DIGITS = 15;

/**
 * Rounds half away from zero to `decimals` places, ignoring binary float noise
 * (roundTo(0.1 + 0.2, 1) is 0.3, roundTo(1.005, 2) is 1.01) and never returning -0.
 * Non-finite values are returned unchanged.
 */
export function roundTo(value: number, decimals: number): number {
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 10) {
    throw new RangeError(`decimals must be a whole number from 0 to 10, got ${decimals}`);
  }
  if (!Number.isFinite(value)) return value;
  const factor = 10 ** decimals;
  // toPrecision drops the noise in the last bits (100.49999999999999 becomes 100.5) before rounding.
  const scaled = Number((Math.abs(value) * factor).toPrecision(SIGNIFICANT_DIGITS));
  const rounded = (Math.sign(value) * Math.round(scaled)) / factor;
  return rounded === 0 ? 0 : rounded;
}

/** Centimetre results keep two decimals (a tenth of a millimetre): finer than any tape, coarser than float noise. */
export function roundCm(valueCm: number): number {
  return roundTo(valueCm, 2);
}
