/** The button look, for <Button> and for links and plain buttons that look like one (server components too). */
export type ButtonVariant = "primary" | "secondary" | "danger";

const variants: Record<ButtonVariant, string> = {
  primary: "bg-river-700 text-white hover:bg-river-800 disabled:bg-river-500",
  secondary: "border border-river-700 bg-white text-river-800 hover:bg-river-100",
  danger: "bg-alarm-600 text-white hover:bg-alarm-800",
};

export function buttonClasses(variant: ButtonVariant = "primary"): string {
  return `inline-flex min-h-11 items-center justify-center gap-2 rounded-md px-4 py-2 font-semibold disabled:cursor-not-allowed ${variants[variant]}`;
}
