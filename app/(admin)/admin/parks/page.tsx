import type { Metadata } from "next";
import Link from "next/link";
import { listParksForAdmin } from "@/lib/parks/queries";
import { CreateParkForm } from "./create-park-form";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Parks on Loamcast" };

const when = (iso: string | null) => (iso ? new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" }).format(new Date(iso)) : "never");

/** Site admin: every park with its figures, and the form that starts a new one. The admin layout refuses everyone else. */
export default async function AdminParksPage() {
  const parks = await listParksForAdmin();
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Parks on Loamcast</h1>
      <div className="card overflow-x-auto">
        <table className="w-full text-left text-sm" data-testid="admin-parks">
          <thead>
            <tr className="border-b-2 border-loam-300">
              <th scope="col" className="px-2 py-1">Park</th>
              <th scope="col" className="px-2 py-1 text-right">Trails</th>
              <th scope="col" className="px-2 py-1 text-right">Staff</th>
              <th scope="col" className="px-2 py-1">Last report</th>
              <th scope="col" className="px-2 py-1 text-right">Subscribers</th>
            </tr>
          </thead>
          <tbody>
            {parks.map((park) => (
              <tr key={park.slug} className="border-b border-loam-100">
                <td className="px-2 py-2">
                  <Link href={`/staff/${park.slug}`} className="font-semibold underline">{park.name}</Link>
                  <span className="block text-xs text-loam-600">{park.timeZone}{park.fictional ? " · fictional demo" : ""}</span>
                </td>
                <td className="px-2 py-2 text-right">{park.trails}</td>
                <td className="px-2 py-2 text-right">{park.staff}</td>
                <td className="px-2 py-2">{when(park.lastReportAt)}</td>
                <td className="px-2 py-2 text-right">{park.subscribers}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <CreateParkForm />
    </section>
  );
}
