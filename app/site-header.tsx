import Link from "next/link";
import { getActor } from "@/lib/server/auth/actor";
import { primaryRole } from "@/lib/server/auth/permissions";
import { navigationFor } from "@/lib/server/navigation";
import { SignOutButton } from "@/components/sign-out-button";
import { Wordmark } from "@/components/wordmark";

export async function SiteHeader() {
  const actor = await getActor();
  const role = primaryRole(actor);
  return (
    <header className="border-b border-loam-200 bg-white print:hidden">
      <div className="mx-auto flex max-w-5xl flex-wrap items-center gap-x-4 gap-y-1 px-4 py-2">
        <Link href="/" className="mr-auto min-h-tap inline-flex items-center text-xl text-loam-900" aria-label="Loamcast home">
          <Wordmark />
        </Link>
        <nav aria-label="Main" data-role={role}>
          <ul className="flex flex-wrap items-center gap-x-1">
            {navigationFor(actor).map((link) => (
              <li key={link.href}>
                <Link href={link.href} className="inline-flex min-h-tap items-center px-3 text-sm font-semibold text-loam-800 hover:text-moss-700">
                  {link.label}
                </Link>
              </li>
            ))}
            {actor && (
              <li className="flex items-center gap-1 text-sm text-loam-600">
                <span className="rounded bg-loam-100 px-2 py-1" data-testid="signed-in-as">
                  {actor.name} · {role}
                </span>
                <SignOutButton />
              </li>
            )}
          </ul>
        </nav>
      </div>
    </header>
  );
}
