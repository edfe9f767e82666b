// POST /api/parks/{parkSlug}/trails/preview: staff see what Loamcast computes from a file; nothing is stored.
import { handler } from "@/lib/api/handler";
import { getParkBySlug } from "@/lib/data/parks";
import { previewTrailUpload } from "@/lib/trail-records/preview";
import { receiveTrailUpload } from "@/lib/trail-records/receive-upload";

export const POST = handler<{ parkSlug: string }>(async ({ request, params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  const { file } = await receiveTrailUpload(request, actor, park.id, "preview");
  return Response.json({ preview: previewTrailUpload(actor, park, file) });
});
