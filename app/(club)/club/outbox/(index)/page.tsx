import type { Metadata } from "next";
import Link from "next/link";
import { PendingMark } from "@/components/ui/pending-mark";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/ui/page-title";
import { requirePageActor } from "@/lib/auth/session";
import { canReadOutbox } from "@/lib/auth/permissions";
import { isDemoMail } from "@/lib/env";
import { listOutbox } from "@/lib/mail/outbox";
import { clubTimeZone } from "@/lib/data/club-settings";
import { formatInstantInZone } from "@/lib/care/calendar";

export const metadata: Metadata = { title: "Club outbox" };

export default async function OutboxPage() {
  const actor = await requirePageActor("admin", "/club/outbox");
  if (!canReadOutbox(actor, isDemoMail())) notFound();
  const [messages, timeZone] = await Promise.all([listOutbox(), clubTimeZone(actor.clubId)]);
  return (
    <div>
      <PageTitle lead="Demo mode keeps every e-mail here instead of sending it.">Club outbox</PageTitle>
      {messages.length === 0 ? (
        <p>No mail yet. Invitations, sign-in links and certificates will appear here.</p>
      ) : (
        <ul className="divide-y divide-slate-200 rounded-lg bg-white shadow-sm" data-testid="outbox-list">
          {messages.map((message) => (
            <li key={message.id}>
              <Link href={`/club/outbox/${message.id}`} className="block min-h-11 px-4 py-3 hover:bg-river-50">
                <span className="block font-semibold">
                  {message.subject}
                  <PendingMark />
                </span>
                <span className="block text-sm text-slate-700">
                  To {message.to}
                  {message.sentAt && ` · ${formatInstantInZone(message.sentAt, timeZone)}`}
                </span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
