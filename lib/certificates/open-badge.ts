import type { CertificateStatus } from "@/lib/certificates/status";
import { midnightInZone } from "@/lib/care/calendar";

export interface BadgeSource {
  status: CertificateStatus;
  kind: "module" | "clearance";
  athleteName: string;
  title: string;
  issuedOn: string;
  expiresOn: string;
  code: string;
  clubName: string;
  clubSlug: string;
  moduleSlug: string | null;
  /** The club's time zone: its dates start at its own midnight. */
  timeZone: string;
}

const criteria = {
  module: "Pass the module's quiz, then show a coach of the club, hands-on, every item of the module's practical checklist.",
  clearance:
    "Hold a current pass (quiz and coach's practical sign-off) of every module the club requires before an athlete rigs without a coach.",
};

/**
 * The certificate as an Open Badges 3.0 OpenBadgeCredential (W3C VC 2.0 data model). Unsigned: there is
 * no proof, so a consumer must fetch it from this server (its id) to trust it; the live status is on the
 * verification page. The athlete is named through an IdentityObject, not hashed, as on the paper copy.
 */
export function openBadgeCredential(source: BadgeSource, baseUrl: string): Record<string, unknown> {
  const achievementKey = source.kind === "module" ? `module:${source.moduleSlug ?? "unknown"}` : "clearance";
  return {
    "@context": ["https://www.w3.org/ns/credentials/v2", "https://purl.imsglobal.org/spec/ob/v3p0/context-3.0.3.json"],
    id: `${baseUrl}/api/verify/${source.code}`,
    type: ["VerifiableCredential", "OpenBadgeCredential"],
    name: source.title,
    description: `Status on ${baseUrl}/verify/${source.code}: ${source.status}.`,
    issuer: { id: `urn:slipway:club:${source.clubSlug}`, type: ["Profile"], name: source.clubName },
    // Date-only in storage, and the club's dates: valid from the club's midnight that starts the issue day
    // until the one that starts the expiry day, as the status page counts them.
    validFrom: midnightInZone(source.issuedOn, source.timeZone),
    validUntil: midnightInZone(source.expiresOn, source.timeZone),
    credentialSubject: {
      type: ["AchievementSubject"],
      identifier: [{ type: "IdentityObject", identityType: "name", hashed: false, identityHash: source.athleteName }],
      achievement: {
        id: `urn:slipway:achievement:${source.clubSlug}:${achievementKey}`,
        type: ["Achievement"],
        name: source.title,
        description:
          source.kind === "module"
            ? `Practical sign-off: ${source.title}`
            : "May rig their own oars without a coach standing by, within the club's limits.",
        criteria: { narrative: criteria[source.kind] },
      },
    },
  };
}
