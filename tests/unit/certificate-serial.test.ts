import { describe, expect, it } from "vitest";
import { formatSerial, nextSerialNumber, parseSerial, serialPrefixFor } from "@/lib/certificates/serial";
import { looksLikeVerificationCode, newVerificationCode } from "@/lib/certificates/verification-code";

describe("certificate serial numbers", () => {
  it("take the club's initials as prefix", () => {
    expect(serialPrefixFor("lantern-reach")).toBe("LR");
    expect(serialPrefixFor("upper-tide-boat-club-2")).toBe("UTBC");
    expect(serialPrefixFor("")).toBe("SW");
  });

  it("run on from the highest issued this year, starting at 1", () => {
    expect(nextSerialNumber(null)).toBe(1);
    expect(nextSerialNumber(41)).toBe(42);
    expect(() => nextSerialNumber(-1)).toThrow(RangeError);
  });

  it("are written PREFIX-YEAR-NNNN and read back", () => {
    expect(formatSerial("LR", 2026, 7)).toBe("LR-2026-0007");
    expect(formatSerial("LR", 2026, 12345)).toBe("LR-2026-12345");
    expect(parseSerial("LR-2026-0007")).toEqual({ prefix: "LR", year: 2026, serialNumber: 7 });
    expect(parseSerial("LR-26-7")).toBeNull();
    expect(() => formatSerial("LR", 2026, 0)).toThrow(RangeError);
  });
});

describe("verification codes", () => {
  it("carry at least 128 random bits in base64url and never repeat", () => {
    const codes = new Set(Array.from({ length: 1000 }, () => newVerificationCode()));
    expect(codes.size).toBe(1000);
    for (const code of [...codes].slice(0, 20)) {
      expect(code).toMatch(/^[A-Za-z0-9_-]+$/);
      expect(Buffer.from(code, "base64url").length * 8).toBeGreaterThanOrEqual(128);
      expect(looksLikeVerificationCode(code)).toBe(true);
    }
    expect(looksLikeVerificationCode("../../etc/passwd")).toBe(false);
    expect(looksLikeVerificationCode("short")).toBe(false);
  });
});
