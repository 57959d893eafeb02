import "server-only";
import { RateLimiterMemory, RateLimiterRes } from "rate-limiter-flexible";
import { TooManyRequestsError } from "@/lib/http/errors";

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

/** How many reverse proxies in front of the app append to X-Forwarded-For (SLIPWAY_TRUST_PROXY); 0 = none trusted. */
export function trustedProxyCount(): number {
  const value = Number(process.env.SLIPWAY_TRUST_PROXY ?? "0");
  return Number.isInteger(value) && value > 0 ? Math.min(value, 10) : 0;
}

/**
 * The key for per-address limits. Next's server gives a route handler no socket address; it only sets
 * X-Forwarded-For to the connection's address when the request arrived without one (it keeps a header
 * the client sent). So:
 * - with SLIPWAY_TRUST_PROXY=n, the proxies are trusted to append: the address is the n-th entry from
 *   the right, the one our outermost trusted proxy saw (entries further left are the client's own claims);
 * - without it, the header is taken whole, as Next passed it: the connection's address for ordinary
 *   clients, but a value a client can choose when the server is reachable directly (see DEVELOPERS.md).
 */
export function clientAddress(headers: Headers): string {
  const forwarded = (headers.get("x-forwarded-for") ?? "").slice(0, 512);
  const hops = trustedProxyCount();
  if (hops === 0) return forwarded.trim().slice(0, 100) || "unknown";
  const entries = forwarded
    .split(",")
    .map((entry) => entry.trim())
    .filter(Boolean);
  return entries[entries.length - hops] ?? entries[0] ?? "unknown";
}

/** A general-purpose limiter for public endpoints (e.g. the rig planner): points per minute per key. */
export function publicLimiter(name: string, pointsPerMinute: number): RateLimiterMemory {
  return namedLimiter(name, pointsPerMinute, 60);
}

/** A limiter kept per process under `name`: `points` per `durationSeconds` for each key consumed. */
export function namedLimiter(name: string, points: number, durationSeconds: number): RateLimiterMemory {
  const key = `slipwayPublic_${name}` as keyof ThrottleGlobal;
  const holder = store as unknown as Record<string, RateLimiterMemory | undefined>;
  holder[key] ??= new RateLimiterMemory({ points, duration: durationSeconds });
  return holder[key];
}

/**
 * Takes one point for `key`, or throws a 429 (TooManyRequestsError with Retry-After) whose message
 * `refusal` writes from the milliseconds until a point is free again.
 */
export async function consumeOrRefuse(limiter: RateLimiterMemory, key: string, refusal: (msBeforeNext: number) => string): Promise<void> {
  try {
    await limiter.consume(key);
  } catch (rejection) {
    if (!(rejection instanceof RateLimiterRes)) throw rejection;
    throw new TooManyRequestsError(refusal(rejection.msBeforeNext), Math.max(1, Math.ceil(rejection.msBeforeNext / 1000)));
  }
}
