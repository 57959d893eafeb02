"use client";

import type { FormHTMLAttributes } from "react";
import { useHydrated } from "@/components/ui/use-hydrated";

/**
 * A form that needs the page's script (react-hook-form). Until the page has hydrated, its fields are
 * disabled, as `<Button>` is: an entry typed before then stayed in the field, but react-hook-form only
 * hears changes made once it runs, so the form sent its default instead and the entry was lost. The
 * form's classes go on the fieldset inside it, which holds the layout.
 */
export function ClientForm({ className, children, ...props }: FormHTMLAttributes<HTMLFormElement>) {
  const hydrated = useHydrated();
  return (
    <form {...props}>
      <fieldset disabled={!hydrated} className={`min-w-0 ${className ?? ""}`}>
        {children}
      </fieldset>
    </form>
  );
}
