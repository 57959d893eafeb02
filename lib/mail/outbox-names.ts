/**
 * Names of the demo outbox's files. nodemailer's JSON transport stores no date, so the moment a message
 * was written is kept in its name (the ISO instant with ":" and "." made file-safe, then a random suffix).
 */
export function outboxMessageId(sentAt: Date, suffix: string): string {
  return `${sentAt.toISOString().replace(/[:.]/g, "-")}-${suffix}`;
}

const idInstant = /^(\d{4}-\d{2}-\d{2})T(\d{2})-(\d{2})-(\d{2})-(\d{3})Z-/;

/** The ISO instant an outbox message id was made at, or null when the id does not start with one. */
export function sentAtOfOutboxId(id: string): string | null {
  const match = idInstant.exec(id);
  if (!match) return null;
  const [, day, hours, minutes, seconds, millis] = match;
  const instant = new Date(`${day}T${hours}:${minutes}:${seconds}.${millis}Z`);
  return Number.isNaN(instant.getTime()) ? null : instant.toISOString();
}
