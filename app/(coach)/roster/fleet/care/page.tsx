import type { Metadata } from "next";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { RigNav, fleetLinks } from "@/components/rig/rig-nav";
import { CleaningCautions } from "@/components/rig/cleaning-cautions";
import { CleaningTable } from "@/components/rig/cleaning-table";
import { requirePageActor } from "@/lib/auth/session";
import { cleaningOverview } from "@/lib/data/cleaning";
import { formatIsoDate } from "@/lib/care/calendar";
import { HumidSpellSwitch, RaceDaysForm, SendDigestButton } from "../_components/calendar-forms";

export const metadata: Metadata = { title: "Cleaning due" };

export default async function CleaningDuePage() {
  const actor = await requirePageActor("coach", "/roster/fleet/care");
  const overview = await cleaningOverview(actor);
  const { today } = overview;
  const due = overview.oarSets.filter((set) => set.state.due);
  return (
    <div className="space-y-8">
      <PageTitle lead="Which oar sets need their handles cleaned, and the race days and weather that make them due.">
        Cleaning due
      </PageTitle>
      <RigNav label="Fleet" links={fleetLinks} current="/roster/fleet/care" />
      <section aria-labelledby="due-heading" className="space-y-3">
        <h2 id="due-heading" className="text-lg font-semibold" data-testid="due-count">
          {due.length === 0 ? "Nothing is due today" : `${due.length} ${due.length === 1 ? "set is" : "sets are"} due`}
        </h2>
        {overview.oarSets.length > 0 && (
          <CleaningTable oarSets={overview.oarSets} caption={`Every oar set on ${formatIsoDate(today)}, due first`} />
        )}
        <p>
          Athletes record cleanings on the{" "}
          <Link href="/rig/care" className="font-semibold text-river-700 underline">
            grip cleaning page
          </Link>
          .
        </p>
      </section>
      <CleaningCautions />
      <section aria-labelledby="races-heading" className="space-y-3 rounded-lg bg-white p-4 shadow-sm">
        <h2 id="races-heading" className="text-lg font-semibold">
          Race days
        </h2>
        <p className="text-sm text-slate-700">Every set falls due the day before a race day unless it was cleaned then or later.</p>
        <RaceDaysForm raceDays={overview.raceDays} today={today} />
      </section>
      <section aria-labelledby="humid-heading" className="space-y-3 rounded-lg bg-white p-4 shadow-sm">
        <h2 id="humid-heading" className="text-lg font-semibold">
          Humid spell
        </h2>
        <HumidSpellSwitch humidSpell={overview.humidSpell} />
      </section>
      <section aria-labelledby="digest-heading" className="space-y-3 rounded-lg bg-white p-4 shadow-sm">
        <h2 id="digest-heading" className="text-lg font-semibold">
          Weekly digest
        </h2>
        <p className="text-sm text-slate-700">
          Every week the coaches and administrators get an e-mail naming the sets that are due. Sending it now counts as this week&apos;s.
        </p>
        <SendDigestButton />
      </section>
    </div>
  );
}
