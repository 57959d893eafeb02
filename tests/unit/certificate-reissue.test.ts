import { describe, expect, it } from "vitest";
import { certificatesUnderEarlierName, replacementReason, sameName } from "@/lib/certificates/reissue";

describe("which certificates are reissued under a corrected name", () => {
  const today = "2026-12-04";
  const held = { athleteName: "Kit Abernethy", expiresOn: "2027-06-01", revoked: false };

  it("takes a certificate that still holds under another spelling", () => {
    expect(certificatesUnderEarlierName([held], "Kit Abernethy-Rowe", today)).toEqual([held]);
    // A change of capitals is a correction too.
    expect(certificatesUnderEarlierName([held], "kit abernethy", today)).toEqual([held]);
  });

  it("leaves one already under the current name, a revoked one and an expired one", () => {
    const revoked = { ...held, revoked: true };
    // expiresOn is the first day a certificate no longer holds (lib/certificates/status.ts), so on that day it is history.
    const expiredToday = { ...held, expiresOn: today };
    const lastDay = { ...held, expiresOn: "2026-12-05" };
    expect(
      certificatesUnderEarlierName(
        [{ ...held, athleteName: "Kit Abernethy-Rowe" }, revoked, expiredToday, lastDay],
        "Kit Abernethy-Rowe",
        today,
      ),
    ).toEqual([lastDay]);
  });

  it("treats the composed and decomposed forms of an accented name as one name", () => {
    // Check value: U+00E9 and U+0065 U+0301 are canonically equivalent, both normalising to U+00E9 under NFC
    // (Unicode Standard Annex #15, "Unicode Normalization Forms", Unicode Consortium, 2024).
    const composed = "Ren\u00e9e Okafor";
    const decomposed = "Rene\u0301e Okafor";
    expect(composed).not.toBe(decomposed);
    expect(sameName(composed, decomposed)).toBe(true);
    expect(certificatesUnderEarlierName([{ ...held, athleteName: decomposed }], composed, today)).toEqual([]);
    expect(sameName("Renee Okafor", composed)).toBe(false);
  });

  it("keeps the order it was given", () => {
    const first = { ...held, athleteName: "A. Abernethy" };
    const second = { ...held, athleteName: "Kit Abernathy" };
    expect(certificatesUnderEarlierName([first, second], "Kit Abernethy-Rowe", today)).toEqual([first, second]);
  });

  it("says in the replaced certificate's reason which one replaced it and under what name", () => {
    expect(replacementReason("LRR-2026-0042", "Kit Abernethy-Rowe")).toBe(
      "Replaced by LRR-2026-0042, reissued under the corrected name Kit Abernethy-Rowe.",
    );
  });
});
