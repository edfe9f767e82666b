// POST /api/trails/{id}/hazards: pin a hazard on this trail (multipart: kind, note, lon+lat or distanceAlongM, photos) — staff of its park.
import { handler } from "@/lib/server/api/handler";
import { readHazardForm } from "@/lib/server/api/body";
import { authorize } from "@/lib/server/auth/permissions";
import { createHazard } from "@/lib/hazards/hazard-writes";
import { loadTrailWithPark } from "@/lib/conditions/write-report";
import { MAX_HAZARD_BODY_BYTES } from "@/lib/photos/pure/limits";

export const POST = handler<{ id: string }>(async ({ request, params, actor }) => {
  const { trail, park } = await loadTrailWithPark(params.id);
  authorize(actor, "hazard:write", { parkId: park.id });
  const { fields, photos } = await readHazardForm(request, MAX_HAZARD_BODY_BYTES);
  const hazard = await createHazard(actor, park, fields, photos, { trailIdFromPath: trail.id });
  return Response.json({ hazard }, { status: 201 });
});
