import { requirePageActor } from "@/lib/auth/session";

/**
 * The role check sits in the group's layout, above the segments' loading boundaries, so that a refused
 * role gets a real 403 status (and an anonymous visitor a real redirect) before anything streams.
 */
export default async function GuardedLayout({ children }: { children: React.ReactNode }) {
  await requirePageActor("member", "/account");
  return children;
}
