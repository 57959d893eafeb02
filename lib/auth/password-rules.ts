/** Password length bounds, shared by forms (client) and the server's checks. */
export const minPasswordLength = 10;
/** What the sign-in form accepts (longer input is refused before any hashing). */
export const maxPasswordLength = 128;
/**
 * A new password's limit in UTF-8 bytes: bcrypt uses only the first 72 bytes of its input (bcryptjs's
 * README says so), so a longer password would be accepted with anything after them.
 */
export const maxNewPasswordBytes = 72;

export const newPasswordTooLongMessage = `Use at most ${maxNewPasswordBytes} characters (accented letters count as 2, emoji as 4).`;

/** Whether a new password fits bcrypt's input. */
export function fitsPasswordHash(password: string): boolean {
  return new TextEncoder().encode(password).length <= maxNewPasswordBytes;
}

/** How long after signing in with an e-mail link a member may set a new password without the old one. */
export const linkSessionGraceMinutes = 20;

/**
 * Whether a session may change its password without the current one: only a session started with a
 * one-time e-mail link (which proved the member reads that inbox) in the last `linkSessionGraceMinutes`.
 * This is how a member who forgot their password sets a new one; an older or password session must
 * type the current password, so a phone left signed in at the boathouse cannot be used to take over.
 */
export function mayChangePasswordWithoutCurrent(session: { method: "password" | "link"; signedInAt: Date } | null, now: Date): boolean {
  if (!session || session.method !== "link") return false;
  const age = now.getTime() - session.signedInAt.getTime();
  return age >= -60_000 && age <= linkSessionGraceMinutes * 60_000;
}
