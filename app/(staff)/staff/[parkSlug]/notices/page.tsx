import Link from "next/link";
import { getActor } from "@/lib/server/auth/actor";
import { can } from "@/lib/server/auth/permissions";
import { listParkNotices } from "@/lib/notices/notice-queries";
import { parkLocalDate, parkLocalTime } from "@/lib/shared/park-clock";
import { DeliverySummary, KindLabel } from "./notice-bits";
import { requireParkAccess } from "@/lib/parks/queries";

export const metadata = { title: "Notices" };
export const dynamic = "force-dynamic";

export default async function NoticesPage({ params }: { params: Promise<{ parkSlug: string }> }) {
  const { parkSlug } = await params;
  const [actor, park] = await Promise.all([getActor(), requireParkAccess(parkSlug, "notice:read")]);
  const notices = await listParkNotices(actor, park.id);
  return (
    <section className="space-y-4">
      <p><Link href={`/staff/${park.slug}`} className="text-sm font-semibold text-moss-700 underline">← Staff desk</Link></p>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h1 className="text-2xl font-bold">{park.name}: notices</h1>
        {can(actor, "notice:send", { parkId: park.id }) && (
          <Link href={`/staff/${park.slug}/notices/new`} className="btn-primary">Write a notice</Link>
        )}
      </div>
      {notices.length === 0 && <p className="card">No notices yet. Closures, reopenings and advisories you send appear here with their deliveries.</p>}
      <ul className="space-y-3">
        {notices.map((n) => (
          <li key={n.id} className="card space-y-1">
            <p className="text-sm text-loam-600">
              <KindLabel kind={n.kind} /> · {parkLocalDate(n.createdAt, park.timeZone)} {parkLocalTime(n.createdAt, park.timeZone)}
            </p>
            <Link href={`/staff/${park.slug}/notices/${n.id}`} className="block font-bold text-loam-900 underline decoration-loam-300 underline-offset-4">
              {n.subject}
            </Link>
            <DeliverySummary recipients={n.recipientCount} counts={n.deliveries} />
          </li>
        ))}
      </ul>
    </section>
  );
}
