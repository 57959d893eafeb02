import { afterEach, describe, expect, it } from "vitest";
import { clientAddress, trustedProxyCount } from "@/lib/auth/throttle";

function headersWith(forwardedFor?: string): Headers {
  return new Headers(forwardedFor === undefined ? {} : { "x-forwarded-for": forwardedFor, "x-real-ip": "192.0.2.99" });
}

afterEach(() => {
  delete process.env.SLIPWAY_TRUST_PROXY;
});

describe("clientAddress", () => {
  it("without SLIPWAY_TRUST_PROXY takes the header whole, as Next passed it, and ignores X-Real-IP", () => {
    expect(trustedProxyCount()).toBe(0);
    expect(clientAddress(headersWith("127.0.0.1"))).toBe("127.0.0.1");
    expect(clientAddress(headersWith("198.51.100.7, 10.0.0.2"))).toBe("198.51.100.7, 10.0.0.2");
    expect(clientAddress(headersWith())).toBe("unknown");
    expect(clientAddress(headersWith("x".repeat(2000))).length).toBe(100);
  });

  it("with one trusted proxy takes the entry that proxy appended, not what the client claimed", () => {
    process.env.SLIPWAY_TRUST_PROXY = "1";
    expect(clientAddress(headersWith("203.0.113.9"))).toBe("203.0.113.9");
    expect(clientAddress(headersWith("6.6.6.6, 203.0.113.9"))).toBe("203.0.113.9");
  });

  it("with two trusted proxies takes the second entry from the right", () => {
    process.env.SLIPWAY_TRUST_PROXY = "2";
    expect(clientAddress(headersWith("6.6.6.6, 203.0.113.9, 10.0.0.2"))).toBe("203.0.113.9");
    expect(clientAddress(headersWith("203.0.113.9"))).toBe("203.0.113.9");
  });

  it("treats anything but a positive whole number as no trusted proxy", () => {
    for (const value of ["0", "yes", "-1", "1.5", ""]) {
      process.env.SLIPWAY_TRUST_PROXY = value;
      expect(trustedProxyCount()).toBe(0);
    }
  });
});
