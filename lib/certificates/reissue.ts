/**
 * Reissuing under a corrected name. A certificate keeps the name it was issued to (renaming a member
 * never rewrites the register), so after a correction the club reissues the certificates that still
 * hold: a new serial and check code under the new name, the same dates and sign-off, the old one
 * revoked as replaced. Expired and revoked certificates stay as they were: they are history.
 */

/** What the choice needs of a certificate. `expiresOn` is the first day it no longer holds. */
export interface NamedCertificate {
  athleteName: string;
  expiresOn: string;
  revoked: boolean;
}

/** Two spellings of a name are the same when they differ only in Unicode composition ("é" as one or two code points). */
export function sameName(a: string, b: string): boolean {
  return a.normalize("NFC") === b.normalize("NFC");
}

/** The certificates to reissue under `currentName` on the club's day `today`: still holding, issued to another spelling. */
export function certificatesUnderEarlierName<T extends NamedCertificate>(
  certificates: readonly T[],
  currentName: string,
  today: string,
): T[] {
  return certificates.filter(
    (certificate) => !certificate.revoked && today < certificate.expiresOn && !sameName(certificate.athleteName, currentName),
  );
}

/** The revocation reason kept on a replaced certificate (the register and audit log show it; the public page does not). */
export function replacementReason(replacementSerial: string, newName: string): string {
  return `Replaced by ${replacementSerial}, reissued under the corrected name ${newName}.`;
}
