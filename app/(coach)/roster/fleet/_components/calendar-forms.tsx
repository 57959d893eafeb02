"use client";

import { useMemo, useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { formatIsoDate } from "@/lib/care/calendar";
import { raceDaySchemaFor, type RaceDayInput } from "@/lib/validations/cleaning";
import { addRaceDayAction, removeRaceDayAction, sendDigestNowAction, setHumidSpellAction } from "../actions";
import { reachAction } from "@/lib/http/reach-action";
import { ClientForm } from "@/components/ui/client-form";

type Status = { ok: boolean; message?: string } | null;

/** The club's race days: add one (today or later), remove any. */
export function RaceDaysForm({ raceDays, today }: { raceDays: string[]; today: string }) {
  const router = useRouter();
  const [status, setStatus] = useState<Status>(null);
  const [pending, startTransition] = useTransition();
  const schema = useMemo(() => raceDaySchemaFor(today), [today]);
  const form = useForm<RaceDayInput>({ resolver: zodResolver(schema), defaultValues: { raceDay: "" } });
  const { errors, isSubmitting } = form.formState;

  const submit = form.handleSubmit(async (values) => {
    const outcome = await reachAction(() => addRaceDayAction(values));
    setStatus(outcome);
    if (outcome.ok) {
      form.reset({ raceDay: "" });
      router.refresh();
    } else if (outcome.fieldErrors.raceDay) {
      form.setError("raceDay", { message: outcome.fieldErrors.raceDay[0] });
    }
  });
  // The last answer spoke of the previous day; drop it, even when this one fails the form's own check.
  const onSubmit = (event: React.FormEvent<HTMLFormElement>) => {
    setStatus(null);
    return submit(event);
  };

  return (
    <div className="space-y-3">
      {raceDays.length === 0 ? (
        <p>No race days on the calendar.</p>
      ) : (
        <ul className="divide-y divide-slate-200 rounded-md border border-slate-200" data-testid="race-days">
          {raceDays.map((day) => (
            <li key={day} className="flex flex-wrap items-center justify-between gap-2 px-3 py-2">
              <span>
                {formatIsoDate(day)}
                {day < today ? " (past)" : ""}
              </span>
              <Button
                type="button"
                variant="secondary"
                pending={pending}
                aria-label={`Remove the race day ${formatIsoDate(day)}`}
                onClick={() =>
                  startTransition(async () => {
                    const outcome = await reachAction(() => removeRaceDayAction({ raceDay: day }));
                    setStatus(outcome);
                    if (outcome.ok) router.refresh();
                  })
                }
              >
                Remove
              </Button>
            </li>
          ))}
        </ul>
      )}
      <ClientForm onSubmit={onSubmit} noValidate className="flex flex-wrap items-end gap-3" data-testid="race-day-form">
        <div className="min-w-48 flex-1">
          <TextField label="Add a race day" type="date" min={today} error={errors.raceDay?.message} {...form.register("raceDay")} />
        </div>
        <Button type="submit" pending={isSubmitting} pendingLabel="Adding…">
          Add race day
        </Button>
      </ClientForm>
      <LiveStatus testId="race-day-status">{status && <Notice tone={status.ok ? "success" : "error"} title={status.message} />}</LiveStatus>
    </div>
  );
}

/** Switches the humid spell, in which every oar set is due daily. */
export function HumidSpellSwitch({ humidSpell }: { humidSpell: boolean }) {
  const router = useRouter();
  const [status, setStatus] = useState<Status>(null);
  const [pending, startTransition] = useTransition();
  return (
    <div className="space-y-2">
      <p data-testid="humid-spell-state">
        <span aria-hidden="true">{humidSpell ? "☀ " : "○ "}</span>
        Humid spell is <span className="font-semibold">{humidSpell ? "on" : "off"}</span>
        {humidSpell ? ": every set is due daily." : "."}
      </p>
      <Button
        type="button"
        variant="secondary"
        pending={pending}
        onClick={() =>
          startTransition(async () => {
            const outcome = await reachAction(() => setHumidSpellAction({ humidSpell: !humidSpell }));
            setStatus(outcome);
            if (outcome.ok) router.refresh();
          })
        }
      >
        {humidSpell ? "Switch the humid spell off" : "Switch the humid spell on"}
      </Button>
      <LiveStatus testId="humid-spell-status">
        {status && <Notice tone={status.ok ? "success" : "error"} title={status.message} />}
      </LiveStatus>
    </div>
  );
}

/** Sends the cleaning digest to the club's coaches and admins now. */
export function SendDigestButton() {
  const [status, setStatus] = useState<Status>(null);
  const [pending, startTransition] = useTransition();
  return (
    <div className="space-y-2">
      <Button
        type="button"
        pending={pending}
        pendingLabel="Sending…"
        onClick={() => startTransition(async () => setStatus(await reachAction(sendDigestNowAction)))}
      >
        Send the digest now
      </Button>
      <LiveStatus testId="digest-status">{status && <Notice tone={status.ok ? "success" : "error"} title={status.message} />}</LiveStatus>
    </div>
  );
}
