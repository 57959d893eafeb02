import type { Metadata } from "next";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { requirePageActor } from "@/lib/auth/session";
import { listClubMembers } from "@/lib/data/members";
import { clubTimeZone } from "@/lib/data/club-settings";
import { formatInstantInZone } from "@/lib/care/calendar";
import { MembersTable, type MemberRow } from "./_components/members-table";
import { RosterImportForm } from "./_components/roster-import-form";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage() {
  const actor = await requirePageActor("admin", "/club/members");
  const [members, timeZone] = await Promise.all([listClubMembers(actor), clubTimeZone(actor.clubId)]);
  const rows: MemberRow[] = members.map((member) => ({
    ...member,
    lastSignInLabel: member.lastSignInAt ? formatInstantInZone(member.lastSignInAt, timeZone) : "Never",
  }));
  return (
    <div className="space-y-8">
      <PageTitle lead="Everyone in the club, their roles and whether they can sign in.">Members</PageTitle>
      <p>
        <Link href="/club" className="font-semibold text-river-700 underline">
          Invite one person
        </Link>{" "}
        from the club page, or import a whole roster below.
      </p>
      <section aria-labelledby="member-list-heading">
        <h2 id="member-list-heading" className="mb-3 text-lg font-semibold">
          Member list
        </h2>
        <MembersTable members={rows} actorId={actor.id} />
      </section>
      <section aria-labelledby="roster-heading" className="rounded-lg bg-white p-4 shadow-sm">
        <h2 id="roster-heading" className="mb-3 text-lg font-semibold">
          Import a roster
        </h2>
        <RosterImportForm />
      </section>
    </div>
  );
}
