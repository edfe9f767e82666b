// POST /api/parks/{parkSlug}/trails/preview: staff see what Loamcast computes from a file; nothing is stored.
import { handler } from "@/lib/server/api/handler";
import { getParkBySlug } from "@/lib/parks/queries";
import { previewTrailUpload } from "@/lib/trails/preview";
import { receiveTrailUpload } from "@/lib/trails/receive-upload";

export const POST = handler<{ parkSlug: string }>(async ({ request, params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  const { file } = await receiveTrailUpload(request, actor, park.id, "preview");
  return Response.json({ preview: previewTrailUpload(actor, park, file) });
});
