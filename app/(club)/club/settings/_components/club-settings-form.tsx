"use client";

import { useState } from "react";
import { useForm, type FieldPath } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { clubSettingsFormSchema, type ClubSettingsForm } from "@/lib/validations/club-settings-form";
import { saveClubSettingsAction } from "../actions";
import { reachAction } from "@/lib/http/reach-action";
import { ClientForm } from "@/components/ui/client-form";

type Path = FieldPath<ClubSettingsForm>;

function errorAt(errors: unknown, path: string): string | undefined {
  let node: unknown = errors;
  for (const key of path.split(".")) node = (node as Record<string, unknown> | undefined)?.[key];
  return (node as { message?: string } | undefined)?.message;
}

const oarKinds = [
  { key: "sculling", title: "Sculls" },
  { key: "sweep", title: "Sweep oars" },
] as const;

const limitFields = [
  { key: "minLengthCm", label: "Shortest overall length (cm)" },
  { key: "maxLengthCm", label: "Longest overall length (cm)" },
  { key: "minInboardCm", label: "Shortest inboard (cm)" },
  { key: "maxInboardCm", label: "Longest inboard (cm)" },
] as const;

/** The club's settings: quiz numbers, what clearance needs and how long it lasts, oar limits, the club's day. */
export function ClubSettingsFormView({
  initial,
  modules,
  timeZones,
}: {
  initial: ClubSettingsForm;
  modules: { slug: string; title: string }[];
  timeZones: string[];
}) {
  const [result, setResult] = useState<{ ok: boolean; message?: string } | null>(null);
  const form = useForm<ClubSettingsForm>({
    resolver: zodResolver(clubSettingsFormSchema),
    defaultValues: initial,
  });
  const { errors, isSubmitting } = form.formState;
  const number = (path: Path) => form.register(path, { valueAsNumber: true });

  const onSubmit = form.handleSubmit(async (values) => {
    const outcome = await reachAction(() => saveClubSettingsAction(values));
    setResult(outcome);
    if (outcome.ok) form.reset(values);
    else for (const [field, messages] of Object.entries(outcome.fieldErrors)) form.setError(field as Path, { message: messages[0] });
  });

  const modulesError = errorAt(errors, "clearanceModules");
  return (
    <ClientForm onSubmit={onSubmit} noValidate className="space-y-6" data-testid="settings-form">
      <fieldset className="grid grid-cols-1 gap-4 rounded-lg bg-white p-4 shadow-sm sm:grid-cols-3">
        <legend className="px-1 text-lg font-semibold">Quizzes</legend>
        <TextField
          label="Pass mark (%)"
          type="number"
          inputMode="numeric"
          step={1}
          error={errorAt(errors, "passMarkPercent")}
          {...number("passMarkPercent")}
        />
        <TextField
          label="Collar click (cm)"
          type="number"
          inputMode="decimal"
          step={0.1}
          error={errorAt(errors, "clickCm")}
          {...number("clickCm")}
        />
        <TextField
          label="Half swivel width (cm)"
          hint="Used in the protocol overlap"
          type="number"
          inputMode="decimal"
          step={0.1}
          error={errorAt(errors, "halfSwivelCm")}
          {...number("halfSwivelCm")}
        />
      </fieldset>

      <fieldset
        className="space-y-4 rounded-lg bg-white p-4 shadow-sm"
        aria-describedby={modulesError ? "clearance-modules-error" : undefined}
      >
        <legend className="px-1 text-lg font-semibold">Rigging without a coach</legend>
        <div>
          <p className="mb-2 font-semibold">Modules an athlete must pass (quiz and practical)</p>
          <ul className="space-y-1">
            {modules.map((module) => (
              <li key={module.slug}>
                <label className="flex min-h-11 items-center gap-3">
                  <input type="checkbox" value={module.slug} className="h-5 w-5 accent-river-700" {...form.register("clearanceModules")} />
                  {module.title}
                </label>
              </li>
            ))}
          </ul>
          {modulesError && (
            <p id="clearance-modules-error" className="text-sm font-semibold text-alarm-800">
              <span aria-hidden="true">⚠ </span>
              {modulesError}
            </p>
          )}
        </div>
        <TextField
          label="A module pass lasts (months)"
          hint="Counted from the day of the practical sign-off. Certificates already issued keep their dates."
          type="number"
          inputMode="numeric"
          step={1}
          error={errorAt(errors, "clearanceMonths")}
          {...number("clearanceMonths")}
        />
      </fieldset>

      {oarKinds.map((kind) => (
        <fieldset key={kind.key} className="grid grid-cols-1 gap-4 rounded-lg bg-white p-4 shadow-sm sm:grid-cols-2">
          <legend className="px-1 text-lg font-semibold">Club limits: {kind.title}</legend>
          {limitFields.map((field) => {
            const path = `limits.${kind.key}.${field.key}` as Path;
            return (
              <TextField
                key={field.key}
                label={field.label}
                type="number"
                inputMode="decimal"
                step={0.5}
                error={errorAt(errors, path)}
                {...number(path)}
              />
            );
          })}
        </fieldset>
      ))}

      <fieldset className="rounded-lg bg-white p-4 shadow-sm">
        <legend className="px-1 text-lg font-semibold">The club&apos;s day</legend>
        <SelectField
          label="Time zone"
          hint="Where the club rows. It decides when a day starts: the day of a sign-off, when a pass or certificate expires, cleanings, race days and the weekly cleaning digest."
          error={errorAt(errors, "timeZone")}
          options={timeZones.map((zone) => ({ value: zone, label: zone.replaceAll("_", " ") }))}
          {...form.register("timeZone")}
        />
      </fieldset>

      <div className="space-y-3">
        <Button type="submit" pending={isSubmitting} pendingLabel="Saving…">
          Save settings
        </Button>
        <LiveStatus testId="settings-status">
          {result && <Notice tone={result.ok ? "success" : "error"} title={result.message} />}
        </LiveStatus>
      </div>
    </ClientForm>
  );
}
