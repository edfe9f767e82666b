import Link from "next/link";
import { UnitsForm } from "@/components/pressure/units-form";
import { getActor } from "@/lib/server/auth/actor";
import { unitsFor } from "@/lib/accounts/units";

export const metadata = { title: "My bike" };
export const dynamic = "force-dynamic";

const MY_LINKS = [
  { href: "/me/setups", label: "My setups", text: "Bikes, tyres, baselines and sag." },
  { href: "/me/rides", label: "My rides", text: "Log how it felt; get one change for next time." },
  { href: "/me/subscriptions", label: "My notices", text: "E-mails or browser alerts when trails close or reopen." },
  { href: "/pressure", label: "Today's pressure", text: "The band per wheel for today's trails." },
  { href: "/me/account", label: "Account and sign-in", text: "Password, e-mail, sign out everywhere, your data." },
];

export default async function MyBikePage() {
  const actor = (await getActor())!;
  const units = await unitsFor(actor);
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">My bike</h1>
      <div className="card">
        <p className="font-semibold">{actor.name}</p>
        <p className="text-loam-600">{actor.email}</p>
      </div>
      <nav aria-label="My bike">
        <ul className="grid gap-3 sm:grid-cols-2">
          {MY_LINKS.map((link) => (
            <li key={link.href}>
              <Link href={link.href} className="card block min-h-tap hover:border-loam-900 focus-visible:outline-3 focus-visible:outline-moss-600">
                <span className="block text-lg font-bold">{link.label}</span>
                <span className="block text-loam-800">{link.text}</span>
              </Link>
            </li>
          ))}
        </ul>
      </nav>
      <UnitsForm units={units} />
    </section>
  );
}
