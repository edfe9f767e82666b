// POST /api/parks/{parkSlug}/invitations: a manager invites staff by e-mail.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { getParkBySlug } from "@/lib/parks/queries";
import { inviteStaff } from "@/lib/staff/invitations";

export const POST = handler<{ parkSlug: string }>(async ({ request, params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  const { link: _link, ...invitation } = await inviteStaff(actor, park.id, await readJson(request));
  return Response.json({ invitation }, { status: 201 });
});
