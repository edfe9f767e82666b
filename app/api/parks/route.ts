// GET /api/parks: the public list of parks. POST /api/parks: a site admin creates a park and invites its first manager.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { createPark } from "@/lib/parks/park-writes";
import { listParks } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";

export const GET = handler(async () => Response.json({ parks: await listParks() }));

export const POST = handler(async ({ request, actor }) => Response.json(await createPark(actor, await readJson(request)), { status: 201 }));
