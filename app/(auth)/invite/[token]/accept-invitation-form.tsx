"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { startSession } from "@/lib/auth/start-session";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { acceptInvitationSchema } from "@/lib/validations/members";
import { TextField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { acceptInvitationAction } from "./actions";
import { reachAction } from "@/lib/http/reach-action";
import { ClientForm } from "@/components/ui/client-form";
import { NewPasswordFields } from "@/components/auth/new-password-fields";
import { showFieldErrors } from "@/components/ui/field-errors";

const formSchema = acceptInvitationSchema
  .extend({ confirm: z.string() })
  .refine((values) => values.password === values.confirm, { error: "The two passwords differ.", path: ["confirm"] });
type AcceptInput = z.infer<typeof formSchema>;

export function AcceptInvitationForm({ token, email, defaultName }: { token: string; email: string; defaultName: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const form = useForm<AcceptInput>({
    resolver: zodResolver(formSchema),
    defaultValues: { token, name: defaultName, password: "", confirm: "" },
  });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async ({ confirm: _confirm, ...values }) => {
    setFailure(null);
    const result = await reachAction(() => acceptInvitationAction(values));
    if (!result.ok) {
      showFieldErrors(form.setError, result.fieldErrors, ["name", "password"]);
      setFailure(result.message);
      return;
    }
    const signedIn = await startSession("password", { email, password: values.password });
    if (signedIn.ok) {
      router.replace("/home");
      router.refresh();
    } else {
      router.replace("/sign-in");
    }
  });

  return (
    <ClientForm onSubmit={onSubmit} noValidate className="space-y-4 rounded-lg bg-white p-4 shadow-sm">
      <input type="hidden" {...form.register("token")} />
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      <NewPasswordFields
        label="Choose a password"
        password={form.register("password")}
        confirm={form.register("confirm")}
        passwordError={errors.password?.message}
        confirmError={errors.confirm?.message}
      />
      <LiveStatus>{failure && <Notice tone="error" title={failure} />}</LiveStatus>
      <Button type="submit" pending={isSubmitting} pendingLabel="Creating your account…" className="w-full">
        Create account and sign in
      </Button>
    </ClientForm>
  );
}
