import type { Metadata } from "next";
import Link from "next/link";
import { PendingMark } from "@/components/ui/pending-mark";
import { PageTitle } from "@/components/ui/page-title";
import { ClearanceSummary } from "@/components/certify/clearance-summary";
import { CertificateStatusBadge, ModuleStatusBadge } from "@/components/certify/status-badge";
import { requirePageActor } from "@/lib/auth/session";
import { certificatesOfAthlete } from "@/lib/data/certificates";
import { clearanceOf } from "@/lib/data/clearance";
import { listModules } from "@/lib/content/modules";
import { expiryVerb, formatLongDate } from "@/lib/clearance/dates";

export const metadata: Metadata = { title: "Your certificates" };

/** The athlete's own certificates (download, public check) and each module's practical. */
export default async function MyCertificatesPage() {
  const actor = await requirePageActor("member", "/learn/certificates");
  const [certificates, { standing, today }] = await Promise.all([certificatesOfAthlete(actor, actor.id), clearanceOf(actor)]);
  const titles = new Map(listModules().map((meta) => [meta.slug, meta.title]));
  return (
    <div className="space-y-6">
      <PageTitle lead="What a coach has signed off, and whether you may rig without one.">Your certificates</PageTitle>
      <ClearanceSummary actor={actor} onCertificatesPage />

      <section aria-labelledby="practicals-heading" className="rounded-lg bg-white p-4 shadow-sm">
        <h2 id="practicals-heading" className="mb-3 text-lg font-semibold">
          Practicals
        </h2>
        <ul className="divide-y divide-slate-200">
          {standing.modules.map((entry) => (
            <li key={entry.slug} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <Link href={`/learn/${entry.slug}/practical`} className="min-h-11 content-center font-semibold text-river-700 underline">
                {titles.get(entry.slug) ?? entry.slug}
                <PendingMark />
              </Link>
              <ModuleStatusBadge status={entry.status} />
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="certificates-heading">
        <h2 id="certificates-heading" className="mb-3 text-lg font-semibold">
          Certificates ({certificates.length})
        </h2>
        {certificates.length === 0 ? (
          <p>None yet. A certificate is issued when a coach signs off a module&apos;s practical.</p>
        ) : (
          <ul className="space-y-3" data-testid="my-certificates">
            {certificates.map((certificate) => (
              <li key={certificate.id} className="space-y-1 rounded-lg bg-white p-4 shadow-sm">
                <div className="flex flex-wrap items-center justify-between gap-2">
                  <span className="font-semibold">{certificate.title}</span>
                  <CertificateStatusBadge status={certificate.status} />
                </div>
                <p className="text-sm text-slate-700">
                  {certificate.serial} · signed off by {certificate.signedOffByName} on {formatLongDate(certificate.issuedOn)} ·{" "}
                  {expiryVerb(certificate.expiresOn, today)} {formatLongDate(certificate.expiresOn)}
                </p>
                {certificate.replacedById && (
                  <p className="text-sm" data-testid="replaced-note">
                    Replaced by {certificates.find((entry) => entry.id === certificate.replacedById)?.serial ?? "a newer certificate"},
                    reissued under your corrected name: print that one instead.
                  </p>
                )}
                <p className="flex flex-wrap gap-x-4">
                  <a href={certificate.pdfUrl} className="inline-flex min-h-11 items-center font-semibold text-river-700 underline">
                    Download PDF
                    <span className="sr-only">
                      {" "}
                      of {certificate.title}, {certificate.serial}
                    </span>
                  </a>
                  <a href={certificate.verifyUrl} className="inline-flex min-h-11 items-center text-river-700 underline">
                    Public check page
                    <span className="sr-only">
                      {" "}
                      of {certificate.title}, {certificate.serial}
                    </span>
                  </a>
                </p>
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
