import Link from "next/link";

export interface RigNavLink {
  href: string;
  label: string;
}

/** The small row of links between the pages of one part of the site; the current page is marked for screen readers too. */
export function RigNav({ label, links, current }: { label: string; links: RigNavLink[]; current: string }) {
  return (
    <nav aria-label={label} className="mb-6">
      <ul className="flex flex-wrap gap-2">
        {links.map((link) => {
          const active = link.href === current;
          return (
            <li key={link.href}>
              <Link
                href={link.href}
                aria-current={active ? "page" : undefined}
                className={`inline-flex min-h-11 items-center rounded-md border px-3 font-semibold ${
                  active ? "border-river-800 bg-river-800 text-white" : "border-river-700 bg-white text-river-800 hover:bg-river-100"
                }`}
              >
                {link.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}

/** Links between the athlete's rig pages (and the coaches' fleet pages, for coaches and admins). */
export function memberRigLinks(coach: boolean): RigNavLink[] {
  return [
    { href: "/rig", label: "Change boats" },
    { href: "/rig/care", label: "Grip cleaning" },
    ...(coach ? [{ href: "/roster/fleet", label: "Fleet (coaches)" }] : []),
  ];
}

/** Links between the coaches' fleet pages. */
export const fleetLinks: RigNavLink[] = [
  { href: "/roster/fleet", label: "Boats and oar sets" },
  { href: "/roster/fleet/plans", label: "Saved plans" },
  { href: "/roster/fleet/care", label: "Cleaning due" },
];
