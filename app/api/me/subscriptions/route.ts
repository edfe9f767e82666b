// GET  /api/me/subscriptions: the caller's notice subscriptions.
// POST /api/me/subscriptions: subscribe to a park (or change it); a new address gets a confirmation link.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { listSubscriptions, saveSubscription } from "@/lib/notices/subscriptions";

export const dynamic = "force-dynamic";

export const GET = handler(async ({ actor }) => Response.json({ subscriptions: await listSubscriptions(actor) }));

export const POST = handler(async ({ request, actor }) => {
  const saved = await saveSubscription(actor, await readJson(request, 20_000));
  return Response.json(saved, { status: saved.created ? 201 : 200 });
});
