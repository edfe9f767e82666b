// POST /api/parks/{parkSlug}/hazards: pin a hazard (multipart: kind, note, lon+lat or trailId+distanceAlongM, photos) — staff of the park.
import { handler } from "@/lib/server/api/handler";
import { readHazardForm } from "@/lib/server/api/body";
import { authorize } from "@/lib/server/auth/permissions";
import { createHazard } from "@/lib/hazards/hazard-writes";
import { getParkBySlug } from "@/lib/parks/queries";
import { MAX_HAZARD_BODY_BYTES } from "@/lib/photos/pure/limits";

export const POST = handler<{ parkSlug: string }>(async ({ request, params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  // Refuse strangers before reading megabytes of photos.
  authorize(actor, "hazard:write", { parkId: park.id });
  const { fields, photos } = await readHazardForm(request, MAX_HAZARD_BODY_BYTES);
  const hazard = await createHazard(actor, park, fields, photos);
  return Response.json({ hazard }, { status: 201 });
});
