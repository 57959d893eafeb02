"use client";

import { useState } from "react";
import { Controller, useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { boatClassLabel, handleMechanismLabels, handleMechanisms, oarTypeLabels } from "@/lib/fleet/catalogue";
import { oarSetWarnings } from "@/lib/fleet/warnings";
import type { ClubOarLimits } from "@/lib/rigging/limits";
import { oarTypes } from "@/lib/rigging/types";
import { oarSetSchema, type OarSetFormInput, type OarSetInput } from "@/lib/validations/fleet";
import type { BoatSummary } from "@/lib/data/fleet";
import { createOarSetAction, updateOarSetAction } from "../actions";
import { SaveFeedback, type SaveOutcome } from "./save-feedback";
import { cmValue, wholeValue } from "./form-helpers";
import { reachAction } from "@/lib/http/reach-action";
import { ClientForm } from "@/components/ui/client-form";
import { showFieldErrors } from "@/components/ui/field-errors";

interface OarSetFormProps {
  oarSetId?: number;
  initial?: OarSetFormInput;
  /** The club's active boats; the form offers those that suit the oar type. */
  boats: BoatSummary[];
  limits: ClubOarLimits;
  defaultClickCm: number;
}

const fields = [
  "name",
  "oarType",
  "oarCount",
  "targetLengthCm",
  "targetInboardCm",
  "clickCm",
  "handleMechanism",
  "boatIds",
  "notes",
] as const;

/** Adds or edits an oar set: targets checked against the club's limits as you type (warnings) and refused when impossible. */
export function OarSetForm({ oarSetId, initial, boats, limits, defaultClickCm }: OarSetFormProps) {
  const [result, setResult] = useState<SaveOutcome | null>(null);
  const form = useForm<OarSetFormInput, unknown, OarSetInput>({
    resolver: zodResolver(oarSetSchema),
    defaultValues: initial ?? {
      name: "",
      oarType: "sculling",
      clickCm: defaultClickCm,
      handleMechanism: "clamped-slide",
      boatIds: [],
      notes: "",
    },
  });
  const { errors, isSubmitting } = form.formState;
  const [oarType, oarCount, targetLengthCm, targetInboardCm] = useWatch({
    control: form.control,
    name: ["oarType", "oarCount", "targetLengthCm", "targetInboardCm"],
  });
  const suitable = boats.filter((boat) => boat.oarType === oarType);
  const liveWarnings = oarSetWarnings({ oarType, oarCount, targetLengthCm, targetInboardCm }, limits);
  const range = limits[oarType];

  const onSubmit = form.handleSubmit(async (values) => {
    const outcome = await reachAction(() => (oarSetId === undefined ? createOarSetAction(values) : updateOarSetAction(oarSetId, values)));
    setResult({ ok: outcome.ok, message: outcome.message, warnings: outcome.ok ? (outcome.data?.warnings ?? []) : [] });
    if (outcome.ok) {
      if (oarSetId === undefined) {
        form.reset({
          name: "",
          oarType: values.oarType,
          clickCm: values.clickCm,
          handleMechanism: values.handleMechanism,
          boatIds: [],
          notes: "",
        });
      }
      return;
    }
    showFieldErrors(form.setError, outcome.fieldErrors, fields);
  });

  return (
    <ClientForm onSubmit={onSubmit} noValidate className="space-y-4" data-testid="oar-set-form">
      <TextField label="Set name" autoComplete="off" error={errors.name?.message} {...form.register("name")} />
      <SelectField
        label="Oars"
        error={errors.oarType?.message}
        options={oarTypes.map((value) => ({ value, label: oarTypeLabels[value] }))}
        {...form.register("oarType", {
          onChange: (event: { target: { value: string } }) => {
            // Boats of the other type cannot stay chosen.
            const kept = (form.getValues("boatIds") ?? []).filter(
              (id) => boats.find((boat) => boat.id === id)?.oarType === event.target.value,
            );
            form.setValue("boatIds", kept);
          },
        })}
      />
      <TextField
        label="Number of oars"
        inputMode="numeric"
        autoComplete="off"
        error={errors.oarCount?.message}
        {...form.register("oarCount", { setValueAs: wholeValue })}
      />
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <TextField
          label="Target overall length (cm)"
          hint={`Your club's range for ${oarTypeLabels[oarType].toLowerCase()}: ${range.minLengthCm}–${range.maxLengthCm} cm.`}
          inputMode="decimal"
          autoComplete="off"
          error={errors.targetLengthCm?.message}
          {...form.register("targetLengthCm", { setValueAs: cmValue })}
        />
        <TextField
          label="Target inboard (cm)"
          hint={`Your club's range: ${range.minInboardCm}–${range.maxInboardCm} cm.`}
          inputMode="decimal"
          autoComplete="off"
          error={errors.targetInboardCm?.message}
          {...form.register("targetInboardCm", { setValueAs: cmValue })}
        />
      </div>
      <TextField
        label="Collar click (cm)"
        hint="How far one click moves the collar; 0.5 cm on common collars."
        inputMode="decimal"
        autoComplete="off"
        error={errors.clickCm?.message}
        {...form.register("clickCm", { setValueAs: cmValue })}
      />
      <SelectField
        label="Handle"
        error={errors.handleMechanism?.message}
        options={handleMechanisms.map((value) => ({ value, label: handleMechanismLabels[value] }))}
        {...form.register("handleMechanism")}
      />
      <Controller
        control={form.control}
        name="boatIds"
        render={({ field }) => {
          const chosen = field.value ?? [];
          return (
            <fieldset aria-describedby={errors.boatIds ? "boat-ids-error" : undefined}>
              <legend className="font-semibold text-slate-900">Used in</legend>
              {suitable.length === 0 ? (
                <p className="text-sm text-slate-700">
                  No {oarType === "sculling" ? "sculling" : "sweep"} boats yet: add one first, or link it later.
                </p>
              ) : (
                <div className="mt-1 grid gap-1 sm:grid-cols-2">
                  {suitable.map((boat) => (
                    <label key={boat.id} className="flex min-h-11 items-center gap-3">
                      <input
                        type="checkbox"
                        className="h-5 w-5"
                        checked={chosen.includes(boat.id)}
                        onChange={(event) =>
                          field.onChange(event.target.checked ? [...chosen, boat.id] : chosen.filter((id) => id !== boat.id))
                        }
                      />
                      {boat.name} <span className="text-sm text-slate-700">{boatClassLabel(boat.boatClass)}</span>
                    </label>
                  ))}
                </div>
              )}
              {errors.boatIds && (
                <p id="boat-ids-error" className="text-sm font-semibold text-alarm-800">
                  <span aria-hidden="true">⚠ </span>
                  {errors.boatIds.message}
                </p>
              )}
            </fieldset>
          );
        }}
      />
      <TextField label="Notes (optional)" autoComplete="off" error={errors.notes?.message} {...form.register("notes")} />
      <SaveFeedback testIdPrefix="oar-set-form" liveWarnings={liveWarnings} outcome={result} />
      <Button type="submit" pending={isSubmitting} pendingLabel="Saving…" className="w-full sm:w-auto">
        {oarSetId === undefined ? "Add the oar set" : "Save changes"}
      </Button>
    </ClientForm>
  );
}
