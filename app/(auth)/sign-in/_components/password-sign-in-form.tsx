"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { signInSchema } from "@/lib/validations/members";
import { startSession } from "@/lib/auth/start-session";
import { TextField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { ClientForm } from "@/components/ui/client-form";

type SignInInput = z.infer<typeof signInSchema>;

const failureMessages: Record<string, string> = {
  throttled: "Too many failed attempts. Wait 15 minutes, or ask for a one-time link below.",
  default: "That e-mail address and password do not match an active account.",
  unreached: "Slipway could not be reached, so you are not signed in yet. Check the connection and try again.",
};

export function PasswordSignInForm({ callbackUrl }: { callbackUrl: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const form = useForm<SignInInput>({ resolver: zodResolver(signInSchema), defaultValues: { email: "", password: "" } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFailure(null);
    const result = await startSession("password", values);
    if (result.ok) {
      router.replace(callbackUrl);
      router.refresh();
      return;
    }
    setFailure(failureMessages[result.reason === "refused" ? "default" : result.reason]!);
  });

  return (
    <ClientForm onSubmit={onSubmit} noValidate className="space-y-4" data-testid="password-sign-in">
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...form.register("password")}
      />
      <LiveStatus testId="sign-in-status">{failure && <Notice tone="error" title={failure} />}</LiveStatus>
      <Button type="submit" pending={isSubmitting} pendingLabel="Signing in…" className="w-full">
        Sign in
      </Button>
    </ClientForm>
  );
}
