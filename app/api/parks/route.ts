// GET /api/parks: the public list of parks.
import { handler } from "@/lib/api/handler";
import { listParks } from "@/lib/data/parks";

export const dynamic = "force-dynamic";

export const GET = handler(async () => Response.json({ parks: await listParks() }));
