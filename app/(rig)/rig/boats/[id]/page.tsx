import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/ui/page-title";
import { Notice } from "@/components/ui/notice";
import { buttonClasses } from "@/components/ui/button-classes";
import { RigNav, memberRigLinks } from "@/components/rig/rig-nav";
import { requirePageActor } from "@/lib/auth/session";
import { isCoach } from "@/lib/auth/permissions";
import { getBoatDetails } from "@/lib/data/fleet";
import { boatClassLabel } from "@/lib/fleet/catalogue";
import { describeOarSetInBoat, describeRigWidth } from "@/lib/fleet/describe";
import { recordIdSchema } from "@/lib/validations/fleet";
import { orNotFound } from "@/lib/http/page-not-found";

export const metadata: Metadata = { title: "Boat settings" };

export default async function BoatSettingsPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageActor("member", `/rig/boats/${id}`);
  const boatId = recordIdSchema.safeParse(id);
  if (!boatId.success) notFound();
  const { boat, oarSets, settings } = await orNotFound(getBoatDetails(actor, boatId.data));
  const className = boatClassLabel(boat.boatClass);
  return (
    <div className="space-y-6">
      <PageTitle lead={`${className.charAt(0).toUpperCase()}${className.slice(1)}${boat.archived ? " · archived" : ""}`}>
        {boat.name}
      </PageTitle>
      <RigNav label="Rig" links={memberRigLinks(isCoach(actor))} current="" />
      <section aria-labelledby="boat-heading" className="rounded-lg bg-white p-4 shadow-sm" data-testid="boat-settings">
        <h2 id="boat-heading" className="mb-2 text-lg font-semibold">
          The boat
        </h2>
        <p>{describeRigWidth(boat)}</p>
        {boat.notes && <p className="mt-2 text-slate-700">Notes: {boat.notes}</p>}
      </section>
      <section aria-labelledby="sets-heading" className="space-y-3">
        <h2 id="sets-heading" className="text-lg font-semibold">
          Oar sets used in {boat.name}
        </h2>
        {oarSets.length === 0 ? (
          <p>No oar set is recorded for this boat yet: ask your coach which oars to use.</p>
        ) : (
          <ul className="space-y-3">
            {oarSets.map((set) => {
              const described = describeOarSetInBoat(boat, set, settings.halfSwivelCm, settings.limits);
              return (
                <li key={set.id} className="rounded-lg bg-white p-4 shadow-sm" data-testid="boat-oar-set">
                  <h3 className="font-semibold text-river-900">{set.name}</h3>
                  <div className="mt-1 space-y-1 leading-7">
                    {described.lines.map((line) => (
                      <p key={line}>{line}</p>
                    ))}
                  </div>
                  {described.warnings.length > 0 && (
                    <div className="mt-2">
                      <Notice tone="warning" title="Outside your club's limits">
                        <ul className="list-disc pl-5">
                          {described.warnings.map((warning) => (
                            <li key={warning}>{warning}</li>
                          ))}
                        </ul>
                      </Notice>
                    </div>
                  )}
                </li>
              );
            })}
          </ul>
        )}
      </section>
      {!boat.archived && (
        <Link href={`/rig?boat=${boat.id}`} className={buttonClasses("primary")}>
          Plan a change to {boat.name}
        </Link>
      )}
    </div>
  );
}
