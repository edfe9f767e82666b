// PATCH /api/trail-features/{id}: staff move, retype, rename or resize a feature (the one feature write path).
// DELETE /api/trail-features/{id}: staff remove a feature.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { featureView } from "@/lib/trails/queries";
import { deleteTrailFeature, updateTrailFeature } from "@/lib/trails/edit-features";

export const PATCH = handler<{ id: string }>(async ({ request, params, actor }) => {
  const { feature, previous } = await updateTrailFeature(actor, params.id, await readJson(request, 10_000));
  return Response.json({ feature: featureView(feature), previous });
});

export const DELETE = handler<{ id: string }>(async ({ params, actor }) => {
  await deleteTrailFeature(actor, params.id);
  return new Response(null, { status: 204 });
});
