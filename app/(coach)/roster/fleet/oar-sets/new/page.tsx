import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/page-title";
import { RigNav, fleetLinks } from "@/components/rig/rig-nav";
import { requirePageActor } from "@/lib/auth/session";
import { listFleet, rigSettingsFor } from "@/lib/data/fleet";
import { OarSetForm } from "../../_components/oar-set-form";

export const metadata: Metadata = { title: "Add an oar set" };

export default async function NewOarSetPage() {
  const actor = await requirePageActor("coach", "/roster/fleet/oar-sets/new");
  const [fleet, settings] = await Promise.all([listFleet(actor), rigSettingsFor(actor)]);
  return (
    <div>
      <PageTitle lead="The target length and inboard athletes set these oars to, and the boats they go in.">Add an oar set</PageTitle>
      <RigNav label="Fleet" links={fleetLinks} current="" />
      <section className="rounded-lg bg-white p-4 shadow-sm">
        <OarSetForm boats={fleet.boats} limits={settings.limits} defaultClickCm={settings.clickCm} />
      </section>
    </div>
  );
}
