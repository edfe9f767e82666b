import Link from "next/link";
import { notFound } from "next/navigation";
import { StaffConditionsLinks } from "@/components/board/staff-conditions-links";
import { getActor } from "@/lib/server/auth/actor";
import { can, roleInPark } from "@/lib/server/auth/permissions";
import { listParkStaff } from "@/lib/parks/queries";
import { Park } from "@/models";
import { absoluteUrl } from "@/lib/reach/links";
import { embedSnippet } from "@/lib/reach/pure/embed";
import { EmbedForm } from "./embed-form";
import { InviteStaffForm } from "./invite-form";

export const dynamic = "force-dynamic";

export default async function StaffParkPage({ params }: { params: Promise<{ parkSlug: string }> }) {
  const { parkSlug } = await params;
  const actor = await getActor();
  const park = await Park.findOne({ where: { slug: parkSlug } });
  if (!park || !roleInPark(actor, park.id)) notFound();
  const staff = await listParkStaff(park.id);
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">{park.name}: staff desk</h1>
      <StaffConditionsLinks parkSlug={park.slug} />
      <div className="flex flex-wrap gap-2">
        <Link href={`/staff/${park.slug}/notices`} className="btn-quiet">Notices to riders</Link>
        <Link href={`/parks/${park.slug}/print`} className="btn-quiet">Printable daily sheet</Link>
        <Link href={`/parks/${park.slug}/print/labels`} className="btn-quiet">Trailhead QR labels</Link>
      </div>
      <div className="card">
        <h2 className="mb-2 text-lg font-bold">Team</h2>
        <ul className="divide-y divide-loam-100">
          {staff.map((member) => (
            <li key={member.userId} className="flex items-start justify-between gap-3 py-2">
              {/* Name over address: a long address wraps on its own line instead of splitting at a hyphen beside the name. */}
              <span className="min-w-0">
                <span className="block">{member.name}</span>
                <span className="block text-sm text-loam-600 [overflow-wrap:anywhere]">{member.email}</span>
              </span>
              <span className="shrink-0 font-semibold">{member.role}</span>
            </li>
          ))}
        </ul>
      </div>
      <div className="card flex flex-wrap items-center gap-2">
        <h2 className="mr-auto text-lg font-bold">Trails</h2>
        <Link href={`/parks/${park.slug}/trails`} className="btn-quiet">Trail list</Link>
        {can(actor, "trail:write", { parkId: park.id }) && <Link href={`/staff/${park.slug}/trails/new`} className="btn-primary">Upload a trail</Link>}
      </div>
      {can(actor, "staff:invite", { parkId: park.id }) && <InviteStaffForm parkSlug={park.slug} />}
      <EmbedForm
        parkSlug={park.slug}
        origins={park.embedOrigins}
        snippet={embedSnippet(absoluteUrl(`/embed/parks/${park.slug}`), park.name)}
        feedUrl={absoluteUrl(`/api/parks/${park.slug}/status.json`)}
        canEdit={can(actor, "park:update", { parkId: park.id })}
      />
    </section>
  );
}
