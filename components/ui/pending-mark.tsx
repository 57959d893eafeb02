"use client";

import { useLinkStatus } from "next/link";

/**
 * Goes inside a `<Link>` whose page has no loading state to show at once: record pages (no loading.tsx,
 * so that an unknown id is a real 404), the lessons and quizzes, and the header's areas. This small
 * spinner says the click was taken while the page is on its way. It takes no space when idle; the shift
 * when it appears follows the click, which layout-shift scores leave out.
 */
export function PendingMark() {
  const { pending } = useLinkStatus();
  if (!pending) return null;
  return (
    <span
      aria-hidden="true"
      data-testid="link-pending"
      className="ml-1.5 inline-block h-3 w-3 shrink-0 animate-spin rounded-full border-2 border-current border-t-transparent align-[-1px]"
    />
  );
}
