/** The loading state shown while a page's data arrives. */
export function LoadingState({ label = "Loading…" }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-3 py-8 text-slate-700">
      <span className="h-5 w-5 animate-spin rounded-full border-2 border-river-500 border-t-transparent" aria-hidden="true" />
      {label}
    </div>
  );
}
