"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { areaAudience, areaForPath } from "@/lib/auth/permissions";

/** The 403 page. It takes no props, so it reads the refused path to say whom the page is for. */
export default function Forbidden() {
  const audience = areaAudience(areaForPath(usePathname() ?? "/"));
  return (
    <div className="space-y-4" data-testid="forbidden">
      <h1 className="text-2xl font-bold text-river-900">Not for your role</h1>
      <p>This page is for {audience}. If you think you should see it, ask your club administrator.</p>
      <Link href="/home" className="font-semibold text-river-700 underline">
        Go to your start page
      </Link>
    </div>
  );
}
