// GET /api/parks/{parkSlug}/trail-labels.geojson: where the map writes each trail's name and status.
import { geoJsonResponse } from "@/lib/server/api/geojson-response";
import { handler } from "@/lib/server/api/handler";
import { parkTrailsGeoJson } from "@/lib/map/map-queries";
import { getParkBySlug } from "@/lib/parks/queries";
import { trailLabelPoints } from "@/lib/map/pure/trail-labels";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ request, params }) => {
  const park = await getParkBySlug(params.parkSlug);
  return geoJsonResponse(trailLabelPoints((await parkTrailsGeoJson(park)).collection), request);
});
