// PATCH /api/parks/{parkSlug}/staff/{userId}: a manager changes a member's role. DELETE removes them from the team.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { getParkBySlug } from "@/lib/parks/queries";
import { changeMemberRole, removeMember } from "@/lib/staff/team";

type Params = { parkSlug: string; userId: string };

export const PATCH = handler<Params>(async ({ request, params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  return Response.json({ member: await changeMemberRole(actor, park, params.userId, await readJson(request)) });
});

export const DELETE = handler<Params>(async ({ params, actor }) => {
  await removeMember(actor, await getParkBySlug(params.parkSlug), params.userId);
  return new Response(null, { status: 204 });
});
