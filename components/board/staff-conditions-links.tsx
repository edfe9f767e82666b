import Link from "next/link";

/** Links from the staff desk to the conditions tools of one park. */
export function StaffConditionsLinks({ parkSlug }: { parkSlug: string }) {
  const links = [
    { href: `/staff/${parkSlug}/morning-check`, label: "Morning check" },
    { href: `/staff/${parkSlug}/hazards`, label: "Hazards" },
    { href: `/staff/${parkSlug}/activity`, label: "Status changes and export" },
    { href: `/parks/${parkSlug}`, label: "Public board" },
  ];
  return (
    <nav aria-label="Conditions" className="card">
      <h2 className="mb-2 text-lg font-bold">Conditions</h2>
      <ul className="grid grid-cols-1 gap-2 sm:grid-cols-2">
        {links.map((l) => (
          <li key={l.href}>
            <Link href={l.href} className="btn-quiet w-full">
              {l.label}
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}
