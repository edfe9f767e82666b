// GET /api/parks/{parkSlug}/trails.geojson: the park's trails with today's status, for the map (per-park cache).
import { preparedResponse } from "@/lib/server/api/etag";
import { GEOJSON_CONTENT_TYPE } from "@/lib/server/api/geojson-response";
import { handler } from "@/lib/server/api/handler";
import { trailsGeoJsonAnswer } from "@/lib/map/map-queries";
import { notFound } from "@/lib/shared/errors";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ request, params }) => {
  const answer = await trailsGeoJsonAnswer(params.parkSlug);
  if (!answer) throw notFound("Park not found.");
  return preparedResponse(answer, request, GEOJSON_CONTENT_TYPE);
});
