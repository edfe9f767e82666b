// DELETE /api/parks/{parkSlug}/invitations/{invitationId}: a manager withdraws an invitation.
import { handler } from "@/lib/server/api/handler";
import { getParkBySlug } from "@/lib/parks/queries";
import { revokeInvitation } from "@/lib/staff/team";

export const DELETE = handler<{ parkSlug: string; invitationId: string }>(async ({ params, actor }) => {
  await revokeInvitation(actor, await getParkBySlug(params.parkSlug), params.invitationId);
  return new Response(null, { status: 204 });
});
