"use client";

import Link from "next/link";
import { PendingMark } from "@/components/ui/pending-mark";
import { useEffect, useState, useSyncExternalStore } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { formatCm, parseCmInput } from "@/components/lessons/lesson-format";
import { planSteps, type PlanContext } from "@/components/rig/plan-steps";
import { PlanStepsView } from "@/components/rig/plan-steps-view";
import { useHydrated } from "@/components/ui/use-hydrated";
import {
  addPending,
  flushPending,
  newClientId,
  parsePending,
  pendingSnapshot,
  sendPlan,
  subscribePending,
} from "@/components/rig/pending-plans";
import { boatClassLabel, handleMechanismLabels } from "@/lib/fleet/catalogue";
import { computeRigPlan, type RigPlanResponse } from "@/lib/fleet/plan-response";
import type { ClubOarLimits } from "@/lib/rigging/limits";
import type { RigPlanRequestInput } from "@/lib/validations/rig";
import { measuredOarSchema, rigPlanRouteSchema, type MeasuredOarInput, type SavedRigPlanInput } from "@/lib/validations/rig-plans";
import type { BoatSummary, OarSetSummary } from "@/lib/data/fleet";
import { ClientForm } from "@/components/ui/client-form";

interface RigHelperProps {
  boats: BoatSummary[];
  oarSets: OarSetSummary[];
  limits: ClubOarLimits;
  halfSwivelCm: number;
  userId: number;
  initialBoatId?: number;
}

interface Outcome {
  plan: RigPlanResponse;
  context: PlanContext;
  source: "server" | "phone";
  payload: SavedRigPlanInput;
}

type SaveStatus = { tone: "success" | "info" | "error"; message: string } | null;

function toCm(value: unknown): number {
  return parseCmInput(String(value ?? "")) ?? Number.NaN;
}

const noPlans = () => "[]";

