import type { Metadata } from "next";
import Link from "next/link";
import { getActor } from "@/lib/server/auth/actor";
import { can } from "@/lib/server/auth/permissions";
import { requireParkAccess } from "@/lib/parks/queries";
import { listTeam } from "@/lib/staff/team";
import { InviteStaffForm } from "../invite-form";
import { InvitationControls, MemberControls } from "./team-controls";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Park team" };

const day = (iso: string, timeZone: string) => new Intl.DateTimeFormat("en-GB", { timeZone, day: "numeric", month: "short", year: "numeric" }).format(new Date(iso));

/** The park's team: every staff member sees it; managers change roles, remove people and handle invitations. */
export default async function TeamPage({ params }: { params: Promise<{ parkSlug: string }> }) {
  const park = await requireParkAccess((await params).parkSlug, "team:read");
  const actor = await getActor();
  const { members, invitations } = await listTeam(actor, park);
  const manages = can(actor, "team:manage", { parkId: park.id });
  const tz = park.timeZone;
  return (
    <section className="space-y-4">
      <header className="flex flex-wrap items-end justify-between gap-2">
        <h1 className="text-2xl font-bold">{park.name}: team</h1>
        <Link href={`/staff/${park.slug}`} className="btn-quiet">Staff desk</Link>
      </header>
      <section className="card" aria-labelledby="members-heading">
        <h2 id="members-heading" className="mb-2 text-lg font-bold">Members ({members.length})</h2>
        <ul className="divide-y divide-loam-100" data-testid="team-members">
          {members.map((m) => (
            <li key={m.userId} className="space-y-2 py-3">
              <div className="flex items-start justify-between gap-3">
                <span className="min-w-0">
                  <span className="block font-semibold">{m.name}{m.userId === actor?.id ? " (you)" : ""}</span>
                  <span className="block text-sm text-loam-600 [overflow-wrap:anywhere]">{m.email}</span>
                  <span className="block text-sm text-loam-600">Joined {day(m.joinedAt, tz)}{m.invitedBy ? `, invited by ${m.invitedBy}` : ""}</span>
                </span>
                <span className="shrink-0 font-semibold">{m.role}</span>
              </div>
              {manages && <MemberControls parkSlug={park.slug} userId={m.userId} name={m.name} role={m.role} />}
            </li>
          ))}
        </ul>
        {manages && <p className="mt-2 text-sm text-loam-600">A park always keeps at least one manager: make someone else manager before changing the last one.</p>}
      </section>
      <section className="card" aria-labelledby="invitations-heading">
        <h2 id="invitations-heading" className="mb-2 text-lg font-bold">Open invitations ({invitations.length})</h2>
        {invitations.length === 0 ? (
          <p className="text-sm text-loam-700">No invitation is waiting for an answer.</p>
        ) : (
          <ul className="divide-y divide-loam-100" data-testid="team-invitations">
            {invitations.map((i) => (
              <li key={i.id} className="space-y-2 py-3">
                <div className="flex items-start justify-between gap-3">
                  <span className="min-w-0">
                    <span className="block [overflow-wrap:anywhere]">{i.email}</span>
                    <span className="block text-sm text-loam-600">Sent {day(i.sentAt, tz)}{i.invitedBy ? ` by ${i.invitedBy}` : ""}; expires {day(i.expiresAt, tz)}</span>
                  </span>
                  <span className="shrink-0 font-semibold">{i.role}</span>
                </div>
                {manages && <InvitationControls parkSlug={park.slug} id={i.id} email={i.email} />}
              </li>
            ))}
          </ul>
        )}
      </section>
      {can(actor, "staff:invite", { parkId: park.id }) && <InviteStaffForm parkSlug={park.slug} />}
    </section>
  );
}
