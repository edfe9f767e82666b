// POST /api/parks/{parkSlug}/state: set the park-wide state; DELETE clears it (staff of the park).
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { clearParkState, setParkState } from "@/lib/conditions/park-state";
import { getParkBySlug } from "@/lib/parks/queries";

export const POST = handler<{ parkSlug: string }>(async ({ request, params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  const parkState = await setParkState(actor, park, await readJson(request, 10_000));
  return Response.json({ parkState }, { status: 201 });
});

export const DELETE = handler<{ parkSlug: string }>(async ({ params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  return Response.json(await clearParkState(actor, park));
});
