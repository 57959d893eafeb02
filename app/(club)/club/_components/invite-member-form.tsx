"use client";

import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { invitationSchema } from "@/lib/validations/members";
import { SelectField, TextField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { inviteMemberAction } from "../actions";
import { reachAction } from "@/lib/http/reach-action";
import { ClientForm } from "@/components/ui/client-form";
import { showFieldErrors } from "@/components/ui/field-errors";

type InviteInput = z.infer<typeof invitationSchema>;

export function InviteMemberForm() {
  const [result, setResult] = useState<{ ok: boolean; message?: string } | null>(null);
  const form = useForm<InviteInput>({
    resolver: zodResolver(invitationSchema),
    defaultValues: { email: "", name: "", role: "athlete" },
  });
  const { errors, isSubmitting } = form.formState;

  const submit = form.handleSubmit(async (values) => {
    const outcome = await reachAction(() => inviteMemberAction(values));
    setResult(outcome);
    if (outcome.ok) form.reset();
    else showFieldErrors(form.setError, outcome.fieldErrors, ["email", "name", "role"]);
  });
  // Drop the last answer first: it spoke of the previous entry, even when this one fails its own check.
  const onSubmit = (event: React.FormEvent<HTMLFormElement>) => {
    setResult(null);
    return submit(event);
  };

  return (
    <ClientForm onSubmit={onSubmit} noValidate className="grid grid-cols-1 gap-4 sm:grid-cols-2" data-testid="invite-form">
      <TextField label="Name" autoComplete="off" error={errors.name?.message} {...form.register("name")} />
      <TextField label="E-mail" type="email" autoComplete="off" error={errors.email?.message} {...form.register("email")} />
      <SelectField
        label="Role"
        error={errors.role?.message}
        options={[
          { value: "athlete", label: "Athlete" },
          { value: "coach", label: "Coach" },
          { value: "admin", label: "Club administrator" },
        ]}
        {...form.register("role")}
      />
      <div className="flex items-end">
        <Button type="submit" pending={isSubmitting} pendingLabel="Sending…" className="w-full">
          Send invitation
        </Button>
      </div>
      <div className="sm:col-span-2">
        <LiveStatus testId="invite-status">{result && <Notice tone={result.ok ? "success" : "error"} title={result.message} />}</LiveStatus>
      </div>
    </ClientForm>
  );
}
