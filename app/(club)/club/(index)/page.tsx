import type { Metadata } from "next";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { requirePageActor } from "@/lib/auth/session";
import { clubOf, listClubMembers } from "@/lib/data/members";
import { expiredInvitationListDays, listUnansweredInvitations } from "@/lib/data/users";
import { clubTimeZone } from "@/lib/data/club-settings";
import { formatIsoDate, isoDateInZone } from "@/lib/care/calendar";
import { UnansweredInvitations } from "../_components/unanswered-invitations";
import { isDemoMail } from "@/lib/env";
import { InviteMemberForm } from "../_components/invite-member-form";

export const metadata: Metadata = { title: "Club" };

export default async function ClubPage() {
  const actor = await requirePageActor("admin", "/club");
  const [club, members, invitations, timeZone] = await Promise.all([
    clubOf(actor),
    listClubMembers(actor),
    listUnansweredInvitations(actor),
    clubTimeZone(actor.clubId),
  ]);
  const day = (moment: Date) => formatIsoDate(isoDateInZone(timeZone, moment));
  return (
    <div className="space-y-8">
      <PageTitle lead="Members, invitations and the club's mail.">{club.name}</PageTitle>
      <nav aria-label="Club administration" className="flex flex-wrap gap-3">
        <Link href="/club/register" className="inline-flex min-h-11 items-center font-semibold text-river-700 underline">
          Induction register
        </Link>
        <Link href="/club/settings" className="inline-flex min-h-11 items-center font-semibold text-river-700 underline">
          Club settings
        </Link>
      </nav>
      <section aria-labelledby="invite-heading" className="rounded-lg bg-white p-4 shadow-sm">
        <h2 id="invite-heading" className="mb-3 text-lg font-semibold">
          Invite a member
        </h2>
        <InviteMemberForm />
      </section>
      <section aria-labelledby="invitations-heading" className="rounded-lg bg-white p-4 shadow-sm" data-testid="unanswered-invitations">
        <h2 id="invitations-heading" className="mb-1 text-lg font-semibold">
          Invitations not accepted yet ({invitations.length})
        </h2>
        {invitations.length > 0 && (
          <p className="mb-3 text-sm text-slate-700">
            The newest invitation to each address. Send again for a fresh link (the earlier one stops working); withdraw one sent to a wrong
            address. Expired ones leave this list after {expiredInvitationListDays} days.
          </p>
        )}
        <UnansweredInvitations
          emptyText={`Everyone you invited has joined. Expired invitations leave this list after ${expiredInvitationListDays} days.`}
          invitations={invitations.map((invitation) => ({
            id: invitation.id,
            email: invitation.email,
            name: invitation.name,
            role: invitation.role,
            sentLabel: day(invitation.sentAt),
            expiresLabel: day(invitation.expiresAt),
            open: invitation.open,
          }))}
        />
      </section>
      {isDemoMail() && (
        <p>
          Demo mode: e-mail is not sent but kept in the{" "}
          <Link href="/club/outbox" className="font-semibold text-river-700 underline">
            club outbox
          </Link>
          .
        </p>
      )}
      <section aria-labelledby="members-heading" className="rounded-lg bg-white p-4 shadow-sm">
        <h2 id="members-heading" className="mb-2 text-lg font-semibold">
          Members ({members.length})
        </h2>
        <p>
          {members.filter((member) => member.status === "active").length} active,{" "}
          {members.filter((member) => member.status === "deactivated").length} deactivated.{" "}
          <Link href="/club/members" className="font-semibold text-river-700 underline">
            Manage members
          </Link>{" "}
          to search the list, change roles, deactivate or import a roster.
        </p>
      </section>
    </div>
  );
}
