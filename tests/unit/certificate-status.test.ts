import { describe, expect, it } from "vitest";
import { certificateStatus } from "@/lib/certificates/status";
import { openBadgeCredential } from "@/lib/certificates/open-badge";
import { rosterRowMatches, rosterViewQuery, type RosterRow } from "@/lib/clearance/roster";

describe("certificate status", () => {
  const moduleCertificate = { kind: "module" as const, expiresOn: "2027-03-14", revoked: false };
  it("is valid up to the day before expiry, then expired; revoked wins; suspension only touches clearance", () => {
    expect(certificateStatus(moduleCertificate, "2027-03-13", false)).toBe("valid");
    expect(certificateStatus(moduleCertificate, "2027-03-14", false)).toBe("expired");
    expect(certificateStatus({ ...moduleCertificate, revoked: true }, "2026-01-01", false)).toBe("revoked");
    expect(certificateStatus(moduleCertificate, "2026-06-01", true)).toBe("valid");
    expect(certificateStatus({ ...moduleCertificate, kind: "clearance" }, "2026-06-01", true)).toBe(
      "suspended",
    );
    expect(
      certificateStatus({ ...moduleCertificate, kind: "clearance", revoked: true }, "2026-06-01", true),
    ).toBe("revoked");
  });
});

describe("Open Badges 3.0 credential", () => {
  it("has the required VC 2.0 and OB 3.0 parts", () => {
    const badge = openBadgeCredential(
      {
        status: "valid",
        kind: "module",
        athleteName: "Carys Penhallow",
        title: "Setting the inboard with the collar",
        issuedOn: "2026-03-14",
        expiresOn: "2027-03-14",
        code: "AbCdEfGhIjKlMnOpQrStUvWx",
        clubName: "Lantern Reach Rowing Club",
        clubSlug: "lantern-reach",
        moduleSlug: "setting-inboard",
      },
      "https://slipway.example",
    );
    expect(badge).toMatchObject({
      "@context": ["https://www.w3.org/ns/credentials/v2", expect.stringContaining("ob/v3p0")],
      id: "https://slipway.example/api/verify/AbCdEfGhIjKlMnOpQrStUvWx",
      type: ["VerifiableCredential", "OpenBadgeCredential"],
      issuer: { type: ["Profile"], name: "Lantern Reach Rowing Club" },
      validFrom: "2026-03-14T00:00:00Z",
      validUntil: "2027-03-14T00:00:00Z",
      credentialSubject: {
        type: ["AchievementSubject"],
        achievement: {
          type: ["Achievement"],
          name: "Setting the inboard with the collar",
          criteria: { narrative: expect.any(String) },
        },
      },
    });
  });
});

describe("roster filters", () => {
  const row = (overrides: Partial<RosterRow>): RosterRow => ({
    id: 1,
    name: "Inès Barrow",
    email: "ines@x.example",
    clearance: { state: "cleared", expiresOn: "2026-07-01", suspendedReason: null },
    modules: {},
    waitingForMe: 0,
    passedCount: 5,
    ...overrides,
  });
  it("filters by clearance, waiting sign-offs and expiry within 30 days, and searches names without accents", () => {
    expect(rosterRowMatches(row({}), "cleared", "ines", "2026-06-01")).toBe(true);
    expect(rosterRowMatches(row({}), "expiring-soon", "", "2026-06-01")).toBe(true);
    expect(rosterRowMatches(row({}), "expiring-soon", "", "2026-05-31")).toBe(false);
    expect(
      rosterRowMatches(
        row({ clearance: { state: "suspended", expiresOn: null, suspendedReason: "x" } }),
        "not-cleared",
        "",
        "2026-06-01",
      ),
    ).toBe(true);
    expect(rosterRowMatches(row({ waitingForMe: 1 }), "waiting-for-me", "BARR", "2026-06-01")).toBe(true);
    expect(rosterRowMatches(row({}), "waiting-for-me", "", "2026-06-01")).toBe(false);
    expect(rosterRowMatches(row({}), "all", "nobody", "2026-06-01")).toBe(false);
  });
});

describe("roster view in the address", () => {
  it("writes only what differs from everyone-and-no-search, and reads back through the page's schema", async () => {
    const { queryObject, rosterQuerySchema } = await import("@/lib/validations/certification");
    expect(rosterViewQuery("all", "")).toBe("");
    expect(rosterViewQuery("all", "   ")).toBe("");
    expect(rosterViewQuery("waiting-for-me", "")).toBe("filter=waiting-for-me");
    expect(rosterViewQuery("cleared", " Øde gård & co ")).toBe("filter=cleared&q=%C3%98de+g%C3%A5rd+%26+co");
    const back = rosterQuerySchema.parse(queryObject(Object.fromEntries(new URLSearchParams(rosterViewQuery("cleared", "Øde gård & co")))));
    expect(back).toEqual({ filter: "cleared", q: "Øde gård & co" });
    // A hand-edited address falls back instead of failing the page.
    expect(rosterQuerySchema.parse(queryObject({ filter: "bogus", q: ["a", "b"] }))).toMatchObject({ filter: "all" });
  });
});
