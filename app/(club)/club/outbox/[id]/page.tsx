import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/ui/page-title";
import { requirePageActor } from "@/lib/auth/session";
import { canReadOutbox } from "@/lib/auth/permissions";
import { isDemoMail } from "@/lib/env";
import { readOutboxMessage } from "@/lib/mail/outbox";

export const metadata: Metadata = { title: "Message" };

/** Shows a message's text with its addresses as links, so a demo can follow an invitation. */
export default async function OutboxMessagePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageActor("admin", `/club/outbox/${id}`);
  if (!canReadOutbox(actor, isDemoMail())) notFound();
  const message = await readOutboxMessage(id);
  if (!message) notFound();
  return (
    <article>
      <PageTitle lead={`To ${message.to}`}>{message.subject}</PageTitle>
      <div className="whitespace-pre-wrap break-words rounded-lg bg-white p-4 shadow-sm" data-testid="message-body">
        {message.text.split(/(https?:\/\/\S+)/).map((part, index) =>
          /^https?:\/\//.test(part) ? (
            <a key={index} href={part} className="font-semibold text-river-700 underline">
              {part}
            </a>
          ) : (
            <span key={index}>{part}</span>
          ),
        )}
      </div>
      {message.attachments.length > 0 && <p className="mt-3 text-sm">Attachments: {message.attachments.join(", ")}</p>}
      <p className="mt-6">
        <Link href="/club/outbox" className="underline">
          Back to the outbox
        </Link>
      </p>
    </article>
  );
}
