// PUT /api/parks/{parkSlug}/layers/{layer}: a manager replaces one ground layer (multipart "file", GeoJSON). DELETE clears it.
import { handler } from "@/lib/server/api/handler";
import { clearGroundLayer, replaceGroundLayer } from "@/lib/parks/ground";
import { getParkBySlug } from "@/lib/parks/queries";

type Params = { parkSlug: string; layer: string };

export const PUT = handler<Params>(async ({ request, params, actor }) =>
  Response.json(await replaceGroundLayer(actor, await getParkBySlug(params.parkSlug), params.layer, request)),
);

export const DELETE = handler<Params>(async ({ params, actor }) => {
  await clearGroundLayer(actor, await getParkBySlug(params.parkSlug), params.layer);
  return new Response(null, { status: 204 });
});
