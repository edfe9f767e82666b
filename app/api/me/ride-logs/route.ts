// GET /api/me/ride-logs: the caller's ride logs. POST: log a ride → the one suggested baseline change.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { listRideLogs } from "@/lib/setups/ride-log-queries";
import { createRideLog } from "@/lib/setups/ride-logs";

export const GET = handler(async ({ actor }) => Response.json({ rideLogs: await listRideLogs(actor) }));

export const POST = handler(async ({ request, actor }) => Response.json(await createRideLog(actor, await readJson(request, 20_000)), { status: 201 }));
