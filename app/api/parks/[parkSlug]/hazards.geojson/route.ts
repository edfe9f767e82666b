// GET /api/parks/{parkSlug}/hazards.geojson: the park's open hazard pins, for the map.
import { geoJsonResponse } from "@/lib/server/api/geojson-response";
import { handler } from "@/lib/server/api/handler";
import { parkHazardsGeoJson } from "@/lib/map/map-queries";
import { getParkBySlug } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ request, params }) => {
  const park = await getParkBySlug(params.parkSlug);
  return geoJsonResponse(await parkHazardsGeoJson(park.id), request);
});
