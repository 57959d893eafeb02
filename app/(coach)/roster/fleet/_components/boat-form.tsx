"use client";

import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { boatClasses, boatClassLabel, oarTypeOfClass } from "@/lib/fleet/catalogue";
import { boatWarnings, type LinkedOarSet } from "@/lib/fleet/warnings";
import { boatSchema, physicalSpanCm, physicalSpreadCm, type BoatFormInput, type BoatInput } from "@/lib/validations/fleet";
import { createBoatAction, updateBoatAction } from "../actions";
import { SaveFeedback, type SaveOutcome } from "./save-feedback";
import { optionalCmValue } from "./form-helpers";
import { reachAction } from "@/lib/http/reach-action";
import { ClientForm } from "@/components/ui/client-form";
import { showFieldErrors } from "@/components/ui/field-errors";

interface BoatFormProps {
  /** Present when editing. */
  boatId?: number;
  initial?: BoatFormInput;
  linkedSets?: LinkedOarSet[];
  halfSwivelCm: number;
}

const fields = ["name", "boatClass", "spanCm", "spreadCm", "notes"] as const;

/** Adds or edits a boat; the span or spread field follows the class; unusual values warn, impossible ones are refused. */
export function BoatForm({ boatId, initial, linkedSets = [], halfSwivelCm }: BoatFormProps) {
  const [result, setResult] = useState<SaveOutcome | null>(null);
  const form = useForm<BoatFormInput, unknown, BoatInput>({
    resolver: zodResolver(boatSchema),
    defaultValues: initial ?? { name: "", boatClass: "1x", notes: "" },
  });
  const { errors, isSubmitting } = form.formState;
  const [boatClass, spanCm, spreadCm] = useWatch({ control: form.control, name: ["boatClass", "spanCm", "spreadCm"] });
  const sculling = oarTypeOfClass(boatClass) === "sculling";
  const liveWarnings = boatWarnings({ boatClass, spanCm, spreadCm }, linkedSets, halfSwivelCm);

  const onSubmit = form.handleSubmit(async (values) => {
    const outcome = await reachAction(() => (boatId === undefined ? createBoatAction(values) : updateBoatAction(boatId, values)));
    setResult({ ok: outcome.ok, message: outcome.message, warnings: outcome.ok ? (outcome.data?.warnings ?? []) : [] });
    if (outcome.ok) {
      if (boatId === undefined) form.reset({ name: "", boatClass: values.boatClass, notes: "" });
      return;
    }
    showFieldErrors(form.setError, outcome.fieldErrors, fields);
  });

  return (
    <ClientForm onSubmit={onSubmit} noValidate className="space-y-4" data-testid="boat-form">
      <TextField label="Boat name" autoComplete="off" error={errors.name?.message} {...form.register("name")} />
      <SelectField
        label="Class"
        hint="x: sculling, two sculls a rower. − without a coxswain, + with one: sweep, one oar a rower."
        error={errors.boatClass?.message}
        options={boatClasses.map((value) => ({ value, label: boatClassLabel(value) }))}
        {...form.register("boatClass")}
      />
      {sculling ? (
        <TextField
          key="span"
          label="Span (cm)"
          hint={`Pin centre to pin centre, ${physicalSpanCm.min}–${physicalSpanCm.max} cm.`}
          inputMode="decimal"
          autoComplete="off"
          error={errors.spanCm?.message}
          {...form.register("spanCm", { setValueAs: optionalCmValue, shouldUnregister: true })}
        />
      ) : (
        <TextField
          key="spread"
          label="Spread (cm)"
          hint={`The boat's centre line to the pin centre, ${physicalSpreadCm.min}–${physicalSpreadCm.max} cm.`}
          inputMode="decimal"
          autoComplete="off"
          error={errors.spreadCm?.message}
          {...form.register("spreadCm", { setValueAs: optionalCmValue, shouldUnregister: true })}
        />
      )}
      <TextField label="Notes (optional)" autoComplete="off" error={errors.notes?.message} {...form.register("notes")} />
      <SaveFeedback testIdPrefix="boat-form" liveWarnings={liveWarnings} outcome={result} />
      <Button type="submit" pending={isSubmitting} pendingLabel="Saving…" className="w-full sm:w-auto">
        {boatId === undefined ? "Add the boat" : "Save changes"}
      </Button>
    </ClientForm>
  );
}
