// GET /api/parks/{parkSlug}/trail-labels.geojson: where the map writes each trail's name and status.
import { geoJsonResponse } from "@/lib/api/geojson-response";
import { handler } from "@/lib/api/handler";
import { parkTrailsGeoJson } from "@/lib/data/map";
import { getParkBySlug } from "@/lib/data/parks";
import { trailLabelPoints } from "@/lib/map/trail-labels";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ request, params }) => {
  const park = await getParkBySlug(params.parkSlug);
  return geoJsonResponse(trailLabelPoints((await parkTrailsGeoJson(park)).collection), request);
});
