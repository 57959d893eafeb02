import type { Metadata } from "next";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { requirePageActor } from "@/lib/auth/session";
import { clubOf, listClubMembers } from "@/lib/data/members";
import { isDemoMail } from "@/lib/env";
import { InviteMemberForm } from "../_components/invite-member-form";

export const metadata: Metadata = { title: "Club" };

export default async function ClubPage() {
  const actor = await requirePageActor("admin", "/club");
  const [club, members] = await Promise.all([clubOf(actor), listClubMembers(actor)]);
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
