import type { Metadata } from "next";
import Link from "next/link";
import { PendingMark } from "@/components/ui/pending-mark";
import { PageTitle } from "@/components/ui/page-title";
import { requirePageActor } from "@/lib/auth/session";
import { signOffQueue } from "@/lib/data/sign-offs";
import { formatLongDate } from "@/lib/clearance/dates";

export const metadata: Metadata = { title: "Sign-offs" };

/** The practicals athletes asked a coach to watch, the ones asked of this coach (or anyone) first. */
export default async function SignOffQueuePage() {
  const actor = await requirePageActor("coach", "/roster/sign-offs");
  const queue = await signOffQueue(actor);
  const mine = queue.filter((entry) => entry.forMe);
  const others = queue.filter((entry) => !entry.forMe);
  return (
    <div className="space-y-6">
      <PageTitle lead="Open one at the boat rack, watch the athlete and record each checklist item.">Sign-offs waiting</PageTitle>
      {queue.length === 0 && <p data-testid="queue-empty">Nobody is waiting for a sign-off.</p>}
      {[
        { heading: "For you or any coach", entries: mine, id: "mine" },
        { heading: "Asked of another coach", entries: others, id: "others" },
      ]
        .filter((group) => group.entries.length > 0)
        .map((group) => (
          <section key={group.id} aria-labelledby={`queue-${group.id}`}>
            <h2 id={`queue-${group.id}`} className="mb-3 text-lg font-semibold">
              {group.heading} ({group.entries.length})
            </h2>
            <ul className="divide-y divide-slate-200 rounded-lg bg-white shadow-sm" data-testid={`queue-${group.id}`}>
              {group.entries.map((entry) => (
                <li key={entry.id}>
                  <Link href={`/roster/sign-offs/${entry.id}`} className="block min-h-11 px-4 py-3 hover:bg-river-50">
                    <span className="block font-semibold">
                      {entry.athleteName}: {entry.moduleTitle}
                      <PendingMark />
                    </span>
                    <span className="block text-sm text-slate-700">
                      Asked {entry.askedCoachName ? `of ${entry.askedCoachName}` : "of any coach"} on {formatLongDate(entry.requestedOn)}
                    </span>
                  </Link>
                </li>
              ))}
            </ul>
          </section>
        ))}
      <p>
        <Link href="/roster" className="underline">
          Back to the roster
        </Link>
      </p>
    </div>
  );
}
