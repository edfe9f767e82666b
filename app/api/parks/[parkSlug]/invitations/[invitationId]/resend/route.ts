// POST /api/parks/{parkSlug}/invitations/{invitationId}/resend: a manager sends the invitation again with a new link.
import { handler } from "@/lib/server/api/handler";
import { getParkBySlug } from "@/lib/parks/queries";
import { resendInvitation } from "@/lib/staff/team";

export const POST = handler<{ parkSlug: string; invitationId: string }>(async ({ params, actor }) =>
  Response.json({ invitation: await resendInvitation(actor, await getParkBySlug(params.parkSlug), params.invitationId) }),
);
