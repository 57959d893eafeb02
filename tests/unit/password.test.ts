import { describe, expect, it } from "vitest";
import { hashPassword, passwordProblem, verifyPassword } from "@/lib/auth/password";
import { safeCallbackPath } from "@/lib/http/safe-redirect";
import { acceptInvitationSchema } from "@/lib/validations/members";
import { linkSessionGraceMinutes, mayChangePasswordWithoutCurrent } from "@/lib/auth/password-rules";

// Rules after NIST SP 800-63B (2017), 5.1.1.2: a minimum length, a check against common passwords,
// no composition rules.
describe("password rules", () => {
  it("refuses passwords under 10 characters", () => {
    expect(passwordProblem("short")).toMatch(/at least 10/);
    expect(passwordProblem("nine-char")).toMatch(/at least 10/);
  });

  it.each(["password123", "qwertyuiop", "1234567890", "iloveyou12", "aaaaaaaaaaaa"])(
    "refuses the common or trivially guessable %s",
    (password) => {
      expect(passwordProblem(password)).toMatch(/too common/);
    },
  );

  it("accepts long unusual passphrases without any composition rule", () => {
    expect(passwordProblem("heron collar tidewater")).toBeNull();
    expect(passwordProblem("lantern-reach-demo")).toBeNull();
    expect(passwordProblem("allsmallletterswithoutdigits")).toBeNull();
  });

  it("refuses absurdly long input", () => {
    expect(passwordProblem("x".repeat(129))).toMatch(/at most/);
  });

  // bcrypt hashes only the first 72 bytes of a password (the bcrypt algorithm's input limit; bcryptjs's
  // README, checked here against the library itself): a longer new password is refused, counted in UTF-8.
  it("refuses new passwords over the 72 bytes bcrypt uses, counting UTF-8 bytes", async () => {
    const start = "heron collar tidewater ".repeat(4).slice(0, 72);
    const hash = await hashPassword(`${start}one ending`);
    expect(await verifyPassword(`${start}another ending`, hash)).toBe(true);
    expect(passwordProblem(start)).toBeNull();
    expect(passwordProblem(`${start}x`)).toMatch(/at most 72/);
    // Letters from À to ÿ (U+00C0–U+00FF, taken out of order) take 2 bytes each: 36 of them are 72 bytes, 37 are 74.
    const accented = (count: number) =>
      Array.from({ length: count }, (_, index) => String.fromCharCode(0xc0 + ((index * 7) % 64))).join("");
    expect(passwordProblem(accented(36))).toBeNull();
    expect(passwordProblem(accented(37))).toMatch(/at most 72/);
    // The invitation form's schema says so once (a second length rule used to repeat the message).
    const tooLong = acceptInvitationSchema.shape.password.safeParse(`${start}x`);
    expect(tooLong.error?.issues.map((issue) => issue.message)).toEqual([expect.stringMatching(/at most 72/)]);
  });

  it("stores bcrypt hashes that verify only the right password", async () => {
    const hash = await hashPassword("heron collar tidewater");
    expect(hash).toMatch(/^\$2[aby]\$11\$/);
    expect(await verifyPassword("heron collar tidewater", hash)).toBe(true);
    expect(await verifyPassword("heron collar tidewateR", hash)).toBe(false);
  });
});

describe("callback paths after sign-in", () => {
  it("follows only same-site relative paths", () => {
    expect(safeCallbackPath("/roster")).toBe("/roster");
    expect(safeCallbackPath("//evil.example/x")).toBe("/home");
    expect(safeCallbackPath("https://evil.example")).toBe("/home");
    expect(safeCallbackPath("/\\evil.example")).toBe("/home");
    expect(safeCallbackPath(undefined)).toBe("/home");
  });
});

describe("setting a password without the current one", () => {
  const start = new Date("2026-12-04T09:00:00Z");
  const minutesLater = (minutes: number) => new Date(start.getTime() + minutes * 60_000);

  it("is allowed for 20 minutes after signing in with an e-mail link, and not after", () => {
    // Rule of this project (the link proved the member reads that inbox); the length is our choice, no source.
    const link = { method: "link" as const, signedInAt: start };
    expect(linkSessionGraceMinutes).toBe(20);
    expect(mayChangePasswordWithoutCurrent(link, start)).toBe(true);
    expect(mayChangePasswordWithoutCurrent(link, minutesLater(20))).toBe(true);
    expect(mayChangePasswordWithoutCurrent(link, minutesLater(20.01))).toBe(false);
    expect(mayChangePasswordWithoutCurrent(link, minutesLater(600))).toBe(false);
  });

  it("is never allowed for a password session, a session from before this was recorded, or a start in the future", () => {
    expect(mayChangePasswordWithoutCurrent({ method: "password", signedInAt: start }, minutesLater(1))).toBe(false);
    expect(mayChangePasswordWithoutCurrent(null, start)).toBe(false);
    expect(mayChangePasswordWithoutCurrent({ method: "link", signedInAt: minutesLater(5) }, start)).toBe(false);
    // A clock a few seconds behind the server that signed the session still counts.
    expect(mayChangePasswordWithoutCurrent({ method: "link", signedInAt: minutesLater(0.5) }, start)).toBe(true);
  });
});
