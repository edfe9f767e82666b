import Link from "next/link";
import { StaffConditionsLinks } from "@/components/board/staff-conditions-links";
import { getActor } from "@/lib/server/auth/actor";
import { can } from "@/lib/server/auth/permissions";
import { requireParkAccess } from "@/lib/parks/queries";
import { parkSetupChecklist } from "@/lib/parks/setup-facts";
import { absoluteUrl } from "@/lib/reach/links";
import { embedSnippet } from "@/lib/reach/pure/embed";
import { EmbedForm } from "./embed-form";
import { InviteStaffForm } from "./invite-form";
import { SetupChecklist } from "./setup-checklist";

export const dynamic = "force-dynamic";

export default async function StaffParkPage({ params }: { params: Promise<{ parkSlug: string }> }) {
  const park = await requireParkAccess((await params).parkSlug, "team:read");
  const [actor, checklist] = await Promise.all([getActor(), parkSetupChecklist(park)]);
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">{park.name}: staff desk</h1>
      {checklist.some((item) => !item.done) && <SetupChecklist items={checklist} />}
      <StaffConditionsLinks parkSlug={park.slug} />
      <div className="flex flex-wrap gap-2">
        <Link href={`/staff/${park.slug}/notices`} className="btn-quiet">Notices to riders</Link>
        <Link href={`/parks/${park.slug}/print`} className="btn-quiet">Printable daily sheet</Link>
        <Link href={`/parks/${park.slug}/print/labels`} className="btn-quiet">Trailhead QR labels</Link>
      </div>
      <div className="card flex flex-wrap items-center gap-2">
        <h2 className="mr-auto text-lg font-bold">Park</h2>
        <Link href={`/staff/${park.slug}/team`} className="btn-quiet">Team</Link>
        <Link href={`/staff/${park.slug}/activity`} className="btn-quiet">Activity</Link>
        {can(actor, "park:update", { parkId: park.id }) && <Link href={`/staff/${park.slug}/settings`} className="btn-quiet">Settings and ground</Link>}
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
