import Link from "next/link";
import type { Actor } from "@/lib/auth/permissions";
import { practicalViewFor } from "@/lib/data/sign-offs";
import { formatLongDate } from "@/lib/clearance/dates";
import { Notice } from "@/components/ui/notice";
import { ModuleStatusBadge } from "@/components/certify/status-badge";
import { RequestSignOffForm } from "@/components/certify/request-sign-off-form";

interface PracticalSignOffPanelProps {
  actor: Actor;
  moduleSlug: string;
  /** Show the checklist the coach will watch (the practical page does; a lesson page may not). */
  showChecklist?: boolean;
}

/**
 * The practical sign-off of one module for the signed-in athlete: where it stands, the coach's last
 * note, the request button once the quiz is passed, and the certificate once signed off.
 */
export async function PracticalSignOffPanel({ actor, moduleSlug, showChecklist = true }: PracticalSignOffPanelProps) {
  const view = await practicalViewFor(actor, moduleSlug);
  return (
    <section
      aria-labelledby={`practical-${moduleSlug}`}
      className="space-y-4 rounded-lg bg-white p-4 shadow-sm"
      data-testid="practical-panel"
    >
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id={`practical-${moduleSlug}`} className="text-lg font-semibold">
          Practical sign-off
        </h2>
        <span data-testid="practical-status">
          <ModuleStatusBadge status={view.status} label={view.statusLabel} />
        </span>
      </div>

      {showChecklist && (
        <div>
          <p className="mb-2">A coach watches you do each of these with a real oar, without prompting:</p>
          <ul className="list-disc space-y-1 pl-6">
            {view.module.checklist.map((item) => (
              <li key={item.id}>{item.label}</li>
            ))}
          </ul>
        </div>
      )}

      {view.latestDecision?.outcome === "not-yet" && view.status === "not-yet" && (
        <Notice
          tone="warning"
          title={`Not yet: ${view.latestDecision.assessorName} would like you to practise first`}
          testId="practical-note"
        >
          <p className="whitespace-pre-wrap">{view.latestDecision.note}</p>
          <p className="mt-1 text-sm">Recorded {formatLongDate(view.latestDecision.assessedOn)}.</p>
        </Notice>
      )}

      {view.openRequest && (
        <p>
          <span aria-hidden="true">◔ </span>
          You asked {view.openRequest.coachName ?? "any coach"} on {formatLongDate(view.openRequest.requestedOn)}. Bring your oars to the
          rack; the coach records what they see on a tablet.
        </p>
      )}

      {view.currentPass && (
        <p>
          <span aria-hidden="true">✓ </span>
          Signed off on {formatLongDate(view.currentPass.signedOffOn)}; the pass expires on {formatLongDate(view.currentPass.expiresOn)}.
        </p>
      )}

      {view.certificate && (
        <p className="flex flex-wrap gap-x-4 gap-y-2">
          <a href={view.certificate.pdfUrl} className="font-semibold text-river-700 underline" data-testid="certificate-download">
            Download certificate {view.certificate.serial} (PDF)
          </a>
          <a href={view.certificate.verifyUrl} className="text-river-700 underline">
            Public check page
          </a>
        </p>
      )}

      <RequestSignOffForm moduleSlug={moduleSlug} coaches={view.coaches} canRequest={view.requestProblem === null} />
      {view.requestProblem && !view.openRequest && <p className="text-sm text-slate-700">{view.requestProblem}</p>}

      <p className="text-sm text-slate-700">
        Until a coach has signed off every module your club requires, rig only with a coach beside you.{" "}
        <Link href="/learn/certificates" className="underline">
          Your certificates and clearance
        </Link>
      </p>
    </section>
  );
}
