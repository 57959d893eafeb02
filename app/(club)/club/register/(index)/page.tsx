import type { Metadata } from "next";
import Link from "next/link";
import { PendingMark } from "@/components/ui/pending-mark";
import { PageTitle } from "@/components/ui/page-title";
import { CertificateStatusBadge } from "@/components/certify/status-badge";
import { requirePageActor } from "@/lib/auth/session";
import { registerFor } from "@/lib/data/register";
import { listModules } from "@/lib/content/modules";
import { certificateStatusLabels } from "@/lib/certificates/status";
import { Notice } from "@/components/ui/notice";
import {
  queryObject,
  registerDownloadProblems,
  registerFilterQuery,
  registerFilterSchema,
  registerStatuses,
} from "@/lib/validations/certification";

export const metadata: Metadata = { title: "Induction register" };

const controlClasses = "min-h-11 w-full rounded-md border border-slate-500 bg-white px-3 py-2 text-base";

/** Every certificate the club has issued, filtered, with CSV and print-ready PDF downloads. */
export default async function RegisterPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await requirePageActor("admin", "/club/register");
  const filter = registerFilterSchema.parse(queryObject(await searchParams));
  const register = await registerFor(actor, filter);
  const modules = listModules();
  const query = new URLSearchParams(registerFilterQuery(filter)).toString();
  const suffix = query ? `?${query}` : "";
  const problems = registerDownloadProblems(
    filter,
    modules.map((meta) => meta.slug),
  );

  return (
    <div className="space-y-6">
      <PageTitle lead="Every certificate the club has issued. Print it for the paper register; athletes sign beside their entries.">
        Induction register
      </PageTitle>

      <form method="get" className="grid grid-cols-1 gap-4 rounded-lg bg-white p-4 shadow-sm sm:grid-cols-2" data-testid="register-filters">
        <div className="flex flex-col gap-1">
          <label htmlFor="register-module" className="font-semibold">
            Module
          </label>
          <select id="register-module" name="module" defaultValue={filter.module} className={controlClasses}>
            <option value="">All modules</option>
            {modules.map((meta) => (
              <option key={meta.slug} value={meta.slug}>
                {meta.title}
              </option>
            ))}
          </select>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor="register-kind" className="font-semibold">
            Kind
          </label>
          <select id="register-kind" name="kind" defaultValue={filter.kind} className={controlClasses}>
            <option value="all">Module and clearance certificates</option>
            <option value="module">Module certificates</option>
            <option value="clearance">Rigging clearance certificates</option>
          </select>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor="register-status" className="font-semibold">
            Status
          </label>
          <select id="register-status" name="status" defaultValue={filter.status} className={controlClasses}>
            {registerStatuses.map((status) => (
              <option key={status} value={status}>
                {status === "all" ? "Any status" : certificateStatusLabels[status].label}
              </option>
            ))}
          </select>
        </div>
        <div className="grid grid-cols-2 gap-3">
          <div className="flex flex-col gap-1">
            <label htmlFor="register-from" className="font-semibold">
              Issued from
            </label>
            <input id="register-from" type="date" name="from" defaultValue={filter.from} className={controlClasses} />
          </div>
          <div className="flex flex-col gap-1">
            <label htmlFor="register-to" className="font-semibold">
              Issued to
            </label>
            <input id="register-to" type="date" name="to" defaultValue={filter.to} className={controlClasses} />
          </div>
        </div>
        <div className="flex flex-wrap gap-3 sm:col-span-2">
          <button
            type="submit"
            className="inline-flex min-h-11 items-center rounded-md bg-river-700 px-4 font-semibold text-white hover:bg-river-800"
          >
            Show
          </button>
          <Link href="/club/register" className="inline-flex min-h-11 items-center underline">
            Clear filters
          </Link>
        </div>
      </form>

      <div className="flex flex-wrap items-center gap-3">
        <p className="mr-auto" role="status">
          {register.entries.length} certificates · {register.summary}
        </p>
        {problems.length === 0 && (
          <>
            <a
              href={`/api/register/csv${suffix}`}
              className="inline-flex min-h-11 items-center rounded-md border border-river-700 px-4 font-semibold text-river-800 hover:bg-river-100"
            >
              Download CSV
            </a>
            <a
              href={`/api/register/pdf${suffix}`}
              className="inline-flex min-h-11 items-center rounded-md border border-river-700 px-4 font-semibold text-river-800 hover:bg-river-100"
            >
              Print-ready PDF
            </a>
          </>
        )}
      </div>
      {problems.length > 0 && (
        <Notice tone="error" title="Check the filters" testId="register-filter-problem">
          {problems.join(" ")}
        </Notice>
      )}

      {register.entries.length === 0 ? (
        <p data-testid="register-empty">No certificates match these filters.</p>
      ) : (
        // On a desk screen the table is wider than the page's column (64 rem, centred on it), so the
        // administrator reads every column without scrolling sideways; narrower screens scroll it.
        <div
          className="relative overflow-x-auto rounded-lg bg-white shadow-sm lg:left-1/2 lg:w-[min(64rem,calc(100vw-2rem))] lg:-translate-x-1/2"
          role="region"
          aria-label="Register, scrolls sideways"
          tabIndex={0}
        >
          <table className="min-w-full text-left text-sm" data-testid="register-table">
            <thead>
              <tr className="border-b border-slate-300 bg-river-50">
                {["Serial", "Athlete", "Certificate", "Signed off by", "Issued", "Expires", "Status"].map((heading) => (
                  <th key={heading} scope="col" className="whitespace-nowrap px-3 py-2">
                    {heading}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {register.entries.map((entry) => (
                <tr key={entry.id} className="border-b border-slate-200 align-top">
                  <th scope="row" className="whitespace-nowrap px-3 py-2 font-normal">
                    <Link href={`/club/register/${entry.id}`} className="font-semibold text-river-700 underline">
                      {entry.serial}
                      <PendingMark />
                    </Link>
                  </th>
                  <td className="px-3 py-2">{entry.athleteName}</td>
                  <td className="px-3 py-2">{entry.title}</td>
                  <td className="px-3 py-2">{entry.signedOffByName}</td>
                  <td className="whitespace-nowrap px-3 py-2">{entry.issuedOn}</td>
                  <td className="whitespace-nowrap px-3 py-2">{entry.expiresOn}</td>
                  <td className="px-3 py-2">
                    <CertificateStatusBadge status={entry.status} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
