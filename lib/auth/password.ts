import bcrypt from "bcryptjs";
import zxcvbn from "zxcvbn";

import { fitsPasswordHash, maxPasswordLength, minPasswordLength, newPasswordTooLongMessage } from "@/lib/auth/password-rules";

export { maxPasswordLength, minPasswordLength };
const bcryptCost = 11;

/**
 * Length and commonness only, no composition rules (NIST SP 800-63B, 2017, section 5.1.1.2): at least 10
 * characters, and not one of the well-known common passwords (zxcvbn's password list) or trivially guessable.
 */
export function passwordProblem(password: string): string | null {
  if (password.length < minPasswordLength) return `Use at least ${minPasswordLength} characters.`;
  if (!fitsPasswordHash(password)) return newPasswordTooLongMessage;
  const estimate = zxcvbn(password.slice(0, 100));
  const wholeIsCommon = estimate.sequence.some(
    (match) =>
      match.pattern === "dictionary" &&
      (match as { dictionary_name?: string }).dictionary_name === "passwords" &&
      match.token.length >= password.length - 2,
  );
  if (wholeIsCommon || estimate.score === 0) {
    return "That password is too common. Try a few unrelated words together.";
  }
  return null;
}

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, bcryptCost);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

let decoyHash: Promise<string> | undefined;

/** Spends the same time as a real check when the account is unknown, so timing says nothing. */
export async function verifyAgainstDecoy(password: string): Promise<false> {
  decoyHash ??= bcrypt.hash("slipway-decoy-password", bcryptCost);
  await bcrypt.compare(password, await decoyHash);
  return false;
}
