import { z } from "zod";

/** The largest record id a request may name (the ids of the integer-keyed tables start at 1). */
export const maxRecordId = 2_147_483_647;

/**
 * A record id given as a value (a server action's argument or a field of its input), never text to
 * coerce: the forms send the numbers they were rendered with, and `Number()` would also read true, [7],
 * " 7 ", "0x7" and a Date as ids. Ids in page addresses are text: `recordIdSchema` (lib/validations/fleet.ts).
 */
export const recordIdValueSchema = z
  .number({ error: "Not a record id: expected a whole number." })
  .int({ error: "Not a record id: expected a whole number." })
  .min(1, { error: "Not a record id: ids start at 1." })
  .max(maxRecordId, { error: "Not a record id: too large." });

/** A UUID record id (sign-offs, certificates, photos) given as a server action's argument. */
export const uuidValueSchema = z.uuid({ error: "Not a record id: expected a UUID." });
