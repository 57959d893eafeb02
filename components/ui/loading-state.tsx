/** The loading state shown while a page's data arrives. */
export function LoadingState({ label = "Loading…" }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-3 py-8 text-slate-700">
      <span className="h-5 w-5 animate-spin rounded-full border-2 border-river-500 border-t-transparent" aria-hidden="true" />
      {label}
    </div>
  );
}

/**
 * A segment's `loading.tsx` (re-exported there). Keep loading files off any folder that has a dynamic
 * segment below it: a page that streams has already sent status 200, so its `notFound()` would no longer
 * be a 404 (tests/unit/route-loading.test.ts).
 */
export default function RouteLoading() {
  return <LoadingState />;
}
