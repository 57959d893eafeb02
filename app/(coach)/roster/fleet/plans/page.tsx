import type { Metadata } from "next";
import Form from "next/form";
import { PageTitle } from "@/components/ui/page-title";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/field";
import { RigNav, fleetLinks } from "@/components/rig/rig-nav";
import { formatCm } from "@/components/lessons/lesson-format";
import { planSummary } from "@/components/rig/plan-steps";
import { requirePageActor } from "@/lib/auth/session";
import { listFleet } from "@/lib/data/fleet";
import { listRigPlans } from "@/lib/data/rig-plans";
import { clubTimeZone } from "@/lib/data/club-settings";
import { formatInstantInZone } from "@/lib/care/calendar";
import { recordIdSchema } from "@/lib/validations/fleet";

export const metadata: Metadata = { title: "Saved plans" };

export default async function SavedPlansPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await requirePageActor("coach", "/roster/fleet/plans");
  const params = await searchParams;
  const [fleet, timeZone] = await Promise.all([listFleet(actor, { includeArchived: true }), clubTimeZone(actor.clubId)]);
  const boat = recordIdSchema.safeParse(params.boat);
  // A boat the club does not have (an old or edited link) shows every plan, as the select then says.
  const boatId = boat.success && fleet.boats.some((candidate) => candidate.id === boat.data) ? boat.data : undefined;
  const plans = await listRigPlans(actor, { boatId });
  const boatName = fleet.boats.find((candidate) => candidate.id === boatId)?.name;
  return (
    <div className="space-y-6">
      <PageTitle lead="Who rigged what, and when: the plans athletes saved in the boat-change helper, newest first.">Saved plans</PageTitle>
      <RigNav label="Fleet" links={fleetLinks} current="/roster/fleet/plans" />
      <Form
        action="/roster/fleet/plans"
        className="flex flex-wrap items-end gap-3 rounded-lg bg-white p-4 shadow-sm"
        data-testid="plans-filter"
      >
        <div className="min-w-56 flex-1">
          <SelectField
            label="Boat"
            name="boat"
            defaultValue={boatId === undefined ? "" : String(boatId)}
            options={[
              { value: "", label: "All boats" },
              ...fleet.boats.map((candidate) => ({
                value: String(candidate.id),
                label: `${candidate.name} (${candidate.boatClass})${candidate.archived ? ", archived" : ""}`,
              })),
            ]}
          />
        </div>
        <Button type="submit" variant="secondary" worksWithoutScript>
          Show
        </Button>
      </Form>
      {plans.length === 0 ? (
        <p data-testid="plans-empty">{boatName ? `No saved plans for ${boatName} yet.` : "No saved plans yet."}</p>
      ) : (
        <ul className="space-y-3" data-testid="plans-list">
          {plans.map((plan) => (
            <li key={plan.id} className="rounded-lg bg-white p-4 shadow-sm" data-testid="plan-entry">
              <p className="font-semibold">
                {plan.athleteName} · {plan.boatName} ({plan.boatClass}) · {plan.oarSetName}
              </p>
              <p className="text-sm text-slate-700">{formatInstantInZone(plan.plannedAt, timeZone)}</p>
              <p className="mt-1">
                Measured {formatCm(plan.measured.lengthCm)} cm, inboard {formatCm(plan.measured.inboardCm)} cm → target{" "}
                {formatCm(plan.target.lengthCm)} cm, inboard {formatCm(plan.target.inboardCm)} cm.
              </p>
              <p>{planSummary(plan.result)}</p>
              {plan.result.warnings.length > 0 ? (
                <details className="mt-1">
                  <summary className="cursor-pointer font-semibold text-signal-800">
                    <span aria-hidden="true">! </span>
                    {plan.result.warnings.length === 1 ? "1 warning" : `${plan.result.warnings.length} warnings`} shown to the athlete
                  </summary>
                  <ul className="list-disc pl-5 text-sm">
                    {plan.result.warnings.map((warning) => (
                      <li key={warning}>{warning}</li>
                    ))}
                  </ul>
                </details>
              ) : (
                <p className="text-sm text-reed-800">
                  <span aria-hidden="true">✓ </span>No warnings.
                </p>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
