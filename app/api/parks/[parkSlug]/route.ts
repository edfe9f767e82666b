// GET /api/parks/{parkSlug}: one park's public details (its managers also get contact details and lockVersion). PATCH: its managers change the settings.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { can } from "@/lib/server/auth/permissions";
import { updatePark } from "@/lib/parks/park-writes";
import { getParkBySlug, parkSettings, parkSummary } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  return Response.json({ park: can(actor, "park:update", { parkId: park.id }) ? parkSettings(park) : parkSummary(park) });
});

export const PATCH = handler<{ parkSlug: string }>(async ({ request, params, actor }) =>
  Response.json({ park: await updatePark(actor, params.parkSlug, await readJson(request)) }),
);
