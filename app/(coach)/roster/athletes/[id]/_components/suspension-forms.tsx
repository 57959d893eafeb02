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

type Outcome = { ok: boolean; message?: string } | null;

/** Suspend an athlete's clearance: the reason is required and shown to the athlete. */
export function SuspendClearanceForm({ athleteId }: { athleteId: number }) {
  const router = useRouter();
  const [result, setResult] = useState<Outcome>(null);
  const form = useForm<
    z.input<typeof suspendClearanceSchema>,
    unknown,
    z.output<typeof suspendClearanceSchema>
  >({
    resolver: zodResolver(suspendClearanceSchema),
    defaultValues: { reason: "" },
  });
  const onSubmit = form.handleSubmit(async (values) => {
    const outcome = await suspendClearanceAction(athleteId, values);
    setResult(outcome);
    if (outcome.ok) {
      form.reset();
      router.refresh();
    } else if (outcome.fieldErrors.reason)
      form.setError("reason", { message: outcome.fieldErrors.reason[0] });
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" data-testid="suspend-form">
      <TextField
        label="Reason for suspending"
        hint="The athlete sees this."
        error={form.formState.errors.reason?.message}
        {...form.register("reason")}
      />
      <Button type="submit" variant="danger" pending={form.formState.isSubmitting} pendingLabel="Suspending…">
        Suspend clearance
      </Button>
      <LiveStatus testId="suspend-status">
        {result && <Notice tone={result.ok ? "success" : "error"} title={result.message} />}
      </LiveStatus>
    </form>
  );
}

/** Lift a suspension, with an optional note for the record. */
export function LiftSuspensionForm({ athleteId }: { athleteId: number }) {
  const router = useRouter();
  const [result, setResult] = useState<Outcome>(null);
  const form = useForm<z.input<typeof liftSuspensionSchema>, unknown, z.output<typeof liftSuspensionSchema>>({
    resolver: zodResolver(liftSuspensionSchema),
    defaultValues: { note: "" },
  });
  const onSubmit = form.handleSubmit(async (values) => {
    const outcome = await liftSuspensionAction(athleteId, values);
    setResult(outcome);
    if (outcome.ok) router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" data-testid="lift-form">
      <TextField
        label="Note (optional)"
        error={form.formState.errors.note?.message}
        {...form.register("note")}
      />
      <Button type="submit" pending={form.formState.isSubmitting} pendingLabel="Lifting…">
        Lift the suspension
      </Button>
      <LiveStatus testId="lift-status">
        {result && <Notice tone={result.ok ? "success" : "error"} title={result.message} />}
      </LiveStatus>
    </form>
  );
}