/** The athlete's boat-change helper: pick the boat (and oar set), type what the oar measures, get the steps. */
export function RigHelper({ boats, oarSets, limits, halfSwivelCm, userId, initialBoatId }: RigHelperProps) {
  const [boatId, setBoatId] = useState<number | null>(boats.some((boat) => boat.id === initialBoatId) ? (initialBoatId ?? null) : null);
  const [chosenSetId, setChosenSetId] = useState<number | null>(null);
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [saveStatus, setSaveStatus] = useState<SaveStatus>(null);
  const [saving, setSaving] = useState(false);
  const [syncMessage, setSyncMessage] = useState<string | null>(null);
  // Until React has taken over, a choice made in the server-rendered page would be lost.
  const hydrated = useHydrated();
  const snapshot = useSyncExternalStore(subscribePending, pendingSnapshot, noPlans);
  const waiting = parsePending(snapshot).filter((item) => item.userId === userId).length;

  const form = useForm<MeasuredOarInput>({ resolver: zodResolver(measuredOarSchema) });
  const { errors, isSubmitting } = form.formState;

  const boat = boats.find((candidate) => candidate.id === boatId) ?? null;
  const setsForBoat = boat ? oarSets.filter((set) => boat.oarSetIds.includes(set.id)) : [];
  const oarSet = setsForBoat.length === 1 ? setsForBoat[0]! : (setsForBoat.find((set) => set.id === chosenSetId) ?? null);

  useEffect(() => {
    const sendKept = () => {
      void flushPending(userId).then((result) => {
        if (result.sent > 0) {
          setSyncMessage(
            `${result.sent === 1 ? "1 plan" : `${result.sent} plans`} kept on this phone ${result.sent === 1 ? "was" : "were"} sent to your club.`,
          );
        }
        if (result.refused.length > 0) setSyncMessage(`A kept plan was not accepted: ${result.refused[0]}`);
      });
    };
    sendKept();
    window.addEventListener("online", sendKept);
    return () => window.removeEventListener("online", sendKept);
  }, [userId]);

  function chooseBoat(value: string) {
    setBoatId(value === "" ? null : Number(value));
    setChosenSetId(null);
    setOutcome(null);
    setSaveStatus(null);
    setProblem(null);
  }

  function chooseSet(value: string) {
    setChosenSetId(value === "" ? null : Number(value));
    setOutcome(null);
    setSaveStatus(null);
  }

  const onSubmit = form.handleSubmit(async (measured) => {
    setProblem(null);
    setSaveStatus(null);
    setOutcome(null);
    if (!boat || !oarSet) {
      setProblem(boat ? "Choose the oar set you are using." : "Choose the boat you are moving to.");
      return;
    }
    const request: RigPlanRequestInput = {
      oarType: oarSet.oarType,
      measured,
      target: { lengthCm: oarSet.targetLengthCm, inboardCm: oarSet.targetInboardCm },
      clickCm: oarSet.clickCm,
      halfSwivelCm,
      ...(boat.oarType === "sculling" && boat.spanCm !== null ? { spanCm: boat.spanCm } : {}),
      ...(boat.oarType === "sweep" && boat.spreadCm !== null ? { spreadCm: boat.spreadCm } : {}),
    };
    const checked = rigPlanRouteSchema.safeParse(request);
    if (!checked.success) {
      let shown = false;
      for (const issue of checked.error.issues) {
        const [first, field] = issue.path;
        if (first === "measured" && (field === "lengthCm" || field === "inboardCm")) {
          form.setError(field, { message: issue.message });
          shown = true;
        }
      }
      if (!shown) setProblem("This oar set's settings cannot be planned for: ask your coach to check them.");
      return;
    }

    let plan: RigPlanResponse | null = null;
    let source: Outcome["source"] = "server";
    if (navigator.onLine) {
      try {
        const response = await fetch("/api/rig/plan", {
          method: "POST",
          headers: { "content-type": "application/json" },
          body: JSON.stringify(request),
        });
        if (response.ok) plan = (await response.json()) as RigPlanResponse;
        else if (response.status === 400) {
          const body = (await response.json()) as { message?: string };
          setProblem(body.message ?? "Check the numbers you typed.");
          return;
        }
      } catch {
        // No answer at all (offline, server unreachable): the plan is worked out below, on the phone.
        plan = null;
      }
    }
    if (plan === null) {
      source = "phone";
      try {
        plan = computeRigPlan(checked.data, limits);
      } catch (error) {
        setProblem(error instanceof RangeError ? `These numbers cannot be right: ${error.message}.` : "The plan could not be worked out.");
        return;
      }
    }
    const context: PlanContext = {
      oarType: oarSet.oarType,
      measured,
      target: request.target,
      clickCm: oarSet.clickCm,
      handleMechanism: oarSet.handleMechanism,
      spanCm: checked.data.spanCm,
      spreadCm: checked.data.spreadCm,
      halfSwivelCm,
    };
    setOutcome({
      plan,
      context,
      source,
      payload: { clientId: newClientId(), boatId: boat.id, oarSetId: oarSet.id, request, plannedAt: new Date().toISOString() },
    });
  });

  async function savePlan() {
    if (!outcome) return;
    setSaving(true);
    const result = await sendPlan(outcome.payload);
    setSaving(false);
    if (result.kind === "saved") {
      setSaveStatus({ tone: "success", message: "Plan saved: your coach can see it." });
    } else if (result.kind === "refused") {
      setSaveStatus({ tone: "error", message: result.message });
    } else {
      addPending({ userId, payload: outcome.payload });
      setSaveStatus({
        tone: "info",
        message:
          result.kind === "signed-out"
            ? "Kept on this phone: sign in again and it will be sent."
            : "Kept on this phone: it will be sent when you are back online.",
      });
    }
  }

  return (
    <div className="space-y-6">
      <ClientForm onSubmit={onSubmit} noValidate className="space-y-4 rounded-lg bg-white p-4 shadow-sm" data-testid="rig-helper">
        <SelectField
          label="Boat you are moving to"
          disabled={!hydrated}
          value={boatId === null ? "" : String(boatId)}
          onChange={(event) => chooseBoat(event.target.value)}
          options={[
            { value: "", label: "Choose a boat" },
            ...boats.map((candidate) => ({
              value: String(candidate.id),
              label: `${candidate.name}: ${boatClassLabel(candidate.boatClass)}`,
            })),
          ]}
        />
        {boat && setsForBoat.length === 0 && (
          <Notice tone="warning" title="No oar set is recorded for this boat">
            Ask your coach which oars to use and what to set them to.
          </Notice>
        )}
        {boat && setsForBoat.length > 1 && (
          <SelectField
            label="Oar set"
            hint="This boat is used with more than one set: pick the oars you have."
            disabled={!hydrated}
            value={chosenSetId === null ? "" : String(chosenSetId)}
            onChange={(event) => chooseSet(event.target.value)}
            options={[
              { value: "", label: "Choose the oar set" },
              ...setsForBoat.map((set) => ({ value: String(set.id), label: set.name })),
            ]}
          />
        )}
        {boat && oarSet && (
          <div className="rounded-md bg-river-50 p-3 text-sm leading-6" data-testid="helper-target">
            <p>
              <span className="font-semibold">{oarSet.name}</span> in {boat.name}: overall length {formatCm(oarSet.targetLengthCm)} cm,
              inboard {formatCm(oarSet.targetInboardCm)} cm, collar clicks of {formatCm(oarSet.clickCm)} cm.
            </p>
            <p>Handle: {handleMechanismLabels[oarSet.handleMechanism].toLowerCase()}.</p>
            <Link href={`/rig/boats/${boat.id}`} className="font-semibold text-river-700 underline">
              All of {boat.name}&apos;s settings
              <PendingMark />
            </Link>
          </div>
        )}
        <fieldset className="space-y-4">
          <legend className="font-semibold text-slate-900">What your oar measures now</legend>
          <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
            <TextField
              label="Overall length (cm)"
              hint="Blade tip to the end of the handle, along the shaft."
              inputMode="decimal"
              autoComplete="off"
              error={errors.lengthCm?.message}
              {...form.register("lengthCm", { setValueAs: toCm })}
            />
            <TextField
              label="Inboard (cm)"
              hint="End of the handle to the face of the collar that rests against the swivel."
              inputMode="decimal"
              autoComplete="off"
              error={errors.inboardCm?.message}
              {...form.register("inboardCm", { setValueAs: toCm })}
            />
          </div>
        </fieldset>
        <LiveStatus testId="helper-status">{problem && <Notice tone="error" title={problem} />}</LiveStatus>
        <Button type="submit" pending={isSubmitting} pendingLabel="Working it out…" className="w-full">
          Show my steps
        </Button>
      </ClientForm>

      {outcome && (
        <>
          <PlanStepsView steps={planSteps(outcome.plan, outcome.context)} warnings={outcome.plan.warnings} source={outcome.source} />
          <div className="space-y-3 rounded-lg bg-white p-4 shadow-sm">
            <p>Done it? Save the plan so your coach can see who rigged what, and when.</p>
            <Button
              type="button"
              variant="secondary"
              onClick={savePlan}
              pending={saving}
              pendingLabel="Saving…"
              disabled={saveStatus?.tone === "success" || saveStatus?.tone === "info"}
            >
              Save this plan
            </Button>
          </div>
        </>
      )}
      <LiveStatus testId="save-status">{saveStatus && <Notice tone={saveStatus.tone} title={saveStatus.message} />}</LiveStatus>
      <LiveStatus testId="pending-status">
        {waiting > 0 && (
          <Notice tone="info" title={`${waiting === 1 ? "1 plan is" : `${waiting} plans are`} kept on this phone`}>
            They are sent as soon as the phone is back online.
          </Notice>
        )}
        {syncMessage && <Notice tone="success" title={syncMessage} />}
      </LiveStatus>
    </div>
  );
}
