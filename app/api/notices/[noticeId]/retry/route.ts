// POST /api/notices/{noticeId}/retry: failed deliveries go back to the queue (staff of its park).
import { handler } from "@/lib/server/api/handler";
import { retryFailedDeliveries } from "@/lib/notices/send-notice";

export const POST = handler<{ noticeId: string }>(async ({ params, actor }) => {
  return Response.json(await retryFailedDeliveries(actor, params.noticeId));
});
