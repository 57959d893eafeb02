import type { Metadata } from "next";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { Notice } from "@/components/ui/notice";
import { findPendingInvitation } from "@/lib/data/users";
import { roleLabels } from "@/lib/auth/roles";
import { AcceptInvitationForm } from "./accept-invitation-form";

export const metadata: Metadata = { title: "Accept your invitation" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = token.length <= 100 ? await findPendingInvitation(token) : null;
  if (!invitation) {
    return (
      <div className="mx-auto max-w-md">
        <PageTitle>Invitation</PageTitle>
        <Notice tone="error" title="This invitation link is no longer valid.">
          It may have been used already or be more than 14 days old. Ask your club administrator for a new one, or{" "}
          <Link href="/sign-in" className="underline">
            sign in
          </Link>{" "}
          if you already have an account.
        </Notice>
      </div>
    );
  }
  return (
    <div className="mx-auto max-w-md">
      <PageTitle lead={`${invitation.clubName} invited ${invitation.email} as ${roleLabels[invitation.role].toLowerCase()}.`}>
        Join your club on Slipway
      </PageTitle>
      <AcceptInvitationForm token={token} email={invitation.email} defaultName={invitation.name} />
    </div>
  );
}
