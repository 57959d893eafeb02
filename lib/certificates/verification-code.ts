import { randomBytes } from "node:crypto";

/** 18 random bytes: 144 bits, more than the 128 that make guessing hopeless; 24 base64url characters. */
const codeBytes = 18;
const codePattern = /^[A-Za-z0-9_-]{24}$/;

/** A new verification code for a certificate's public page. */
export function newVerificationCode(): string {
  return randomBytes(codeBytes).toString("base64url");
}

/** Whether text could be a code at all; anything else is "not found" without a database look-up. */
export function looksLikeVerificationCode(code: string): boolean {
  return codePattern.test(code);
}
