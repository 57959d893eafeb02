"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { liftSuspensionSchema, suspendClearanceSchema } from "@/lib/validations/certification";
import { liftSuspensionAction, suspendClearanceAction } from "../actions";
import { reachAction } from "@/lib/http/reach-action";
import { ClientForm } from "@/components/ui/client-form";

type Outcome = { ok: boolean; message?: string } | null;

/**
 * Suspend or lift an athlete's clearance. One component for both, so the status message survives the
 * refresh that swaps one form for the other.
 */
export function SuspensionControl({ athleteId, suspended }: { athleteId: number; suspended: boolean }) {
  const [result, setResult] = useState<Outcome>(null);
  return (
    <div className="space-y-3">
      {suspended ? (
        <LiftSuspensionForm athleteId={athleteId} onDone={setResult} />
      ) : (
        <SuspendClearanceForm athleteId={athleteId} onDone={setResult} />
      )}
      <LiveStatus testId="suspension-status">
        {result && <Notice tone={result.ok ? "success" : "error"} title={result.message} />}
      </LiveStatus>
    </div>
  );
}

function SuspendClearanceForm({ athleteId, onDone }: { athleteId: number; onDone: (outcome: Outcome) => void }) {
  const router = useRouter();
  const form = useForm<z.input<typeof suspendClearanceSchema>, unknown, z.output<typeof suspendClearanceSchema>>({
    resolver: zodResolver(suspendClearanceSchema),
    defaultValues: { reason: "" },
  });
  const onSubmit = form.handleSubmit(async (values) => {
    const outcome = await reachAction(() => suspendClearanceAction(athleteId, values));
    onDone(outcome);
    if (!outcome.ok && outcome.fieldErrors.reason) form.setError("reason", { message: outcome.fieldErrors.reason[0] });
    // Also after a refusal: another coach may have suspended meanwhile, and this page must not keep showing a clearance.
    else router.refresh();
  });
  return (
    <ClientForm onSubmit={onSubmit} noValidate className="space-y-3" data-testid="suspend-form">
      <TextField
        label="Reason for suspending"
        hint="The athlete sees this."
        error={form.formState.errors.reason?.message}
        {...form.register("reason")}
      />
      <Button type="submit" variant="danger" pending={form.formState.isSubmitting} pendingLabel="Suspending…">
        Suspend clearance
      </Button>
    </ClientForm>
  );
}

function LiftSuspensionForm({ athleteId, onDone }: { athleteId: number; onDone: (outcome: Outcome) => void }) {
  const router = useRouter();
  const form = useForm<z.input<typeof liftSuspensionSchema>, unknown, z.output<typeof liftSuspensionSchema>>({
    resolver: zodResolver(liftSuspensionSchema),
    defaultValues: { note: "" },
  });
  const onSubmit = form.handleSubmit(async (values) => {
    const outcome = await reachAction(() => liftSuspensionAction(athleteId, values));
    onDone(outcome);
    if (!outcome.ok && outcome.fieldErrors.note) form.setError("note", { message: outcome.fieldErrors.note[0] });
    // Also after a refusal: another coach may have lifted it meanwhile.
    else router.refresh();
  });
  return (
    <ClientForm onSubmit={onSubmit} noValidate className="space-y-3" data-testid="lift-form">
      <TextField label="Note (optional)" error={form.formState.errors.note?.message} {...form.register("note")} />
      <Button type="submit" pending={form.formState.isSubmitting} pendingLabel="Lifting…">
        Lift the suspension
      </Button>
    </ClientForm>
  );
}
