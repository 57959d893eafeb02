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
    expect(certificateStatus({ ...moduleCertificate, kind: "clearance" }, "2026-06-01", true)).toBe("suspended");
    expect(certificateStatus({ ...moduleCertificate, kind: "clearance", revoked: true }, "2026-06-01", true)).toBe("revoked");
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
        timeZone: "UTC",
      },
      "https://slipway.example",
    );
    expect(badge).toMatchObject({
      "@context": ["https://www.w3.org/ns/credentials/v2", expect.stringContaining("ob/v3p0")],
      id: "https://slipway.example/api/verify/AbCdEfGhIjKlMnOpQrStUvWx",
      type: ["VerifiableCredential", "OpenBadgeCredential"],
      issuer: { type: ["Profile"], name: "Lantern Reach Rowing Club" },
      validFrom: "2026-03-14T00:00:00+00:00",
      validUntil: "2027-03-14T00:00:00+00:00",
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

describe("the credential's start and end", () => {
  it("are the club's own midnights, with the offset of that moment", () => {
    const source = {
      status: "valid" as const,
      kind: "module" as const,
      athleteName: "Test Athlete",
      title: "Setting the inboard",
      issuedOn: "2026-03-14",
      expiresOn: "2026-07-14",
      code: "AbCdEfGhIjKlMnOpQrStUvWx",
      clubName: "Invented Test Club",
      clubSlug: "invented-test",
      moduleSlug: "setting-inboard",
    };
    // New Zealand: daylight time (UTC+13) in March, standard time (UTC+12) in July; Newfoundland:
    // daylight time (UTC-2:30) from 8 March 2026 (IANA Time Zone Database, IANA, 2025).
    expect(openBadgeCredential({ ...source, timeZone: "Pacific/Auckland" }, "https://slipway.example")).toMatchObject({
      validFrom: "2026-03-14T00:00:00+13:00",
      validUntil: "2026-07-14T00:00:00+12:00",
    });
    expect(openBadgeCredential({ ...source, timeZone: "America/St_Johns" }, "https://slipway.example")).toMatchObject({
      validFrom: "2026-03-14T00:00:00-02:30",
      validUntil: "2026-07-14T00:00:00-02:30",
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
      rosterRowMatches(row({ clearance: { state: "suspended", expiresOn: null, suspendedReason: "x" } }), "not-cleared", "", "2026-06-01"),
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
