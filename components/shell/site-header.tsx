import Link from "next/link";
import { PendingMark } from "@/components/ui/pending-mark";
import { currentActor } from "@/lib/auth/session";
import { isAdmin, isCoach } from "@/lib/auth/permissions";
import { roleLabels } from "@/lib/auth/roles";
import { SignOutButton } from "@/components/shell/sign-out-button";

/** Who is signed in, in what role, and the places that role can go. */
export async function SiteHeader() {
  const actor = await currentActor();
  const links: { href: string; label: string }[] = [];
  if (actor) {
    links.push({ href: "/learn", label: "Learn" });
    links.push({ href: "/rig", label: "Rig" });
    if (isCoach(actor)) links.push({ href: "/roster", label: "Roster" });
    if (isAdmin(actor)) links.push({ href: "/club", label: "Club" });
  }
  return (
    <header className="sticky top-0 z-40 border-b border-river-800 bg-river-900 text-white">
      <div className="mx-auto flex max-w-3xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-3">
        <Link href={actor ? "/home" : "/"} className="text-lg font-bold tracking-tight">
          Slipway
        </Link>
        {links.length > 0 && (
          <nav aria-label="Main" className="flex gap-1">
            {links.map((link) => (
              <Link
                key={link.href}
                href={link.href}
                className="inline-flex min-h-11 items-center rounded px-3 text-sm font-semibold text-river-100 hover:bg-river-800 hover:text-white"
              >
                {link.label}
                <PendingMark />
              </Link>
            ))}
          </nav>
        )}
        <div className="ml-auto flex items-center gap-3 text-sm">
          {actor ? (
            <>
              <Link
                href="/account"
                data-testid="signed-in-as"
                className="inline-flex min-h-11 flex-col justify-center rounded px-2 text-right leading-tight hover:bg-river-800"
              >
                <span className="sr-only">Your account: </span>
                <span className="block font-semibold">{actor.name}</span>
                <span className="block text-river-100">{roleLabels[actor.role]}</span>
              </Link>
              <SignOutButton />
            </>
          ) : (
            <Link href="/sign-in" className="inline-flex min-h-11 items-center rounded bg-white px-3 font-semibold text-river-900">
              Sign in
            </Link>
          )}
        </div>
      </div>
    </header>
  );
}
