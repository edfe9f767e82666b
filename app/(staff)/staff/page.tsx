import Link from "next/link";
import { getActor } from "@/lib/server/auth/actor";
import { listParksFor } from "@/lib/parks/queries";

export const metadata = { title: "Staff desk" };
export const dynamic = "force-dynamic";

export default async function StaffHome() {
  const actor = (await getActor())!;
  const parkIds = actor.memberships.map((m) => m.parkId);
  const parks = await listParksFor(actor);
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Staff desk</h1>
      <ul className="grid gap-3 sm:grid-cols-2">
        {parks.map((park) => {
          const role = actor.siteRole === "admin" ? "admin" : actor.memberships.find((m) => m.parkId === park.id)?.role;
          return (
            <li key={park.id} className="card">
              <h2 className="text-lg font-bold">{park.name}</h2>
              <p className="text-sm text-loam-600">Your role: {role}</p>
              <Link href={`/staff/${park.slug}`} className="btn-quiet mt-3">Open</Link>
            </li>
          );
        })}
      </ul>
    </section>
  );
}
