/** What the public verification page says about a certificate. */
export type CertificateStatus = "valid" | "expired" | "revoked" | "suspended";

export const certificateStatusLabels: Record<CertificateStatus, { label: string; icon: string }> = {
  valid: { label: "Valid", icon: "✓" },
  expired: { label: "Expired", icon: "◷" },
  revoked: { label: "Revoked", icon: "✕" },
  suspended: { label: "Suspended", icon: "⊘" },
};

/**
 * Revoked wins over everything; a clearance certificate is suspended while a coach's suspension stands;
 * otherwise a certificate is valid up to the day before its expiry date.
 */
export function certificateStatus(
  certificate: { kind: "module" | "clearance"; expiresOn: string; revoked: boolean },
  today: string,
  clearanceSuspended: boolean,
): CertificateStatus {
  if (certificate.revoked) return "revoked";
  if (today >= certificate.expiresOn) return "expired";
  if (certificate.kind === "clearance" && clearanceSuspended) return "suspended";
  return "valid";
}
