// GET /api/parks/{parkSlug}/trails: the park's trails with their figures (public).
// POST /api/parks/{parkSlug}/trails: staff upload a GPX or GeoJSON file (multipart) to create a trail.
import { handler } from "@/lib/server/api/handler";
import { getParkBySlug } from "@/lib/parks/queries";
import { getTrailDetail, listParkTrails } from "@/lib/trails/queries";
import { uploadResultView } from "@/lib/trails/preview";
import { receiveTrailUpload } from "@/lib/trails/receive-upload";
import { createTrailFromUpload } from "@/lib/trails/save-upload";
import { trailListQuerySchema } from "@/lib/trails/pure/schemas";

export const GET = handler<{ parkSlug: string }>(async ({ request, params }) => {
  const park = await getParkBySlug(params.parkSlug);
  const { sort, dir } = trailListQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  return Response.json({ park: { slug: park.slug, name: park.name }, trails: await listParkTrails(park.id, sort, dir) });
});

export const POST = handler<{ parkSlug: string }>(async ({ request, params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  const { file, fields } = await receiveTrailUpload(request, actor, park.id, "create");
  const { trail, result } = await createTrailFromUpload(actor, park, file, fields);
  const body = { trail: await getTrailDetail(trail.id, actor), upload: { warnings: uploadResultView(result, file.filename).warnings } };
  return Response.json(body, { status: 201, headers: { Location: `/api/trails/${trail.id}` } });
});
