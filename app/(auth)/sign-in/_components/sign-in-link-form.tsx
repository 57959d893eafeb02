"use client";

import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { signInLinkSchema } from "@/lib/validations/members";
import { TextField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { requestSignInLinkAction } from "../actions";
import { reachAction } from "@/lib/http/reach-action";
import { ClientForm } from "@/components/ui/client-form";

type LinkInput = z.infer<typeof signInLinkSchema>;

export function SignInLinkForm() {
  const [result, setResult] = useState<{ ok: boolean; message?: string } | null>(null);
  const form = useForm<LinkInput>({ resolver: zodResolver(signInLinkSchema), defaultValues: { email: "" } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setResult(await reachAction(() => requestSignInLinkAction(values)));
  });

  return (
    <ClientForm onSubmit={onSubmit} noValidate className="space-y-4">
      <TextField label="E-mail for the link" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <LiveStatus testId="link-status">{result && <Notice tone={result.ok ? "success" : "error"} title={result.message} />}</LiveStatus>
      <Button type="submit" variant="secondary" pending={isSubmitting} pendingLabel="Sending…" className="w-full">
        E-mail me a link
      </Button>
    </ClientForm>
  );
}
