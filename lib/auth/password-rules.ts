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
