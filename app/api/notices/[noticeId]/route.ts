// GET /api/notices/{noticeId}: a notice with its delivery counts by state (staff of its park).
import { handler } from "@/lib/server/api/handler";
import { getNotice } from "@/lib/notices/notice-queries";

export const dynamic = "force-dynamic";

export const GET = handler<{ noticeId: string }>(async ({ params, actor }) => {
  return Response.json({ notice: await getNotice(actor, params.noticeId) });
});
