// GET /api/parks/{parkSlug}/trails.geojson: the park's trails with today's status, for the map.
import { geoJsonResponse } from "@/lib/server/api/geojson-response";
import { handler } from "@/lib/server/api/handler";
import { parkTrailsGeoJson } from "@/lib/map/map-queries";
import { getParkBySlug } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ request, params }) => {
  const park = await getParkBySlug(params.parkSlug);
  return geoJsonResponse((await parkTrailsGeoJson(park)).collection, request);
});
