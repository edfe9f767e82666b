// GET  /api/me/push-subscriptions: the caller's browsers subscribed to push alerts.
// POST /api/me/push-subscriptions: subscribe this browser (its PushSubscription JSON) to a park's alerts, or change them.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { listPushSubscriptions, savePushSubscription } from "@/lib/notices/push-subscriptions";

export const dynamic = "force-dynamic";

export const GET = handler(async ({ actor }) => Response.json({ pushSubscriptions: await listPushSubscriptions(actor) }));

export const POST = handler(async ({ request, actor }) => {
  const saved = await savePushSubscription(actor, await readJson(request, 20_000));
  return Response.json(saved, { status: saved.created ? 201 : 200 });
});
