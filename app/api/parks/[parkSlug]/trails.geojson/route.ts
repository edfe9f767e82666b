// GET /api/parks/{parkSlug}/trails.geojson: the park's trails with today's status, for the map.
import { geoJsonResponse } from "@/lib/api/geojson-response";
import { handler } from "@/lib/api/handler";
import { parkTrailsGeoJson } from "@/lib/data/map";
import { getParkBySlug } from "@/lib/data/parks";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ request, params }) => {
  const park = await getParkBySlug(params.parkSlug);
  return geoJsonResponse((await parkTrailsGeoJson(park)).collection, request);
});
