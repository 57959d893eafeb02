"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { changePasswordSchema } from "@/lib/validations/members";
import { startSession } from "@/lib/auth/start-session";
import { reachAction } from "@/lib/http/reach-action";
import { TextField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { ClientForm } from "@/components/ui/client-form";
import { NewPasswordFields } from "@/components/auth/new-password-fields";
import { changePasswordAction } from "../actions";
import { showFieldErrors } from "@/components/ui/field-errors";

const formSchema = changePasswordSchema
  .extend({ confirm: z.string() })
  .refine((values) => values.newPassword === values.confirm, { error: "The two passwords differ.", path: ["confirm"] });
type ChangePasswordInput = z.infer<typeof formSchema>;

const blank: ChangePasswordInput = { currentPassword: "", newPassword: "", confirm: "" };

/**
 * Current password (unless the session may go without it), the new one twice. The change ends every
 * session of the member, so on success the form signs in again with the new password.
 */
export function ChangePasswordForm({ email, withoutCurrent }: { email: string; withoutCurrent: boolean }) {
  const router = useRouter();
  const [outcome, setOutcome] = useState<{ ok: boolean; message: string } | null>(null);
  const form = useForm<ChangePasswordInput>({ resolver: zodResolver(formSchema), defaultValues: blank });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async ({ confirm: _confirm, ...values }) => {
    setOutcome(null);
    const result = await reachAction(() => changePasswordAction(values));
    if (!result.ok) {
      showFieldErrors(form.setError, result.fieldErrors, ["currentPassword", "newPassword"]);
      setOutcome({ ok: false, message: result.message });
      return;
    }
    const signedIn = await startSession("password", { email, password: values.newPassword });
    if (!signedIn.ok) {
      router.replace("/sign-in?callbackUrl=%2Faccount");
      return;
    }
    form.reset(blank);
    setOutcome({ ok: true, message: "Password changed. You are signed in with the new one; other devices are signed out." });
    router.refresh();
  });

  return (
    <ClientForm onSubmit={onSubmit} noValidate className="space-y-4" data-testid="change-password-form">
      {/* For password managers: the account the new password belongs to. */}
      <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
      {!withoutCurrent && (
        <TextField
          label="Current password"
          type="password"
          autoComplete="current-password"
          error={errors.currentPassword?.message}
          {...form.register("currentPassword")}
        />
      )}
      <NewPasswordFields
        label="New password"
        password={form.register("newPassword")}
        confirm={form.register("confirm")}
        passwordError={errors.newPassword?.message}
        confirmError={errors.confirm?.message}
      />
      <LiveStatus testId="change-password-status">
        {outcome && <Notice tone={outcome.ok ? "success" : "error"} title={outcome.message} />}
      </LiveStatus>
      <Button type="submit" pending={isSubmitting} pendingLabel="Changing your password…" className="w-full sm:w-auto">
        Change password
      </Button>
    </ClientForm>
  );
}
