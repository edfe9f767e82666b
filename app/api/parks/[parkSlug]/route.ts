// GET /api/parks/{parkSlug}: one park's public details.
import { handler } from "@/lib/api/handler";
import { getParkBySlug, parkSummary } from "@/lib/data/parks";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ params }) =>
  Response.json({ park: parkSummary(await getParkBySlug(params.parkSlug)) }),
);
