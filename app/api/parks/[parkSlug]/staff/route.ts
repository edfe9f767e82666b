// GET /api/parks/{parkSlug}/staff: the park's team (members and open invitations), for its staff.
import { handler } from "@/lib/server/api/handler";
import { getParkBySlug } from "@/lib/parks/queries";
import { listTeam } from "@/lib/staff/team";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ params, actor }) => Response.json(await listTeam(actor, await getParkBySlug(params.parkSlug))));
