import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/ui/page-title";
import { findPendingInvitation } from "@/lib/data/users";
import { roleLabels } from "@/lib/auth/roles";
import { AcceptInvitationForm } from "./accept-invitation-form";

export const metadata: Metadata = { title: "Accept your invitation" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = token.length <= 100 ? await findPendingInvitation(token) : null;
  // Used, replaced, expired or never issued: a 404, whose page (not-found.tsx) lists what may have happened.
  if (!invitation) notFound();
  return (
    <div className="mx-auto max-w-md">
      <PageTitle lead={`${invitation.clubName} invited ${invitation.email} as ${roleLabels[invitation.role].toLowerCase()}.`}>
        Join your club on Slipway
      </PageTitle>
      <AcceptInvitationForm token={token} email={invitation.email} defaultName={invitation.name} />
    </div>
  );
}
