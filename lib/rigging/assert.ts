/** Throws a RangeError unless `value` is a finite number greater than zero. */
export function assertPositiveCm(name: string, value: number): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a finite number above 0, got ${value}`);
  }
}

/** Throws a RangeError unless `value` is a finite number of zero or more. */
export function assertNonNegativeCm(name: string, value: number): void {
  if (!Number.isFinite(value) || value < 0) {
    throw new RangeError(`${name} must be a finite number of 0 or more, got ${value}`);
  }
}

/** Throws a RangeError unless `value` is a finite number. */
export function assertFiniteCm(name: string, value: number): void {
  if (!Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number, got ${value}`);
  }
}

/** Throws a RangeError unless the inboard is shorter than the overall length. */
export function assertInboardShorter(lengthCm: number, inboardCm: number): void {
  assertPositiveCm("lengthCm", lengthCm);
  assertPositiveCm("inboardCm", inboardCm);
  if (inboardCm >= lengthCm) {
    throw new RangeError(`inboardCm (${inboardCm}) must be shorter than lengthCm (${lengthCm})`);
  }
}
