// GET /api/parks/{parkSlug}/hazards.geojson: the park's open hazard pins, for the map.
import { geoJsonResponse } from "@/lib/api/geojson-response";
import { handler } from "@/lib/api/handler";
import { parkHazardsGeoJson } from "@/lib/data/map";
import { getParkBySlug } from "@/lib/data/parks";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ request, params }) => {
  const park = await getParkBySlug(params.parkSlug);
  return geoJsonResponse(await parkHazardsGeoJson(park.id), request);
});
