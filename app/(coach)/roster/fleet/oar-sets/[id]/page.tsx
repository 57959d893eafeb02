import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/ui/page-title";
import { RigNav, fleetLinks } from "@/components/rig/rig-nav";
import { requirePageActor } from "@/lib/auth/session";
import { getOarSetForEdit, listFleet, rigSettingsFor } from "@/lib/data/fleet";
import { orNotFound } from "@/lib/http/page-not-found";
import { recordIdSchema } from "@/lib/validations/fleet";
import { OarSetForm } from "../../_components/oar-set-form";

export const metadata: Metadata = { title: "Edit an oar set" };

export default async function EditOarSetPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageActor("coach", `/roster/fleet/oar-sets/${id}`);
  const oarSetId = recordIdSchema.safeParse(id);
  if (!oarSetId.success) notFound();
  const [set, fleet, settings] = await Promise.all([
    orNotFound(getOarSetForEdit(actor, oarSetId.data)),
    listFleet(actor),
    rigSettingsFor(actor),
  ]);
  const activeBoatIds = new Set(fleet.boats.map((boat) => boat.id));
  return (
    <div>
      <PageTitle
        lead={set.archived ? "Archived: hidden from athletes until restored." : "Changes apply to the next plan an athlete works out."}
      >
        Edit {set.name}
      </PageTitle>
      <RigNav label="Fleet" links={fleetLinks} current="" />
      <section className="rounded-lg bg-white p-4 shadow-sm">
        <OarSetForm
          oarSetId={set.id}
          initial={{
            name: set.name,
            oarType: set.oarType,
            oarCount: set.oarCount,
            targetLengthCm: set.targetLengthCm,
            targetInboardCm: set.targetInboardCm,
            clickCm: set.clickCm,
            handleMechanism: set.handleMechanism,
            boatIds: set.boatIds.filter((boatId) => activeBoatIds.has(boatId)),
            notes: set.notes,
          }}
          boats={fleet.boats}
          limits={settings.limits}
          defaultClickCm={settings.clickCm}
        />
      </section>
    </div>
  );
}
