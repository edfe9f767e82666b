// GET /api/parks/{parkSlug}: one park's public details. PATCH: its managers change the settings (with lockVersion).
import { handler, readJson } from "@/lib/server/api/handler";
import { updatePark } from "@/lib/parks/park-writes";
import { getParkBySlug, parkSummary } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ params }) =>
  Response.json({ park: parkSummary(await getParkBySlug(params.parkSlug)) }),
);

export const PATCH = handler<{ parkSlug: string }>(async ({ request, params, actor }) =>
  Response.json({ park: await updatePark(actor, params.parkSlug, await readJson(request)) }),
);
