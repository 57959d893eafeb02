import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/page-title";
import { RigNav, memberRigLinks } from "@/components/rig/rig-nav";
import { CleaningCautions } from "@/components/rig/cleaning-cautions";
import { CleaningTable } from "@/components/rig/cleaning-table";
import { requirePageActor } from "@/lib/auth/session";
import { isCoach } from "@/lib/auth/permissions";
import { cleaningOverview, clubMemberNames } from "@/lib/data/cleaning";
import { formatIsoDate } from "@/lib/care/calendar";
import { cleaningMethodLabels } from "@/lib/care/methods";
import { CleaningForm } from "./_components/cleaning-form";

export const metadata: Metadata = { title: "Grip cleaning" };

export default async function CarePage() {
  const actor = await requirePageActor("member", "/rig/care");
  const [overview, members] = await Promise.all([cleaningOverview(actor), clubMemberNames(actor)]);
  const { today } = overview;
  const upcomingRaces = overview.raceDays.filter((day) => day >= today);
  return (
    <div className="space-y-6">
      <PageTitle lead="Clean the handles at least weekly, before every race day, and daily in a humid spell.">Grip cleaning</PageTitle>
      <RigNav label="Rig" links={memberRigLinks(isCoach(actor))} current="/rig/care" />
      <CleaningCautions />
      <p data-testid="care-calendar">
        {upcomingRaces.length > 0
          ? `Race days ahead: ${upcomingRaces.map(formatIsoDate).join(", ")}.`
          : "No race days ahead in the club calendar."}{" "}
        {overview.humidSpell ? "Humid spell: on, so every set is due daily." : ""}
      </p>
      {overview.oarSets.length === 0 ? (
        <p>No oar sets are recorded for your club yet.</p>
      ) : (
        <CleaningTable oarSets={overview.oarSets} caption={`Oar sets on ${formatIsoDate(today)}`} />
      )}
      <section aria-labelledby="record-heading" className="rounded-lg bg-white p-4 shadow-sm">
        <h2 id="record-heading" className="mb-3 text-lg font-semibold">
          Record a cleaning
        </h2>
        <CleaningForm
          oarSets={overview.oarSets.map((set) => ({ id: set.oarSetId, name: set.name }))}
          members={members}
          me={{ id: actor.id, name: actor.name }}
          today={today}
        />
      </section>
      <section aria-labelledby="log-heading">
        <h2 id="log-heading" className="mb-3 text-lg font-semibold">
          Latest cleanings
        </h2>
        {overview.recent.length === 0 ? (
          <p>None recorded yet.</p>
        ) : (
          <ul className="divide-y divide-slate-200 rounded-lg bg-white shadow-sm" data-testid="cleaning-log">
            {overview.recent.map((entry) => (
              <li key={entry.id} className="px-4 py-3">
                <span className="font-semibold">{entry.oarSetName}</span> · {formatIsoDate(entry.cleanedOn)} · {entry.cleanedBy}
                <span className="block text-sm text-slate-700">
                  {cleaningMethodLabels[entry.method]}
                  {entry.note ? `: ${entry.note}` : ""}
                </span>
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
