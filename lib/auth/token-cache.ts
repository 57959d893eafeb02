import { LRUCache } from "lru-cache";
import type { JWT, JWTDecodeParams } from "next-auth/jwt";

/** next-auth's clock tolerance when it checks a token's expiry (next-auth/jwt decode). */
const clockToleranceSeconds = 15;

type Decode = (params: JWTDecodeParams) => Promise<JWT | null>;

/**
 * Wraps next-auth's `decode` so that a session cookie seen before is not decrypted again: decoding
 * derives the key with HKDF and decrypts AES-GCM on every request, about 4% of a busy API request. The
 * cache is keyed by the whole encrypted token (never leaves the process), bounded, and honours the
 * token's expiry; whether the user may still sign in is checked against the database on every request
 * as before (token version, status), so a cached token ends with the session like any other.
 */
export function cachedTokenDecoder(decode: Decode, nowSeconds: () => number = () => Date.now() / 1000, max = 5000): Decode {
  const decoded = new LRUCache<string, JWT>({ max });
  return async (params) => {
    if (!params.token) return null;
    const key = `${params.salt ?? ""}\u0000${params.token}`;
    const kept = decoded.get(key);
    if (kept) {
      if (typeof kept.exp !== "number" || kept.exp + clockToleranceSeconds > nowSeconds()) return kept;
      decoded.delete(key);
      return null;
    }
    const claims = await decode(params);
    if (claims) decoded.set(key, claims);
    return claims;
  };
}
