import { describe, expect, it } from "vitest";
import type { JWT, JWTDecodeParams } from "next-auth/jwt";
import { cachedTokenDecoder } from "@/lib/auth/token-cache";

function countingDecode(claims: Record<string, JWT | null>) {
  const calls: string[] = [];
  const decode = async (params: JWTDecodeParams) => {
    calls.push(params.token ?? "");
    return claims[params.token ?? ""] ?? null;
  };
  return { decode, calls };
}

describe("cachedTokenDecoder", () => {
  const params = (token?: string): JWTDecodeParams => ({ token, secret: "test-secret" });

  it("decodes a token once and answers the same claims afterwards", async () => {
    const { decode, calls } = countingDecode({ a: { uid: 1, exp: 2000 } });
    const cached = cachedTokenDecoder(decode, () => 1000);
    expect(await cached(params("a"))).toEqual({ uid: 1, exp: 2000 });
    expect(await cached(params("a"))).toEqual({ uid: 1, exp: 2000 });
    expect(calls).toEqual(["a"]);
  });

  it("does not keep tokens that fail to decode, and answers null without a token", async () => {
    const { decode, calls } = countingDecode({});
    const cached = cachedTokenDecoder(decode, () => 1000);
    expect(await cached(params("forged"))).toBeNull();
    expect(await cached(params("forged"))).toBeNull();
    expect(calls).toEqual(["forged", "forged"]);
    expect(await cached(params(undefined))).toBeNull();
    expect(calls).toHaveLength(2);
  });

  it("refuses a kept token once it has expired (with next-auth's 15 s tolerance)", async () => {
    let now = 1000;
    const { decode } = countingDecode({ a: { uid: 1, exp: 1100 } });
    const cached = cachedTokenDecoder(decode, () => now);
    expect(await cached(params("a"))).not.toBeNull();
    now = 1114;
    expect(await cached(params("a"))).not.toBeNull();
    now = 1116;
    expect(await cached(params("a"))).toBeNull();
  });

  it("keeps at most `max` tokens", async () => {
    const { decode, calls } = countingDecode({ a: { uid: 1 }, b: { uid: 2 }, c: { uid: 3 } });
    const cached = cachedTokenDecoder(decode, () => 0, 2);
    for (const token of ["a", "b", "c", "a"]) await cached(params(token));
    expect(calls).toEqual(["a", "b", "c", "a"]);
  });
});
