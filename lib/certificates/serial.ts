/** Serial numbers run per club and calendar year: LR-2026-0001, LR-2026-0002, … (kinds share the run). */

/** The club's serial prefix: the initials of its slug's words, upper case (lantern-reach → LR). */
export function serialPrefixFor(clubSlug: string): string {
  const initials = clubSlug
    .split("-")
    .filter((word) => /^[a-z0-9]/i.test(word))
    .map((word) => word[0]!.toUpperCase())
    .join("")
    .slice(0, 4);
  return initials.length > 0 ? initials : "SW";
}

/** The next number in a club's yearly run: one more than the highest issued so far, 1 for the first. */
export function nextSerialNumber(highestSoFar: number | null): number {
  if (highestSoFar !== null && !(Number.isInteger(highestSoFar) && highestSoFar >= 0)) {
    throw new RangeError(`highest serial number must be a whole number, got ${highestSoFar}`);
  }
  return (highestSoFar ?? 0) + 1;
}

/** PREFIX-YEAR-NNNN; numbers past 9999 simply grow a digit, so the order still reads right. */
export function formatSerial(prefix: string, year: number, serialNumber: number): string {
  if (!(Number.isInteger(serialNumber) && serialNumber >= 1)) throw new RangeError(`serial number must be 1 or more, got ${serialNumber}`);
  return `${prefix}-${year}-${String(serialNumber).padStart(4, "0")}`;
}

const serialPattern = /^([A-Z0-9]{1,4})-(\d{4})-(\d{4,})$/;

/** The parts of a serial, or null for anything not written by formatSerial. */
export function parseSerial(serial: string): { prefix: string; year: number; serialNumber: number } | null {
  const match = serialPattern.exec(serial);
  if (!match) return null;
  return { prefix: match[1]!, year: Number(match[2]), serialNumber: Number(match[3]) };
}
