"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { requestEmailChangeSchema } from "@/lib/validations/members";
import { reachAction } from "@/lib/http/reach-action";
import { TextField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { ClientForm } from "@/components/ui/client-form";
import { requestEmailChangeAction } from "../actions";
import { showFieldErrors } from "@/components/ui/field-errors";

type EmailChangeInput = z.input<typeof requestEmailChangeSchema>;
const blank: EmailChangeInput = { newEmail: "", currentPassword: "" };

/**
 * The new address and (unless the session may go without it) the current password. Nothing changes
 * until the link mailed to the new address is used, so the member keeps signing in with the old one.
 */
export function ChangeEmailForm({ withoutCurrent }: { withoutCurrent: boolean }) {
  const router = useRouter();
  const [outcome, setOutcome] = useState<{ ok: boolean; message: string } | null>(null);
  const form = useForm<EmailChangeInput>({ resolver: zodResolver(requestEmailChangeSchema), defaultValues: blank });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setOutcome(null);
    const result = await reachAction(() => requestEmailChangeAction(values));
    if (!result.ok) {
      showFieldErrors(form.setError, result.fieldErrors, ["newEmail", "currentPassword"]);
      setOutcome({ ok: false, message: result.message });
      return;
    }
    form.reset(blank);
    setOutcome({ ok: true, message: result.message ?? "Confirmation link sent." });
    router.refresh();
  });

  return (
    <ClientForm onSubmit={onSubmit} noValidate className="space-y-4" data-testid="change-email-form">
      <TextField
        label="New e-mail address"
        type="email"
        autoComplete="email"
        inputMode="email"
        error={errors.newEmail?.message}
        {...form.register("newEmail")}
      />
      {!withoutCurrent && (
        <TextField
          label="Current password"
          type="password"
          autoComplete="current-password"
          error={errors.currentPassword?.message}
          {...form.register("currentPassword")}
        />
      )}
      <LiveStatus testId="change-email-status">
        {outcome && <Notice tone={outcome.ok ? "success" : "error"} title={outcome.message} />}
      </LiveStatus>
      <Button type="submit" variant="secondary" pending={isSubmitting} pendingLabel="Sending the link…" className="w-full sm:w-auto">
        Send a confirmation link
      </Button>
    </ClientForm>
  );
}
