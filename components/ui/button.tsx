import type { ButtonHTMLAttributes } from "react";

type Variant = "primary" | "secondary" | "danger";

const variants: Record<Variant, string> = {
  primary: "bg-river-700 text-white hover:bg-river-800 disabled:bg-river-500",
  secondary: "border border-river-700 bg-white text-river-800 hover:bg-river-100",
  danger: "bg-alarm-600 text-white hover:bg-alarm-800",
};

export function buttonClasses(variant: Variant = "primary"): string {
  return `inline-flex min-h-11 items-center justify-center gap-2 rounded-md px-4 py-2 font-semibold disabled:cursor-not-allowed ${variants[variant]}`;
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  pending?: boolean;
  pendingLabel?: string;
}

/** A button at least 44 px high; while pending it is disabled and says what it is doing. */
export function Button({ variant = "primary", pending, pendingLabel, children, className, disabled, ...rest }: ButtonProps) {
  return (
    <button
      {...rest}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      className={`${buttonClasses(variant)} ${className ?? ""}`}
    >
      {pending ? (pendingLabel ?? "Working…") : children}
    </button>
  );
}
