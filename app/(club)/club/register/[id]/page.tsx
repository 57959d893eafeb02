import type { Metadata } from "next";
import Link from "next/link";
import { PendingMark } from "@/components/ui/pending-mark";
import { PageTitle } from "@/components/ui/page-title";
import { CertificateStatusBadge } from "@/components/certify/status-badge";
import { requirePageActor } from "@/lib/auth/session";
import { certificateForAdmin } from "@/lib/data/certificates";
import { orNotFound } from "@/lib/http/page-not-found";
import { formatLongDate } from "@/lib/clearance/dates";
import { Notice } from "@/components/ui/notice";
import { certificatesUnderEarlierName } from "@/lib/certificates/reissue";
import { RevokeCertificateForm } from "./_components/revoke-form";

export const metadata: Metadata = { title: "Certificate" };

/** One certificate for an admin: its record, its PDF and public page, and revocation. */
export default async function CertificatePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageActor("admin", `/club/register/${id}`);
  const certificate = await orNotFound(certificateForAdmin(actor, id));
  const nameCorrected =
    certificatesUnderEarlierName(
      [{ ...certificate, revoked: certificate.revokedAt !== null }],
      certificate.athleteCurrentName,
      certificate.today,
    ).length > 0;
  return (
    <div className="space-y-6">
      <PageTitle lead={certificate.title}>Certificate {certificate.serial}</PageTitle>
      <dl
        className="grid grid-cols-1 gap-x-6 gap-y-2 rounded-lg bg-white p-4 shadow-sm sm:grid-cols-[max-content_1fr]"
        data-testid="certificate-record"
      >
        <dt className="font-semibold">Status</dt>
        <dd>
          <CertificateStatusBadge status={certificate.status} testId="certificate-status" />
        </dd>
        <dt className="font-semibold">Athlete</dt>
        <dd>
          <Link href={`/roster/athletes/${certificate.athleteId}`} className="underline">
            {certificate.athleteName}
            <PendingMark />
          </Link>
        </dd>
        {certificate.replacedBy && (
          <>
            <dt className="font-semibold">Replaced by</dt>
            <dd>
              <Link href={`/club/register/${certificate.replacedBy.id}`} className="underline" data-testid="replaced-by">
                Certificate {certificate.replacedBy.serial}
                <PendingMark />
              </Link>
              , reissued under a corrected name
            </dd>
          </>
        )}
        <dt className="font-semibold">Signed off by</dt>
        <dd>{certificate.signedOffByName}</dd>
        <dt className="font-semibold">Issued</dt>
        <dd>{formatLongDate(certificate.issuedOn)}</dd>
        <dt className="font-semibold">Expires</dt>
        <dd>{formatLongDate(certificate.expiresOn)}</dd>
        {certificate.revokedOn && (
          <>
            <dt className="font-semibold">Revoked</dt>
            <dd>
              {formatLongDate(certificate.revokedOn)} by {certificate.revokedByName ?? "an administrator"}: {certificate.revokeReason}
            </dd>
          </>
        )}
      </dl>
      {nameCorrected && (
        <Notice tone="warning" title="The member's name was corrected" testId="name-corrected">
          <p>
            Issued to “{certificate.athleteName}”; the member is now “{certificate.athleteCurrentName}”. Reissue it under the current name{" "}
            <Link href={`/roster/athletes/${certificate.athleteId}#certificates`} className="underline">
              on the athlete&apos;s page
            </Link>
            .
          </p>
        </Notice>
      )}
      <p className="flex flex-wrap gap-4">
        <a href={certificate.pdfUrl} className="font-semibold text-river-700 underline">
          Download the PDF
        </a>
        <a href={certificate.verifyUrl} className="text-river-700 underline">
          Public check page
        </a>
      </p>
      <section aria-labelledby="revoke-heading" className="space-y-3 rounded-lg bg-white p-4 shadow-sm">
        <h2 id="revoke-heading" className="text-lg font-semibold">
          {certificate.revokedAt ? "Revoked" : "Revoke"}
        </h2>
        {certificate.revokedAt && <p>The public check page says this certificate is revoked.</p>}
        <RevokeCertificateForm
          certificateId={certificate.id}
          serial={certificate.serial}
          kind={certificate.kind}
          revoked={certificate.revokedAt !== null}
        />
      </section>
      <p>
        <Link href="/club/register" className="underline">
          Back to the register
        </Link>
      </p>
    </div>
  );
}
