"use client";

import type { ButtonHTMLAttributes } from "react";
import { useHydrated } from "@/components/ui/use-hydrated";
import { buttonClasses, type ButtonVariant } from "@/components/ui/button-classes";

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  pending?: boolean;
  pendingLabel?: string;
  /**
   * The button does its job without React: a plain form's submit (a GET filter, a server action's
   * form). Every other button is disabled until the page has hydrated, so that a tap on the server's
   * HTML is never lost, and never becomes the browser's own GET with the form's fields (a password…)
   * in the address.
   */
  worksWithoutScript?: boolean;
}

/** A button at least 44 px high; while pending it is disabled and says what it is doing. */
export function Button({
  variant = "primary",
  pending,
  pendingLabel,
  worksWithoutScript = false,
  children,
  className,
  disabled,
  ...rest
}: ButtonProps) {
  const hydrated = useHydrated();
  return (
    <button
      {...rest}
      disabled={disabled || pending || (!worksWithoutScript && !hydrated)}
      aria-busy={pending || undefined}
      className={`${buttonClasses(variant)} ${className ?? ""}`}
    >
      {pending ? (pendingLabel ?? "Working…") : children}
    </button>
  );
}
