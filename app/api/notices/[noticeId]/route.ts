// GET /api/notices/{noticeId}: a notice with its delivery counts by state (staff of its park).
import { handler } from "@/lib/api/handler";
import { getNotice } from "@/lib/data/notices";

export const dynamic = "force-dynamic";

export const GET = handler<{ noticeId: string }>(async ({ params, actor }) => {
  return Response.json({ notice: await getNotice(actor, params.noticeId) });
});
