// DELETE /api/me/subscriptions/{subscriptionId}: stop and forget one of the caller's subscriptions.
import { handler } from "@/lib/server/api/handler";
import { removeSubscription } from "@/lib/notices/subscriptions";

export const DELETE = handler<{ subscriptionId: string }>(async ({ params, actor }) => {
  await removeSubscription(actor, params.subscriptionId);
  return new Response(null, { status: 204 });
});
