"use client";

import { useMemo, useState } from "react";
import { useRouter } from "next/navigation";
import { useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { cleaningMethodLabels, cleaningMethods } from "@/lib/care/methods";
import { cleaningRecordSchemaFor, type CleaningRecordFormInput, type CleaningRecordInput } from "@/lib/validations/cleaning";
import { recordCleaningAction } from "../actions";
import { reachAction } from "@/lib/http/reach-action";
import { ClientForm } from "@/components/ui/client-form";
import { showFieldErrors } from "@/components/ui/field-errors";

interface CleaningFormProps {
  oarSets: { id: number; name: string }[];
  members: { id: number; name: string }[];
  me: { id: number; name: string };
  today: string;
}

const formFields = ["oarSetId", "cleanedOn", "cleanedById", "method", "note"] as const;

/** Records one cleaning: which set, the day (not in the future), who (you unless you say otherwise), how. */
export function CleaningForm({ oarSets, members, me, today }: CleaningFormProps) {
  const router = useRouter();
  const [result, setResult] = useState<{ ok: boolean; message?: string } | null>(null);
  const schema = useMemo(() => cleaningRecordSchemaFor(today), [today]);
  const form = useForm<CleaningRecordFormInput, unknown, CleaningRecordInput>({
    resolver: zodResolver(schema),
    defaultValues: { cleanedOn: today, method: "detergent-brush", note: "" },
  });
  const { errors, isSubmitting } = form.formState;
  const method = useWatch({ control: form.control, name: "method" });

  const onSubmit = form.handleSubmit(async (values) => {
    const outcome = await reachAction(() => recordCleaningAction(values));
    setResult(outcome);
    if (outcome.ok) {
      form.reset({ cleanedOn: today, method: "detergent-brush", note: "" });
      router.refresh();
      return;
    }
    showFieldErrors(form.setError, outcome.fieldErrors, formFields);
  });

  return (
    <ClientForm onSubmit={onSubmit} noValidate className="space-y-4" data-testid="cleaning-form">
      <SelectField
        label="Oar set"
        error={errors.oarSetId?.message}
        options={[{ value: "", label: "Choose the oar set" }, ...oarSets.map((set) => ({ value: String(set.id), label: set.name }))]}
        {...form.register("oarSetId", { setValueAs: (value: string) => (value === "" ? Number.NaN : Number(value)) })}
      />
      <TextField label="Day of the cleaning" type="date" max={today} error={errors.cleanedOn?.message} {...form.register("cleanedOn")} />
      <SelectField
        label="Who cleaned"
        error={errors.cleanedById?.message}
        options={[
          { value: "", label: `Me (${me.name})` },
          ...members.filter((member) => member.id !== me.id).map((member) => ({ value: String(member.id), label: member.name })),
        ]}
        {...form.register("cleanedById", {
          setValueAs: (value: string) => (value === "" || value === undefined ? undefined : Number(value)),
        })}
      />
      <fieldset aria-describedby={errors.method ? "method-error" : undefined}>
        <legend className="font-semibold text-slate-900">How</legend>
        <div className="mt-1 space-y-1">
          {cleaningMethods.map((value) => (
            <label key={value} className="flex min-h-11 items-center gap-3">
              <input type="radio" value={value} className="h-5 w-5" {...form.register("method")} />
              {cleaningMethodLabels[value]}
            </label>
          ))}
        </div>
        {errors.method && (
          <p id="method-error" className="text-sm font-semibold text-alarm-800">
            <span aria-hidden="true">⚠ </span>
            {errors.method.message}
          </p>
        )}
      </fieldset>
      <TextField
        label={method === "other" ? "Note (say how)" : "Note (optional)"}
        autoComplete="off"
        error={errors.note?.message}
        {...form.register("note")}
      />
      <LiveStatus testId="cleaning-status">{result && <Notice tone={result.ok ? "success" : "error"} title={result.message} />}</LiveStatus>
      <Button type="submit" pending={isSubmitting} pendingLabel="Recording…" className="w-full">
        Record the cleaning
      </Button>
    </ClientForm>
  );
}
