// POST /api/trails/{id}/features: staff add a feature (kind, size, and lon/lat snapped onto the line or distanceAlongM).
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { featureView } from "@/lib/trails/queries";
import { addTrailFeature } from "@/lib/trails/edit-features";

export const POST = handler<{ id: string }>(async ({ request, params, actor }) => {
  const feature = await addTrailFeature(actor, params.id, await readJson(request, 10_000));
  return Response.json({ feature: featureView(feature) }, { status: 201 });
});
