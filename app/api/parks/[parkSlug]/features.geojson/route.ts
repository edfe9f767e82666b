// GET /api/parks/{parkSlug}/features.geojson: built features (berms, jumps, drops…) on the park's trails.
import { geoJsonResponse } from "@/lib/server/api/geojson-response";
import { handler } from "@/lib/server/api/handler";
import { parkFeaturesGeoJson } from "@/lib/map/map-queries";
import { getParkBySlug } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ request, params }) => {
  const park = await getParkBySlug(params.parkSlug);
  return geoJsonResponse(await parkFeaturesGeoJson(park.id), request);
});
