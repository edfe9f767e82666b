// GET /api/parks: the public list of parks.
import { handler } from "@/lib/server/api/handler";
import { listParks } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";

export const GET = handler(async () => Response.json({ parks: await listParks() }));
