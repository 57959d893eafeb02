import type { Metadata } from "next";
import Link from "next/link";
import { PendingMark } from "@/components/ui/pending-mark";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/ui/page-title";
import { CertificateStatusBadge, ClearanceBadge, ModuleStatusBadge } from "@/components/certify/status-badge";
import { requirePageActor } from "@/lib/auth/session";
import { athleteRecordFor } from "@/lib/data/clearance";
import { orNotFound } from "@/lib/http/page-not-found";
import { expiryVerb, formatLongDate, lastValidDay } from "@/lib/clearance/dates";
import { formatInstantInZone } from "@/lib/care/calendar";
import { certificatesUnderEarlierName, sameName } from "@/lib/certificates/reissue";
import { SuspensionControl } from "./_components/suspension-forms";
import { ReissueCertificatesForm } from "./_components/reissue-form";

export const metadata: Metadata = { title: "Athlete" };

function percent(score: number | null): string {
  return score === null ? "—" : `${Math.round(score * 100)} %`;
}

/** One athlete for coaches: clearance, modules, sign-offs, certificates, quiz attempts and history. */
export default async function AthletePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageActor("coach", `/roster/athletes/${id}`);
  const athleteId = Number(id);
  if (!Number.isInteger(athleteId) || athleteId <= 0) notFound();
  const record = await orNotFound(athleteRecordFor(actor, athleteId));
  const { today } = record;
  const when = (iso: string) => formatInstantInZone(iso, record.timeZone);
  const { clearance } = record.standing;
  const activeSuspension = record.suspensions.find((entry) => entry.liftedAt === null);
  const sectionClasses = "space-y-3 rounded-lg bg-white p-4 shadow-sm";
  const underEarlierName = certificatesUnderEarlierName(
    record.certificates.map((certificate) => ({ ...certificate, revoked: certificate.revokedAt !== null })),
    record.athlete.name,
    today,
  );

  return (
    <div className="space-y-6">
      <PageTitle lead={`${record.athlete.email}${record.athlete.status === "deactivated" ? " · deactivated" : ""}`}>
        {record.athlete.name}
      </PageTitle>

      <section aria-labelledby="clearance-heading" className={sectionClasses} data-testid="athlete-clearance">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 id="clearance-heading" className="text-lg font-semibold">
            Rigging without a coach
          </h2>
          <ClearanceBadge state={clearance.state} testId="athlete-clearance-state" />
        </div>
        {clearance.state === "cleared" && clearance.expiresOn && (
          <p>
            Cleared up to and including {formatLongDate(lastValidDay(clearance.expiresOn))}: the first required pass expires on{" "}
            {formatLongDate(clearance.expiresOn)}.
          </p>
        )}
        {clearance.missingModules.length > 0 && (
          <p>Still to pass: {clearance.missingModules.map((slug) => record.moduleTitles[slug] ?? slug).join(", ")}.</p>
        )}
        {clearance.expiredModules.length > 0 && (
          <p>Expired: {clearance.expiredModules.map((slug) => record.moduleTitles[slug] ?? slug).join(", ")}.</p>
        )}
        {activeSuspension && (
          <p>
            Suspended by {activeSuspension.suspendedByName} on {formatLongDate(activeSuspension.suspendedOn)}: {activeSuspension.reason}
          </p>
        )}
        {record.viewer.canSuspend && <SuspensionControl athleteId={record.athlete.id} suspended={!!activeSuspension} />}
      </section>

      <section aria-labelledby="modules-heading" className={sectionClasses} data-testid="athlete-modules">
        <h2 id="modules-heading" className="text-lg font-semibold">
          Modules
        </h2>
        <div className="relative overflow-x-auto">
          <table className="min-w-full text-left text-sm">
            <thead>
              <tr className="border-b border-slate-300">
                <th scope="col" className="py-2 pr-3">
                  Module
                </th>
                <th scope="col" className="py-2 pr-3">
                  Status
                </th>
                {/* On a phone the last two columns join the status cell, so the module's name is not
                    squeezed to a word a line. */}
                <th scope="col" className="hidden py-2 pr-3 sm:table-cell">
                  Best quiz score
                </th>
                <th scope="col" className="hidden py-2 pr-3 sm:table-cell">
                  Pass expires
                </th>
              </tr>
            </thead>
            <tbody>
              {record.standing.modules.map((entry) => (
                <tr key={entry.slug} className="border-b border-slate-200">
                  <th scope="row" className="py-2 pr-3 font-normal">
                    {record.moduleTitles[entry.slug] ?? entry.slug}
                    {record.requiredModules.includes(entry.slug) && (
                      <span className="block text-xs text-slate-700">required for clearance</span>
                    )}
                  </th>
                  <td className="py-2 pr-3">
                    <ModuleStatusBadge status={entry.status} />
                    <span className="mt-1 block text-xs text-slate-700 sm:hidden">
                      Best quiz score {percent(entry.progress.bestScore)}
                      {entry.latestPass &&
                        ` · pass ${expiryVerb(entry.latestPass.expiresOn, today)} ${formatLongDate(entry.latestPass.expiresOn)}`}
                    </span>
                  </td>
                  <td className="hidden py-2 pr-3 sm:table-cell">{percent(entry.progress.bestScore)}</td>
                  <td className="hidden py-2 pr-3 sm:table-cell">
                    {entry.latestPass
                      ? `${expiryVerb(entry.latestPass.expiresOn, today) === "expired" ? "expired " : ""}${formatLongDate(entry.latestPass.expiresOn)}`
                      : "—"}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>

      <section aria-labelledby="sign-offs-heading" className={sectionClasses}>
        <h2 id="sign-offs-heading" className="text-lg font-semibold">
          Sign-offs ({record.assessments.length})
        </h2>
        {record.assessments.length === 0 ? (
          <p>None asked for yet.</p>
        ) : (
          <ul className="divide-y divide-slate-200">
            {record.assessments.map((entry) => (
              <li key={entry.id} className="space-y-1 py-3">
                <p className="font-semibold">
                  <Link href={`/roster/sign-offs/${entry.id}`} className="text-river-700 underline">
                    {entry.moduleTitle}
                    <PendingMark />
                  </Link>
                  {": "}
                  {entry.status === "waiting"
                    ? "◔ waiting"
                    : entry.status === "passed"
                      ? "✓ signed off"
                      : entry.status === "not-yet"
                        ? "✕ not yet"
                        : entry.status}
                </p>
                <p className="text-sm text-slate-700">
                  Asked {when(entry.requestedAt)}
                  {entry.assessedAt && ` · recorded ${when(entry.assessedAt)} by ${entry.assessorName ?? "a coach"}`}
                </p>
                {entry.note && <p className="whitespace-pre-wrap text-sm">Note: {entry.note}</p>}
                {entry.photos.length > 0 && (
                  <p className="flex flex-wrap gap-3 text-sm">
                    {entry.photos.map((photo, index) => (
                      <a key={photo.id} href={photo.url} className="underline">
                        Photo {index + 1}
                      </a>
                    ))}
                  </p>
                )}
              </li>
            ))}
          </ul>
        )}
      </section>

      <section id="certificates" aria-labelledby="certificates-heading" className={`${sectionClasses} scroll-mt-24`}>
        <h2 id="certificates-heading" className="text-lg font-semibold">
          Certificates ({record.certificates.length})
        </h2>
        {record.viewer.isAdmin ? (
          <ReissueCertificatesForm
            athleteId={record.athlete.id}
            currentName={record.athlete.name}
            outdated={underEarlierName.map(({ serial, athleteName }) => ({ serial, athleteName }))}
          />
        ) : (
          underEarlierName.length > 0 && (
            <p data-testid="reissue-note">
              {underEarlierName.length === 1 ? "One current certificate carries" : `${underEarlierName.length} current certificates carry`}{" "}
              an earlier spelling of the name: a club administrator can reissue them under “{record.athlete.name}”.
            </p>
          )
        )}
        {record.certificates.length === 0 ? (
          <p>None issued yet.</p>
        ) : (
          <ul className="divide-y divide-slate-200" data-testid="athlete-certificates">
            {record.certificates.map((certificate) => (
              <li key={certificate.id} className="flex flex-wrap items-center justify-between gap-2 py-3">
                <span>
                  <span className="block font-semibold">
                    {certificate.serial}: {certificate.title}
                  </span>
                  <span className="block text-sm text-slate-700">
                    Issued {formatLongDate(certificate.issuedOn)} · {expiryVerb(certificate.expiresOn, today)}{" "}
                    {formatLongDate(certificate.expiresOn)} · {certificate.signedOffByName}
                    {!sameName(certificate.athleteName, record.athlete.name) && ` · issued to ${certificate.athleteName}`}
                    {certificate.revokeReason && ` · revoked: ${certificate.revokeReason}`}
                  </span>
                </span>
                <span className="flex flex-wrap items-center gap-3">
                  <CertificateStatusBadge status={certificate.status} />
                  <a href={certificate.pdfUrl} className="underline">
                    PDF
                  </a>
                  {record.viewer.isAdmin && (
                    <Link href={`/club/register/${certificate.id}`} className="underline">
                      Manage
                      <PendingMark />
                    </Link>
                  )}
                </span>
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="attempts-heading" className={sectionClasses}>
        <h2 id="attempts-heading" className="text-lg font-semibold">
          Quiz attempts ({record.attempts.length})
        </h2>
        {record.attempts.length === 0 ? (
          <p>No quiz submitted yet.</p>
        ) : (
          <ul className="divide-y divide-slate-200 text-sm">
            {record.attempts.map((attempt) => (
              <li key={attempt.attemptId} className="flex flex-wrap justify-between gap-2 py-2">
                <span>{record.moduleTitles[attempt.moduleSlug] ?? attempt.moduleSlug}</span>
                <span>
                  {percent(attempt.score)} · {attempt.passed ? "✓ passed" : "✕ not passed"} ·{" "}
                  {attempt.submittedAt ? when(attempt.submittedAt) : ""}
                </span>
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="history-heading" className={sectionClasses}>
        <h2 id="history-heading" className="text-lg font-semibold">
          History
        </h2>
        {record.history.length === 0 ? (
          <p>Nothing yet.</p>
        ) : (
          <ol className="space-y-1 text-sm" data-testid="athlete-history">
            {record.history.map((entry, index) => (
              <li key={`${entry.at}-${index}`}>
                <time dateTime={entry.at} className="text-slate-700">
                  {when(entry.at)}
                </time>{" "}
                {entry.text}
              </li>
            ))}
          </ol>
        )}
      </section>

      <p>
        <Link href="/roster" className="underline">
          Back to the roster
        </Link>
      </p>
    </div>
  );
}
