import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { verifyCode } from "@/lib/data/certificates";
import { formatLongDate } from "@/lib/clearance/dates";
import { certificateStatusLabels } from "@/lib/certificates/status";

export const dynamic = "force-dynamic";

export const metadata: Metadata = { title: "Certificate check", robots: { index: false, follow: false } };

const statusText = {
  valid: "This certificate is valid.",
  expired: "This certificate has expired.",
  revoked: "This certificate has been revoked by the club.",
  suspended: "This clearance is suspended by a coach.",
} as const;

const replacedText =
  "The club replaced this certificate with one reissued under a corrected name, so this copy no longer counts. Ask the club for the current one.";

const statusClasses = {
  valid: "border-reed-600 bg-reed-100 text-reed-800",
  expired: "border-signal-600 bg-signal-100 text-signal-800",
  revoked: "border-alarm-600 bg-alarm-100 text-alarm-800",
  suspended: "border-alarm-600 bg-alarm-100 text-alarm-800",
} as const;

/**
 * Public check of a certificate's code: valid, expired, revoked or suspended, with only the athlete's
 * name, what was certified and the dates. Any code that is not a certificate's gets a plain 404.
 */
export default async function VerifyPage({ params }: { params: Promise<{ code: string }> }) {
  const { code } = await params;
  const verification = await verifyCode(code);
  if (!verification) notFound();
  const { icon, label } = certificateStatusLabels[verification.status];
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold tracking-tight text-river-900 sm:text-3xl">Certificate check</h1>
      <div className={`rounded-lg border-l-4 p-4 ${statusClasses[verification.status]}`} data-testid="verify-status">
        <p className="text-xl font-bold">
          <span aria-hidden="true">{icon} </span>
          {label}
        </p>
        <p className="mt-1">
          {verification.replaced ? replacedText : statusText[verification.status]}
          {verification.status === "revoked" && verification.revokedOn ? ` Revoked on ${formatLongDate(verification.revokedOn)}.` : ""}
        </p>
      </div>
      <dl
        className="grid grid-cols-1 gap-x-6 gap-y-3 rounded-lg bg-white p-4 shadow-sm sm:grid-cols-[max-content_1fr]"
        data-testid="verify-details"
      >
        <dt className="font-semibold text-slate-700">Athlete</dt>
        <dd>{verification.athleteName}</dd>
        <dt className="font-semibold text-slate-700">{verification.kind === "module" ? "Module" : "Certificate"}</dt>
        <dd>{verification.title}</dd>
        <dt className="font-semibold text-slate-700">Signed off on</dt>
        <dd>{formatLongDate(verification.issuedOn)}</dd>
        <dt className="font-semibold text-slate-700">{verification.status === "expired" ? "Expired on" : "Expires on"}</dt>
        <dd>{formatLongDate(verification.expiresOn)}</dd>
      </dl>
      <p className="text-sm text-slate-700">
        This page is the live record: a printed or e-mailed certificate can be out of date. A certificate records what a coach saw on the
        day; the club&apos;s rules and the coach on duty decide who goes afloat.
      </p>
      <p className="text-sm text-slate-700">
        For software:{" "}
        <a className="underline" href={`/api/verify/${verification.code}`}>
          the same certificate as an Open Badges 3.0 credential
        </a>{" "}
        (JSON, unsigned).
      </p>
    </div>
  );
}
