import Link from "next/link";
import { getActor } from "@/lib/server/auth/actor";
import { setupSummary } from "@/lib/pressure/pressure-page";
import { listSetups } from "@/lib/setups/setup-queries";
import { unitsFor } from "@/lib/accounts/units";

export const metadata = { title: "My setups" };
export const dynamic = "force-dynamic";

export default async function SetupsPage({ searchParams }: { searchParams: Promise<{ deleted?: string }> }) {
  const actor = await getActor();
  const [setups, units, { deleted }] = await Promise.all([listSetups(actor), unitsFor(actor), searchParams]);
  return (
    <section className="space-y-4">
      <p><Link href="/me" className="font-semibold underline">My bike</Link> › Setups</p>
      <h1 className="text-3xl font-extrabold">My setups</h1>
      {deleted && <p role="status" className="rounded-lg bg-moss-100 p-3 font-semibold text-moss-700">Setup deleted.</p>}
      <Link href="/me/setups/new" className="btn-primary">New setup</Link>
      {setups.length === 0 ? (
        <p className="card">No setups yet. Save your bike once, with the pressures that work for you, and get today&apos;s band in one tap.</p>
      ) : (
        <ul className="space-y-3">
          {setups.map((s) => (
            <li key={s.id} className="card">
              <Link href={`/me/setups/${s.id}`} className="text-xl font-bold underline-offset-4 hover:underline">{s.name}</Link>
              <p className="text-loam-900">{setupSummary(s, units)}</p>
              {(s.sag.rear || s.sag.fork) && (
                <p className="text-sm text-loam-800">
                  {s.sag.rear && `Rear sag ${s.sag.rear.percent.toFixed(0)} %`}
                  {s.sag.rear && s.sag.fork && " · "}
                  {s.sag.fork && `Fork sag ${s.sag.fork.percent.toFixed(0)} %`}
                </p>
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
