// GET /api/parks/{parkSlug}: one park's public details.
import { handler } from "@/lib/server/api/handler";
import { getParkBySlug, parkSummary } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ params }) =>
  Response.json({ park: parkSummary(await getParkBySlug(params.parkSlug)) }),
);
