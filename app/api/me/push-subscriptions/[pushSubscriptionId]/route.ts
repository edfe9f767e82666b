// DELETE /api/me/push-subscriptions/{pushSubscriptionId}: stop push alerts to one of the caller's browsers.
import { handler } from "@/lib/server/api/handler";
import { removePushSubscription } from "@/lib/notices/push-subscriptions";

export const DELETE = handler<{ pushSubscriptionId: string }>(async ({ params, actor }) => {
  await removePushSubscription(actor, params.pushSubscriptionId);
  return new Response(null, { status: 204 });
});
