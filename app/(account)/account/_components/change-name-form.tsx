"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { changeOwnNameSchema } from "@/lib/validations/members";
import { reachAction } from "@/lib/http/reach-action";
import { TextField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { ClientForm } from "@/components/ui/client-form";
import { changeOwnNameAction } from "../actions";

type NameInput = z.input<typeof changeOwnNameSchema>;

/** The member's name as certificates and the register print it; saving refreshes the header too. */
export function ChangeNameForm({ name }: { name: string }) {
  const router = useRouter();
  const [outcome, setOutcome] = useState<{ ok: boolean; message: string } | null>(null);
  const form = useForm<NameInput>({ resolver: zodResolver(changeOwnNameSchema), defaultValues: { name } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setOutcome(null);
    const result = await reachAction(() => changeOwnNameAction(values));
    if (!result.ok) {
      const message = result.fieldErrors.name?.[0];
      if (message) form.setError("name", { message });
      setOutcome({ ok: false, message: result.message });
      return;
    }
    form.reset({ name: result.data?.name ?? values.name });
    setOutcome({ ok: true, message: result.message ?? "Name saved." });
    router.refresh();
  });

  return (
    <ClientForm onSubmit={onSubmit} noValidate className="space-y-4" data-testid="change-name-form">
      <TextField
        label="Your name"
        autoComplete="name"
        hint="As new certificates and the induction register will print it. Certificates already issued keep the name they were issued to until a club administrator reissues them."
        error={errors.name?.message}
        {...form.register("name")}
      />
      <LiveStatus testId="change-name-status">
        {outcome && <Notice tone={outcome.ok ? "success" : "error"} title={outcome.message} />}
      </LiveStatus>
      <Button type="submit" variant="secondary" pending={isSubmitting} pendingLabel="Saving your name…" className="w-full sm:w-auto">
        Save name
      </Button>
    </ClientForm>
  );
}
