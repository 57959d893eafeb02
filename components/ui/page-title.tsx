import type { ReactNode } from "react";

/** The page's one h1 with an optional line under it. */
export function PageTitle({ children, lead }: { children: ReactNode; lead?: ReactNode }) {
  return (
    <div className="mb-6">
      <h1 className="text-2xl font-bold tracking-tight text-river-900 sm:text-3xl">{children}</h1>
      {lead && <p className="mt-2 text-slate-700">{lead}</p>}
    </div>
  );
}
