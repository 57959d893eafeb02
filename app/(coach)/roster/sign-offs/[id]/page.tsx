import type { Metadata } from "next";
import Link from "next/link";
import { PendingMark } from "@/components/ui/pending-mark";
import { PageTitle } from "@/components/ui/page-title";
import { Notice } from "@/components/ui/notice";
import { requirePageActor } from "@/lib/auth/session";
import { assessmentForCoach } from "@/lib/data/sign-offs";
import { orNotFound } from "@/lib/http/page-not-found";
import { checklistVerdictLabels } from "@/lib/clearance/checklist";
import { formatLongDate } from "@/lib/clearance/dates";
import { AssessmentForm } from "./_components/assessment-form";

export const metadata: Metadata = { title: "Practical sign-off" };

/** One sign-off: the form while it waits, the record once decided. */
export default async function AssessmentPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageActor("coach", `/roster/sign-offs/${id}`);
  const detail = await orNotFound(assessmentForCoach(actor, id));
  const asked = formatLongDate(detail.requestedOn);
  return (
    <div className="space-y-6">
      <PageTitle
        lead={`${detail.module.title} · asked ${detail.askedCoachName ? `of ${detail.askedCoachName}` : "of any coach"} on ${asked}`}
      >
        Sign-off: {detail.athlete.name}
      </PageTitle>
      <p className="text-slate-700">
        Best quiz score: {detail.bestQuizScore === null ? "no quiz submitted" : `${Math.round(detail.bestQuizScore * 100)} %`} ·{" "}
        <Link href={`/roster/athletes/${detail.athlete.id}`} className="underline">
          {detail.athlete.name}&apos;s record
          <PendingMark />
        </Link>
      </p>
      {detail.status === "waiting" ? (
        <>
          <Notice tone="warning" title="Watch, do not prompt">
            Mark an item met only when you saw the athlete do it correctly, unprompted, with a real oar. If anything is unsafe (a collar not
            seated, a loose screw), mark it not yet and make sure the oar is put right before anyone goes afloat. Local rules apply.
          </Notice>
          <AssessmentForm assessmentId={detail.id} athleteName={detail.athlete.name} checklist={detail.checklist} photos={detail.photos} />
        </>
      ) : (
        <section aria-labelledby="decision-heading" className="space-y-3 rounded-lg bg-white p-4 shadow-sm" data-testid="assessment-record">
          <h2 id="decision-heading" className="text-lg font-semibold">
            {detail.status === "passed" ? "✓ Signed off" : detail.status === "not-yet" ? "✕ Not yet" : "Withdrawn"}
            {detail.assessorName && detail.assessedOn && ` by ${detail.assessorName} on ${formatLongDate(detail.assessedOn)}`}
          </h2>
          <ul className="space-y-1">
            {detail.checklist.map((item) => (
              <li key={item.id}>
                {detail.verdicts?.[item.id] === "met" ? "✓" : "✕"} {item.label}:{" "}
                <strong>{detail.verdicts?.[item.id] ? checklistVerdictLabels[detail.verdicts[item.id]!] : "—"}</strong>
              </li>
            ))}
          </ul>
          {detail.note && <p className="whitespace-pre-wrap">Note: {detail.note}</p>}
          {detail.photos.length > 0 && (
            <ul className="flex flex-wrap gap-3">
              {detail.photos.map((photo, index) => (
                <li key={photo.id}>
                  <a href={photo.url} className="underline">
                    Photo {index + 1}
                  </a>
                </li>
              ))}
            </ul>
          )}
        </section>
      )}
      <p>
        <Link href="/roster/sign-offs" className="underline">
          Back to the sign-offs
        </Link>
      </p>
    </div>
  );
}
