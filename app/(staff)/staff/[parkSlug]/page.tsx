import { notFound } from "next/navigation";
import { StaffConditionsLinks } from "@/components/board/staff-conditions-links";
import { getActor } from "@/lib/auth/actor";
import { can, roleInPark } from "@/lib/auth/permissions";
import { listParkStaff } from "@/lib/data/parks";
import { Park } from "@/models";
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
      <div className="card">
        <h2 className="mb-2 text-lg font-bold">Team</h2>
        <ul className="divide-y divide-loam-100">
          {staff.map((member) => (
            <li key={member.userId} className="flex justify-between py-2">
              <span>{member.name} <span className="text-sm text-loam-600">{member.email}</span></span>
              <span className="font-semibold">{member.role}</span>
            </li>
          ))}
        </ul>
      </div>
      {can(actor, "staff:invite", { parkId: park.id }) && <InviteStaffForm parkSlug={park.slug} />}
    </section>
  );
}
