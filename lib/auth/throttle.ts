import "server-only";
import { RateLimiterMemory } from "rate-limiter-flexible";

/** Sign-in failures: at most 10 per 15 minutes per account and per address. */
export const signInFailureLimit = 10;
const windowSeconds = 15 * 60;

interface ThrottleGlobal {
  slipwaySignInByAccount?: RateLimiterMemory;
  slipwaySignInByAddress?: RateLimiterMemory;
}
const store = globalThis as unknown as ThrottleGlobal;

function limiters() {
  store.slipwaySignInByAccount ??= new RateLimiterMemory({ points: signInFailureLimit, duration: windowSeconds });
  store.slipwaySignInByAddress ??= new RateLimiterMemory({ points: signInFailureLimit, duration: windowSeconds });
  return { byAccount: store.slipwaySignInByAccount, byAddress: store.slipwaySignInByAddress };
}

function accountKey(email: string): string {
  return email.trim().toLowerCase() || "(blank)";
}

/** True when the account or the address already used up its failures in the window. */
export async function isSignInThrottled(email: string, address: string): Promise<boolean> {
  const { byAccount, byAddress } = limiters();
  const [account, from] = await Promise.all([byAccount.get(accountKey(email)), byAddress.get(address)]);
  return (account?.consumedPoints ?? 0) >= signInFailureLimit || (from?.consumedPoints ?? 0) >= signInFailureLimit;
}

/** Counts one failed sign-in against both the account and the address. */
export async function recordSignInFailure(email: string, address: string): Promise<void> {
  const { byAccount, byAddress } = limiters();
  await Promise.allSettled([byAccount.penalty(accountKey(email), 1), byAddress.penalty(address, 1)]);
}

/** The caller's address as the server saw it (first X-Forwarded-For hop when behind a proxy). */
export function clientAddress(headers: Headers): string {
  const forwarded = headers.get("x-forwarded-for")?.split(",")[0]?.trim();
  return forwarded || headers.get("x-real-ip") || "local";
}

/** A general-purpose limiter for public endpoints (e.g. the rig planner): points per minute per key. */
export function publicLimiter(name: string, pointsPerMinute: number): RateLimiterMemory {
  const key = `slipwayPublic_${name}` as keyof ThrottleGlobal;
  const holder = store as unknown as Record<string, RateLimiterMemory | undefined>;
  holder[key] ??= new RateLimiterMemory({ points: pointsPerMinute, duration: 60 });
  return holder[key];
}
