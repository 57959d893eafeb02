import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/page-title";
import { requirePageActor } from "@/lib/auth/session";
import { clubOf, listClubMembers } from "@/lib/data/members";

export const metadata: Metadata = { title: "Roster" };

export default async function RosterPage() {
  const actor = await requirePageActor("coach", "/roster");
  const [club, athletes] = await Promise.all([clubOf(actor), listClubMembers(actor, "athlete")]);
  return (
    <div>
      <PageTitle lead={`${club.name}: ${athletes.length} athletes.`}>Roster</PageTitle>
      {athletes.length === 0 ? (
        <p>No athletes yet. A club administrator can invite them from the Club page.</p>
      ) : (
        <ul data-testid="roster-list" className="divide-y divide-slate-200 rounded-lg bg-white shadow-sm">
          {athletes.map((athlete) => (
            <li key={athlete.id} className="px-4 py-3">
              <span className="font-semibold">{athlete.name}</span>{" "}
              <span className="text-sm text-slate-700">{athlete.email}</span>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
