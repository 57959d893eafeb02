import { createHash, randomBytes } from "node:crypto";

/** A URL-safe token with 256 random bits; only its hash is stored. */
export function newToken(): string {
  return randomBytes(32).toString("base64url");
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
